import type { CheckResult, FieldDefinition } from '../core/types.js';
import type { Derivation } from '../core/step.js';
import { CalcInputError, isCalcInputError } from '../core/errors.js';
import {
  baseBoltTension,
  leverBending,
  pinStrength,
  shoePinLoad,
} from '../levers/lever-strength.js';
import * as q from '../units/quantities.js';
import { sheetCheck } from './checks.js';
import { flag, num, qty } from './field-builders.js';
import type { ShoeInputs } from './shoe-brake-fields.js';

const SECTION = 'levers';
const MAKER = " (material or brake maker's data)";

/** The fields other than the flag are needed only while the check is included. */
function ifEnabled<const Fs extends readonly FieldDefinition[]>(fields: Fs): Fs {
  return fields.map((f) =>
    f.kind === 'boolean' ? f : { ...f, requiredIf: 'leversEnabled' },
  ) as unknown as Fs;
}

const POS = { min: 0, exclusiveMin: true } as const;

/**
 * Optional strength check of the spring lever, the shoe pins and the base bolts at the highest
 * spring setting (demo values invented for the demo hoist).
 */
export const LEVER_FIELDS = ifEnabled([
  flag(
    SECTION,
    'leversEnabled',
    'Levers, pins and base bolts: include the strength check',
    true,
    'Loads from the main spring at the top of its adjustable range: the spring lever carries the spring force with the shoes lifted; the shoe pins carry the shoe force through the lever ratio with the friction at μ max; the base bolts carry the torque reaction at μ max.',
  ),
  qty(
    SECTION,
    'leverMomentArm',
    "Spring lever: distance from the spring's line of action to the critical section",
    'a_l',
    'length',
    150,
    'mm',
    'in',
    { ...POS, help: 'Usually the section at the edge of the pivot boss (common practice).' },
  ),
  qty(
    SECTION,
    'leverSectionWidth',
    'Spring lever: section width b at the critical section (plate thickness)',
    'b_l',
    'length',
    12,
    'mm',
    'in',
    POS,
  ),
  qty(
    SECTION,
    'leverSectionDepth',
    'Spring lever: section depth h at the critical section (in the plane of bending)',
    'h_l',
    'length',
    40,
    'mm',
    'in',
    POS,
  ),
  qty(
    SECTION,
    'leverAllowableBending',
    `Spring lever: permissible bending stress${MAKER}`,
    'σ_b,perm',
    'pressure',
    160,
    'MPa',
    'psi',
    { ...POS, help: 'Include holes, notches and fatigue in this figure: the check is static.' },
  ),
  qty(SECTION, 'shoePinDiameter', 'Shoe pin: diameter', 'd_p', 'length', 16, 'mm', 'in', POS),
  qty(
    SECTION,
    'shoePinBearingLength',
    'Shoe pin: bearing length in the shoe eye (between the two shear planes)',
    'l_p',
    'length',
    25,
    'mm',
    'in',
    POS,
  ),
  qty(
    SECTION,
    'shoePinAllowableShear',
    `Shoe pin: permissible shear stress${MAKER}`,
    'τ_p,perm',
    'pressure',
    80,
    'MPa',
    'psi',
    POS,
  ),
  qty(
    SECTION,
    'shoePinAllowableBearing',
    "Shoe pin: permissible bearing pressure (bush or brake maker's data)",
    'p_p,perm',
    'pressure',
    25,
    'MPa',
    'psi',
    POS,
  ),
  qty(
    SECTION,
    'baseBoltRowSpacing',
    'Base bolts: spacing of the two bolt rows (across the torque reaction)',
    's_b',
    'length',
    200,
    'mm',
    'in',
    POS,
  ),
  num(
    SECTION,
    'baseBoltsPerRow',
    'Base bolts: bolts in one row',
    'n_b',
    2,
    { min: 1, max: 20 },
    true,
  ),
  qty(
    SECTION,
    'baseBoltAllowableLoad',
    "Base bolts: permissible working tension per bolt (bolt grade and maker's data)",
    'F_bolt,perm',
    'force',
    8,
    'kN',
    'lbf',
    {
      ...POS,
      help: 'Allow here for preload, prying and the weight of the brake: the check leaves them out.',
    },
  ),
] as const);

