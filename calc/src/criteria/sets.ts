import type { CriteriaSet, CriterionValue } from '../core/types.js';

const GOVERNS =
  "The governing standard, the brake maker's data and local codes decide; these values support, and never replace, the judgement of a competent engineer.";

const CFR_HOIST =
  'published: 29 CFR 1910.179(f) hoist holding brakes; California Title 8 §4898 (same text)';

/** Values every set shares (lining duty, thruster, travel); each with its source. */
const COMMON: CriterionValue[] = [
  {
    key: 'pvLimit',
    label: 'Lining pressure × rubbing speed limit',
    value: 2.1e6,
    unit: 'Pa m/s',
    source:
      "from memory — classic machine-design value for occasional application with long rest periods (≈ 60 000 psi·ft/min); check the lining maker's data",
    confidence: 'memory',
  },
  {
    key: 'thrusterForceRatio',
    label: 'Thruster force ÷ force needed to release, at least',
    value: 1.1,
    unit: '',
    source:
      "common practice (a release-force reserve of about 10 %); the thruster maker's data governs",
    confidence: 'common practice',
  },
  {
    key: 'adhesionLimit',
    label: 'Wheel–rail adhesion allowed for braking',
    value: 0.15,
    unit: '',
    source:
      'from memory — dry steel wheel on steel rail, usual design range 0.12–0.20; check the governing standard',
    confidence: 'memory',
  },
  {
    key: 'travelStopFraction',
    label: 'Travel stopping distance (ft) ÷ full-load speed (ft/min), at most',
    value: 0.1,
    unit: 'min',
    source:
      'published: 29 CFR 1910.179(f)(4)(vii) (brakes for trolleys and bridges: stop within a distance in ft equal to 10 % of full-load speed in ft/min)',
    confidence: 'published',
  },
];

function withCommon(values: CriterionValue[]): CriterionValue[] {
  const own = new Set(values.map((v) => v.key));
  return [...values, ...COMMON.filter((v) => !own.has(v.key))];
}

/** General industry (conveyors, mill auxiliaries): brake torque as a multiple of motor torque. */
export const GENERAL_INDUSTRY: CriteriaSet = {
  id: 'general-industry',
  version: 1,
  name: 'General industry (conveyors, mill auxiliaries)',
  description: `Brake torque at least 1.5 × the chosen reference torque (common practice for machinery brakes; no single published rule). ${GOVERNS}`,
  values: withCommon([
    {
      key: 'torqueFactorSingle',
      label: 'Brake torque ÷ reference torque, one brake',
      value: 1.5,
      unit: '',
      source:
        'common practice for machinery brakes (from memory; no single published rule) — check the governing standard',
      confidence: 'common practice',
    },
    {
      key: 'torqueFactorMechanical',
      label: 'Brake torque ÷ reference torque, with mechanical control braking',
      value: 1.5,
      unit: '',
      source: 'common practice (from memory) — check the governing standard',
      confidence: 'common practice',
    },
    {
      key: 'torqueFactorEachOfTwo',
      label: 'Brake torque ÷ reference torque, each of two brakes',
      value: 1.0,
      unit: '',
      source: 'common practice (from memory) — check the governing standard',
      confidence: 'common practice',
    },
  ]),
};

/** Crane hoist holding brakes from the published US rules. */
export const CRANE_HOIST: CriteriaSet = {
  id: 'crane-hoist',
  version: 1,
  name: 'Crane hoist holding brake (US federal and California rules)',
  description:
    'Hoist holding-brake torque as a percentage of the rated-load hoisting torque at the point where the brake is applied: 125 % with control braking other than mechanical, 100 % with mechanical control braking, 100 % each with two holding brakes (29 CFR 1910.179(f); California Title 8 §4898). Hot-metal hoists with power control braking need at least two holding brakes. ' +
    GOVERNS,
  values: withCommon([
    {
      key: 'torqueFactorSingle',
      label:
        'Holding brake ÷ rated-load hoisting torque, one brake, control braking other than mechanical',
      value: 1.25,
      unit: '',
      source: CFR_HOIST,
      confidence: 'published',
    },
    {
      key: 'torqueFactorMechanical',
      label: 'Holding brake ÷ rated-load hoisting torque, with mechanical control braking',
      value: 1.0,
      unit: '',
      source: CFR_HOIST,
      confidence: 'published',
    },
    {
      key: 'torqueFactorEachOfTwo',
      label: 'Holding brake ÷ rated-load hoisting torque, each of two holding brakes',
      value: 1.0,
      unit: '',
      source: CFR_HOIST,
      confidence: 'published',
    },
  ]),
};

/** Bridge and trolley travel drives: the 10 %-of-speed stopping rule; torque factor set by the user. */
export const TRAVEL_DRIVE: CriteriaSet = {
  id: 'travel-drive',
  version: 1,
  name: 'Crane travel drive (bridge, trolley)',
  description:
    'Stop within a distance in ft equal to 10 % of the full-load speed in ft/min (29 CFR 1910.179(f)(4)(vii); the same numbers in m and m/min). The travel brake torque factor is set on the sheet: published percentages vary with the governing standard and indoor/outdoor service — check the governing standard. ' +
    GOVERNS,
  values: withCommon([
    {
      key: 'torqueFactorSingle',
      label: 'Brake torque ÷ motor torque (travel), default',
      value: 1.0,
      unit: '',
      source: 'from memory, low confidence — set on the sheet; check the governing standard',
      confidence: 'memory',
    },
    {
      key: 'torqueFactorMechanical',
      label: 'Brake torque ÷ motor torque (travel), mechanical control braking',
      value: 1.0,
      unit: '',
      source: 'from memory, low confidence — check the governing standard',
      confidence: 'memory',
    },
    {
      key: 'torqueFactorEachOfTwo',
      label: 'Brake torque ÷ motor torque (travel), each of two brakes',
      value: 0.5,
      unit: '',
      source: 'from memory, low confidence — check the governing standard',
      confidence: 'memory',
    },
  ]),
};

export const CRITERIA_SETS: readonly CriteriaSet[] = [GENERAL_INDUSTRY, CRANE_HOIST, TRAVEL_DRIVE];
