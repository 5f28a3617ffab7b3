import type { FieldDefinition, SectionDefinition } from '../core/types.js';
import { STANDARD_DISC_SIZES } from '../disc-springs/standard-sizes.js';
import { BACK_OFF_ANGLE } from '../field/tolerances.js';

/** Stack prefixes: 'a' is the first stack (demo: shoe holder), 'b' the second (demo: equaliser). */
export type StackKey = 'a' | 'b';

export const DISC_STACK_SECTIONS: SectionDefinition[] = [
  { id: 'material', title: 'Disc material' },
  { id: 'stackA', title: 'Stack 1 — shoe holder' },
  { id: 'stackB', title: 'Stack 2 — equaliser' },
];

export const sectionOf = (k: StackKey) => (k === 'a' ? 'stackA' : 'stackB');

const mm = (value: number) => ({ value, unit: 'mm' });

/**
 * The field cards' back-off band (one-sided, loosening only) as this sheet's default tolerance,
 * in whole degrees: rad → deg leaves a rounding tail a form would print.
 */
const BACK_OFF_TOLERANCE_DEG = (() => {
  const b = BACK_OFF_ANGLE.band;
  // Only an absolute band is an angle; a silent default of another kind would be a wrong one.
  if (b.kind !== 'absolute') throw new Error('BACK_OFF_ANGLE is expected as an absolute band');
  return Math.round((b.plus * 180) / Math.PI);
})();

const len = (
  key: string,
  section: string,
  label: string,
  symbol: string,
  value: number,
  min: number,
  max: number,
  help?: string,
): FieldDefinition => ({
  key,
  section,
  label,
  symbol,
  kind: 'quantity',
  dimension: 'length',
  unitSI: 'mm',
  unitUS: 'in',
  demo: mm(value),
  required: true,
  min: min / 1000,
  max: max / 1000,
  help,
});

interface StackDemo {
  De: number;
  Di: number;
  t: number;
  l0: number;
  series: number;
  parallel: number;
  pitch: number;
  angle: number;
  required: number;
  enabled: boolean;
  size: string;
}

/**
 * Demo defaults (invented scenario, common practice, no published source): a single disc under a
 * castle nut on the shoe holder, flat then backed off about 60°; a stack of three on the equaliser
 * shaft, flat then backed off about 180°. Sizes are DIN 2093 rows (A 40, B 50); pitches
 * are ISO 261 coarse pitches (M20 2.5 mm, M24 3.0 mm; secondary copy).
 */
const DEMO: Record<StackKey, StackDemo> = {
  a: {
    De: 40,
    Di: 20.4,
    t: 2.25,
    l0: 3.15,
    series: 1,
    parallel: 1,
    pitch: 2.5,
    angle: 60,
    required: 3000,
    enabled: true,
    size: 'A 40 on M20',
  },
  b: {
    De: 50,
    Di: 25.4,
    t: 2.0,
    l0: 3.4,
    series: 3,
    parallel: 1,
    pitch: 3.0,
    angle: 180,
    required: 3000,
    enabled: true,
    size: 'B 50 ×3 on M24',
  },
};

function stackFields(k: StackKey): FieldDefinition[] {
  return stackFieldList(k).map((f) =>
    f.key === `${k}Enabled` ? f : { ...f, requiredIf: `${k}Enabled` },
  );
}