/** The formula functions' field names as the sheet declares them. */
const FIELD_OF: Record<string, string> = {
  momentArm: 'leverMomentArm',
  width: 'leverSectionWidth',
  depth: 'leverSectionDepth',
  allowableStress: 'leverAllowableBending',
  diameter: 'shoePinDiameter',
  bearingLength: 'shoePinBearingLength',
  allowableShear: 'shoePinAllowableShear',
  allowableBearing: 'shoePinAllowableBearing',
  rowSpacing: 'baseBoltRowSpacing',
  boltsPerRow: 'baseBoltsPerRow',
  allowableLoad: 'baseBoltAllowableLoad',
};

function inSheetFields<T>(f: () => T): T {
  try {
    return f();
  } catch (e) {
    if (!isCalcInputError(e)) throw e;
    throw new CalcInputError(e.fields.map((x) => ({ ...x, field: FIELD_OF[x.field] ?? x.field })));
  }
}

/**
 * Strength of the spring lever, the shoe pins and the base bolts at the highest spring setting
 * (section 'levers'), when included. Model (stated on the sheet): the spring lever carries
 * F_s,max,rel — the main spring at the top of its range with the shoes lifted, its highest force —
 * at the distance a_l from its critical section; each shoe pin carries i·F_s,max,rel with the
 * friction force at μ max at right angles (an envelope: with the shoes lifted there is no
 * friction, set they see the lower F_s,max); the base bolts carry the torque at μ max with the
 * spring at the top of its range (the drive-train step M_b,max,adj) as a couple over the rows.
 * Reads the steps 'spring-force-highest' and 'torque-max-adjustable', so it runs after them.
 */
export function shoeLevers(v: ShoeInputs, d: Derivation): CheckResult[] {
  if (!v.leversEnabled) return [];
  d.section = SECTION;
  const Fs = q.force(d.value('spring-force-highest'));
  const lever = inSheetFields(() =>
    leverBending(
      {
        force: Fs,
        momentArm: q.length(v.leverMomentArm),
        width: q.length(v.leverSectionWidth),
        depth: q.length(v.leverSectionDepth),
        allowableStress: q.pressure(v.leverAllowableBending),
      },
      d,
      {
        label:
          "Bending moment in the spring lever: F_s,max,rel at the spring's end, a_l from the critical section",
        names: { F: 'F_s,max,rel' },
      },
    ),
  );
  const pinLoad = shoePinLoad(
    { leverRatio: q.ratio(v.leverRatio), springForce: Fs, muMax: q.ratio(v.muMax) },
    d,
    {
      label:
        'Load on each shoe pin: i·F_s,max,rel at the shoe, with the friction force at μ max at right angles (envelope)',
      names: { F: 'F_s,max,rel' },
    },
  );
  const pin = inSheetFields(() =>
    pinStrength(
      {
        load: pinLoad,
        diameter: q.length(v.shoePinDiameter),
        bearingLength: q.length(v.shoePinBearingLength),
        allowableShear: q.pressure(v.shoePinAllowableShear),
        allowableBearing: q.pressure(v.shoePinAllowableBearing),
      },
      d,
    ),
  );
  const bolts = inSheetFields(() =>
    baseBoltTension(
      {
        torque: q.torque(d.value('torque-max-adjustable')),
        rowSpacing: q.length(v.baseBoltRowSpacing),
        boltsPerRow: v.baseBoltsPerRow,
        allowableLoad: q.force(v.baseBoltAllowableLoad),
      },
      d,
    ),
  );
  return [
    sheetCheck(
      lever.check,
      SECTION,
      'Deepen the lever section or lower the top of the spring range.',
    ),
    ...pin.checks.map((c) =>
      sheetCheck(
        c,
        SECTION,
        'Use a larger pin or a longer eye, or lower the top of the spring range.',
      ),
    ),
    sheetCheck(
      bolts.check,
      SECTION,
      'Use stronger or more bolts, or spread the bolt rows further.',
    ),
  ];
}
