import { discSprings } from '../calc-api.js';
import { defineCase, type Confidence, type VerificationCase } from '../case.js';

const mm = 1e-3;

export interface DiscRow {
  id: string;
  designation: string;
  De: number;
  Di: number;
  t: number;
  l0: number;
  tReduced?: number;
  /** Listed force at s = 0.75·(l0 − t), N. */
  F: number;
  /** Listed σOM at s = 0.75·h0, N/mm², if the source gives it. */
  sigmaOM?: number;
  source: string;
  confidence: Confidence;
  rel: number;
  toleranceNote: string;
}

/** A case checking one standard-table row: force (and σOM) at s = 0.75·(l0 − t), E 206 000 N/mm², ν 0.3. */
export function discRowCase(r: DiscRow): VerificationCase {
  return defineCase({
    id: r.id,
    family: 'disc-springs',
    title: `Disc spring ${r.designation}: force${r.sigmaOM !== undefined ? ' and σOM' : ''} at s = 0.75·h0`,
    source: r.source,
    confidence: r.confidence,
    inputs: {
      De: `${r.De} mm`,
      Di: `${r.Di} mm`,
      t: `${r.t} mm`,
      l0: `${r.l0} mm`,
      ...(r.tReduced !== undefined ? { tReduced: `${r.tReduced} mm` } : {}),
      s: `0.75·(l0 − t) = ${+(0.75 * (r.l0 - r.t)).toFixed(4)} mm`,
      E: '206000 N/mm²',
      nu: 0.3,
    },
    expected: [
      { key: 'F', label: 'Force F', value: r.F, unit: 'N', rel: r.rel },
      ...(r.sigmaOM !== undefined
        ? [{ key: 'sigmaOM', label: 'Stress σOM', value: r.sigmaOM, unit: 'N/mm²', rel: r.rel }]
        : []),
    ],
    toleranceNote: r.toleranceNote,
    run() {
      const d = {
        De: r.De * mm,
        Di: r.Di * mm,
        t: r.t * mm,
        l0: r.l0 * mm,
        tReduced: r.tReduced === undefined ? undefined : r.tReduced * mm,
        ...discSprings.TABLE_STEEL,
      };
      discSprings.validateDisc(d);
      const s = 0.75 * (r.l0 - r.t) * mm;
      return {
        F: discSprings.discForce(d, s),
        sigmaOM: discSprings.discStresses(d, s).sigmaOM / 1e6,
      };
    },
  });
}

export const CATALOGUE_1992 =
  "DIN 2093:1992, series A table, as reproduced in a disc-spring maker's public catalogue (reference-values.md §1)";
export const TOL_1992 =
  'the 1992 table forces scatter −1.3 % … +2.0 % about the formula (the 2006 edition re-specified them): ±2.5 %';
export const CODE_TABLE =
  'DIN 2093 group 2 table as stated to three significant figures in a public source-code constant table (secondary copy of the standard)';
export const TOL_CODE = 'three significant figures in the source: ±0.5 %';