function stackFieldList(k: StackKey): FieldDefinition[] {
  const s = sectionOf(k);
  const d = DEMO[k];
  return [
    {
      key: `${k}Enabled`,
      section: s,
      label: 'Include this stack',
      symbol: '',
      kind: 'boolean',
      demo: d.enabled,
      required: true,
    },
    {
      key: `${k}Size`,
      section: s,
      label: 'Standard size (DIN EN 16983 / DIN 2093), or custom geometry',
      symbol: '',
      kind: 'choice',
      demo: 'custom',
      required: true,
      choices: [
        { value: 'custom', label: 'custom (use the geometry below)' },
        ...STANDARD_DISC_SIZES.map((r) => ({
          value: r.designation,
          label: `${r.designation}: ${r.De}/${r.Di}/${r.t}${r.tReduced ? ` (t′ ${r.tReduced})` : ''}/${r.l0} mm (${r.confidence})`,
        })),
      ],
      help: 'A standard size replaces the geometry fields below; its source and confidence are listed in the table of sizes.',
    },
    len(`${k}De`, s, 'Outer diameter', 'D_e', d.De, 1, 1000, `Demo: ${d.size}`),
    len(`${k}Di`, s, 'Inner diameter', 'D_i', d.Di, 0.5, 999),
    len(`${k}t`, s, 'Disc thickness', 't', d.t, 0.05, 80),
    len(
      `${k}l0`,
      s,
      'Free height of one disc',
      'l₀',
      d.l0,
      0.06,
      120,
      'thickness plus cone height',
    ),
    len(
      `${k}tReduced`,
      s,
      'Reduced thickness t′ (group 3 with contact flats, 0 = none)',
      't′',
      0,
      0,
      80,
    ),
    {
      key: `${k}Series`,
      section: s,
      label: 'Sets in series',
      symbol: 'i',
      kind: 'integer',
      demo: d.series,
      required: true,
      min: 1,
      max: 50,
    },
    {
      key: `${k}Parallel`,
      section: s,
      label: 'Discs in parallel per set',
      symbol: 'n',
      kind: 'integer',
      demo: d.parallel,
      required: true,
      min: 1,
      max: 6,
    },
    {
      key: `${k}FrictionCone`,
      section: s,
      label: 'Friction factor between nested discs',
      symbol: 'w_M',
      kind: 'number',
      demo: 0.02,
      required: true,
      min: 0,
      max: 0.15,
      help: 'DIN EN 16984 typical values (from memory): series A 0.02–0.03, B 0.015–0.025, C 0.01–0.015',
    },
    {
      key: `${k}FrictionEdge`,
      section: s,
      label: 'Friction factor at the load edges',
      symbol: 'w_R',
      kind: 'number',
      demo: 0.03,
      required: true,
      min: 0,
      max: 0.15,
      help: 'DIN EN 16984 typical values (from memory): series A 0.03–0.05, B 0.02–0.04, C 0.01–0.03',
    },
    len(`${k}Pitch`, s, 'Thread lead (pitch of a single-start thread)', 'P', d.pitch, 0.2, 12),
    {
      key: `${k}BackOff`,
      section: s,
      label: 'Back-off angle from flat',
      symbol: 'θ',
      kind: 'quantity',
      dimension: 'angle',
      unitSI: 'deg',
      unitUS: 'deg',
      demo: { value: d.angle, unit: 'deg' },
      required: true,
      min: 0,
      max: 6 * Math.PI,
      help: 'Tighten until every disc is flat (nut torque rises sharply), then back off this angle and lock.',
    },
    {
      key: `${k}BackOffTolerance`,
      section: s,
      label: 'Back-off angle tolerance',
      symbol: 'Δθ',
      kind: 'quantity',
      dimension: 'angle',
      unitSI: 'deg',
      unitUS: 'deg',
      demo: { value: BACK_OFF_TOLERANCE_DEG, unit: 'deg' },
      required: true,
      min: 0,
      max: 2 * Math.PI,
      help: 'Common practice: the sheet checks the stack at θ − Δθ (a margin for reading the angle) and at θ + Δθ (the fitter backs off on to the next slot or lock-plate hole). On the field card the band is one-sided: back off further, never tighten back.',
    },
    {
      key: `${k}RequiredPreload`,
      section: s,
      label: 'Required preload (0 = none)',
      symbol: 'F_req',
      kind: 'quantity',
      dimension: 'force',
      unitSI: 'N',
      unitUS: 'lbf',
      demo: { value: d.required, unit: 'N' },
      required: true,
      min: 0,
      max: 5e6,
    },
  ];
}

export const DISC_STACK_FIELDS: FieldDefinition[] = [
  {
    key: 'E',
    section: 'material',
    label: "Young's modulus",
    symbol: 'E',
    kind: 'quantity',
    dimension: 'pressure',
    unitSI: 'MPa',
    unitUS: 'psi',
    demo: { value: 206000, unit: 'MPa' },
    required: true,
    min: 50e9,
    max: 300e9,
    help: 'DIN 2093 tables use 206 000 N/mm² for spring steel',
  },
  {
    key: 'nu',
    section: 'material',
    label: "Poisson's ratio",
    symbol: 'ν',
    kind: 'number',
    demo: 0.3,
    required: true,
    min: 0.1,
    max: 0.45,
  },
  ...stackFields('a'),
  ...stackFields('b'),
];
