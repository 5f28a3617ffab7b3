import type { CriterionValue } from '../core/types.js';

/**
 * The band a measured field value must lie in around its target. Bounds are in the setting's own
 * SI unit (m, N, rad) for 'absolute', a fraction of the target for 'relative'. 'atLeast' and
 * 'atMost' are one-sided: the target itself is the limit and the other side is open.
 */
export type ToleranceBand =
  | { kind: 'absolute'; minus: number; plus: number }
  | { kind: 'relative'; minus: number; plus: number }
  | { kind: 'atLeast' }
  | { kind: 'atMost' };

/** The tolerance a field card declares for one of its values. */
export interface FieldTolerance {
  band: ToleranceBand;
  /** Where the band comes from, e.g. 'common practice' or a standard with its clause. */
  source: string;
  confidence: CriterionValue['confidence'];
  /**
   * A rule the fitter must follow when setting the value, printed beside the tolerance, e.g. for
   * a disc-spring back-off angle: "back off only; never tighten to align a slot".
   */
  rule?: string;
  /**
   * Direction a value may only be approached from (back-off angles are reached by loosening;
   * tightening past flat and back again changes the preload).
   */
  direction?: 'loosen' | 'tighten';
}

/** Whether a measurement lies in the band, and by how much it is off the target. */
export interface ToleranceVerdict {
  /** 'in' inside the band (bounds included), 'out' outside it. */
  status: 'in' | 'out';
  /** measured − target, in SI. */
  deviationSI: number;
  /** Lowest and highest value accepted, in SI; null when the side is open. */
  lowerSI: number | null;
  upperSI: number | null;
  /** The deviation and the bounds in the field's display unit (what the card prints). */
  display: {
    unit: string;
    label: string;
    deviation: number;
    lower: number | null;
    upper: number | null;
  };
}
