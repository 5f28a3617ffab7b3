import { sheetTypeDefinition } from '../calc/calc-engine.js';

/**
 * The invented demo plant. No real company, place, person or product: "Northgate Rolling Works"
 * and everything in it are made up for the demonstration.
 */
export const demoSite = { code: 'NRW', name: 'Northgate Rolling Works (demo)' };

export const demoMachines = [
  {
    tag: 'LC-1',
    name: 'Ladle crane 1, melt shop',
    kind: 'crane',
    positions: [
      { tag: 'MH-B1', description: 'Main hoist, brake 1 (high-speed shaft)', motion: 'hoist' },
      { tag: 'MH-B2', description: 'Main hoist, brake 2 (high-speed shaft)', motion: 'hoist' },
      { tag: 'AH-B1', description: 'Auxiliary hoist brake', motion: 'auxiliary-hoist' },
      { tag: 'MH-DB', description: 'Main hoist rope drum, emergency disc brake', motion: 'hoist' },
    ],
  },
  {
    tag: 'SB-2',
    name: 'Scrap bay crane 2',
    kind: 'crane',
    positions: [
      { tag: 'TR-B1', description: 'Trolley travel brake', motion: 'trolley' },
      { tag: 'BR-B1', description: 'Bridge travel brake, drive side', motion: 'bridge' },
    ],
  },
  {
    tag: 'LC-2',
    name: 'Ladle crane 2, melt shop',
    kind: 'crane',
    positions: [
      {
        tag: 'DB-1',
        description: 'Main hoist rope drum, emergency disc brake',
        motion: 'hoist',
      },
    ],
  },
  {
    tag: 'CC-4',
    name: 'Coil conveyor 4',
    kind: 'conveyor',
    positions: [{ tag: 'DR-B1', description: 'Drive station brake', motion: 'conveyor' }],
  },
] as const;

export type DemoState = 'draft' | 'in_check' | 'returned' | 'approved' | 'superseded';

export interface DemoRevision {
  state: DemoState;
  author: string;
  checker?: string;
  changeNote: string;
  /** Which quantity input to vary and by how much (keeps the demo sheets distinct). */
  vary?: [number, number];
  /**
   * Inputs this revision enters that differ from the calc demo values, as [field key, value as
   * entered], applied after `vary` (never a copy of a demo value: those come from calc).
   */
  set?: [string, number | string | boolean | { value: number; unit: string }][];
  /** Fields this revision takes (back) from the calc demo values, after `set`. */
  demoValues?: string[];
  /** Optional fields this revision leaves out. */
  leaveOut?: string[];
  justification?: string;
  comments?: {
    by: string;
    body: string;
    anchor?: { kind: 'input' | 'check'; key: 'first-input' | 'first-check' };
    reply?: { by: string; body: string };
    resolved?: boolean;
  }[];
  daysAgo: number;
}

export interface DemoSheet {
  title: string;
  machine: string;
  position: string;
  sheetType:
    | 'hoist-shoe-brake'
    | 'travel-shoe-brake'
    | 'drive-shoe-brake'
    | 'caliper-disc-brake'
    | 'disc-spring-stack';
  owner: string;
  revisions: DemoRevision[];
}

const E = 'engineer@holdfast.test';
const E2 = 'engineer2@holdfast.test';
const C = 'checker@holdfast.test';
const C2 = 'checker2@holdfast.test';

// Inputs of the first issues as entered before core 1.1.0 asked for them apart: the stop took the
// gear efficiency as credit, the long-shoe torque was the model, all stops were one count.
const CORE_1_0_HOIST: DemoRevision['set'] = [
  ['springForce', { value: 1100, unit: 'N' }],
  ['leversEnabled', false],
  ['backDrivingEfficiency', 0.88],
  ['torqueModel', 'pivoted'],
  ['stopsPerHour', { value: 60, unit: '1/h' }],
  ['emergencyStopsPerHour', { value: 0, unit: '1/h' }],
];
const CORE_1_0_TRAVEL: DemoRevision['set'] = [
  ['leversEnabled', false],
  ['torqueModel', 'pivoted'],
  ['stopsPerHour', { value: 30, unit: '1/h' }],
  ['emergencyStopsPerHour', { value: 0, unit: '1/h' }],
];
const CORE_1_0_CALIPER: DemoRevision['set'] = [
  // The release unit first fitted, before the quick-drop one the 1.4.0 check called for.
  ['setDelay', { value: 0.3, unit: 's' }],
  ['backDrivingEfficiency', 0.95],
  ['stopsPerHour', { value: 2, unit: '1/h' }],
  ['emergencyStopsPerHour', { value: 0, unit: '1/h' }],
];
/**
 * The lever, pin and base-bolt inputs of the shoe sheets (the first issues did not check them),
 * read from the sheet definition so the list cannot fall behind it.
 */
const LEVER_FIELDS = sheetTypeDefinition('hoist-shoe-brake')
  .fields.filter((f) => f.section === 'levers')
  .map((f) => f.key);
/** What the 1.1.0 re-checks enter: the calc demo values of the fields 1.1.0 asks for apart. */
const RECHECK_1_1 = [
  'backDrivingEfficiency',
  'torqueModel',
  'stopsPerHour',
  'emergencyStopsPerHour',
  'motorMaxSpeed',
  'springRelaxation',
  'springForce',
  ...LEVER_FIELDS,
];
/** Inputs the first issues did not have (spring relaxation and the lever checks came later). */
const NOT_IN_1_0 = ['springRelaxation', ...LEVER_FIELDS.filter((k) => k !== 'leversEnabled')];

export const demoSheets: DemoSheet[] = [
  {
    title: 'Ladle crane 1 main hoist brake 1, uprated motor',
    machine: 'LC-1',
    position: 'MH-B1',
    sheetType: 'hoist-shoe-brake',
    owner: E,
    revisions: [
      {
        state: 'superseded',
        author: E,
        checker: C,
        changeNote: 'First issue.',
        // As entered under core 1.0.0: gear-loss credit while lowering, long-shoe torque, one stop count.
        set: CORE_1_0_HOIST,
        leaveOut: NOT_IN_1_0,
        daysAgo: 120,
      },
      {
        state: 'approved',
        author: E,
        checker: C2,
        // What `vary` changes: the first quantity input, the motor power (× 1.08).
        changeNote:
          'Hoist motor uprated, 22 → 23.76 kW (motor data). The brake is sized on the full-load hoisting torque, which the motor does not change: all checks pass with the settings of rev A; no change on site.',
        vary: [0, 1.08],
        daysAgo: 30,
      },
      {
        state: 'approved',
        author: E,
        checker: C,
        changeNote:
          'Re-checked with calculation core 1.2.0: rubbing speed and p·v now at the speed the brake sets with (the load speeds up during the set delay); no credit for gear losses in the emergency stop (η_bd 0.88 → 1); torque model long shoe → short shoe for the requirement (conservative); motor maximum speed 2200 rpm from the motor data; set delay 0.3 s is the thruster set time at its coldest oil (maker’s data); 60 stops per hour split into 56 service and 4 emergency stops; drive train checked at μ max with the spring at 1600 N; spring relaxation 2 % (spring maker’s data) taken off the worn torques, the stop and the setting band, and the stop worked out with the lowest torque in service (drum at its wear limit); spring lever, shoe pins and base bolts checked at the highest spring setting (brake maker’s drawing). To keep the stop within 250 mm the main spring is re-set 1100 → 1150 N (set length 222.5 → 221.5 mm; torque band now 771–1600 N). Stopping distance 0.19 → 0.23 m, steady drum temperature 66 → 76 °C; all checks pass. On site: re-set the main spring to the card; shoe clearance, reserve stroke and disc-spring back-offs as rev B.',
        demoValues: RECHECK_1_1,
        daysAgo: 0,
      },
    ],
  },
  {
    title: 'Ladle crane 1 main hoist brake 2',
    machine: 'LC-1',
    position: 'MH-B2',
    sheetType: 'hoist-shoe-brake',
    owner: E2,
    revisions: [
      { state: 'in_check', author: E2, changeNote: 'First issue.', vary: [1, 1.05], daysAgo: 3 },
    ],
  },
  {
    title: 'Ladle crane 1 auxiliary hoist brake',
    machine: 'LC-1',
    position: 'AH-B1',
    sheetType: 'hoist-shoe-brake',
    owner: E,
    revisions: [
      { state: 'draft', author: E, changeNote: 'First issue.', vary: [2, 0.9], daysAgo: 1 },
    ],
  },
  {
    title: 'Scrap bay crane 2 trolley travel brake',
    machine: 'SB-2',
    position: 'TR-B1',
    sheetType: 'travel-shoe-brake',
    owner: E2,
    revisions: [
      {
        state: 'approved',
        author: E2,
        checker: C,
        changeNote: 'First issue.',
        set: CORE_1_0_TRAVEL,
        leaveOut: NOT_IN_1_0,
        daysAgo: 60,
      },
      {
        state: 'approved',
        author: E2,
        checker: C2,
        changeNote:
          'Re-checked with calculation core 1.2.0: motor maximum speed 3000 rpm from the motor data; set delay is the thruster set time at its coldest oil (maker’s data); 30 stops per hour split into 28 service and 2 emergency stops; torque model long shoe → short shoe for the requirement (conservative); drive train checked at μ max with the spring at 800 N; spring travel ratio checked against the lever ratio; spring relaxation 2 % (spring maker’s data) now taken off the worn torques, the stop and the setting band; spring lever, shoe pins and base bolts checked at the highest spring setting (brake maker’s drawing). All checks pass; no change on site.',
        demoValues: RECHECK_1_1,
        daysAgo: 0,
      },
    ],
  },
  {
    title: 'Scrap bay crane 2 bridge travel brake',
    machine: 'SB-2',
    position: 'BR-B1',
    sheetType: 'travel-shoe-brake',
    owner: E,
    revisions: [
      {
        state: 'returned',
        author: E,
        checker: C2,
        changeNote: 'First issue.',
        vary: [1, 1.1],
        daysAgo: 5,
        comments: [
          {
            by: C2,
            body: 'Use the wheel load with the trolley at the far end; the figure here is the mid-span one.',
            anchor: { kind: 'input', key: 'first-input' },
            reply: {
              by: E,
              body: 'Agreed: corrected in the next submission, value taken from the end-carriage drawing.',
            },
            resolved: true,
          },
          {
            by: C2,
            body: 'Please attach the thruster data sheet you used.',
            reply: {
              by: E,
              body: 'It goes with the next submission, with the corrected wheel load.',
            },
          },
        ],
      },
    ],
  },
  {
    title: 'Ladle crane 1 main hoist rope-drum emergency brake',
    machine: 'LC-1',
    position: 'MH-DB',
    sheetType: 'caliper-disc-brake',
    owner: E,
    revisions: [
      {
        state: 'draft',
        author: E,
        changeNote: 'First issue.',
        daysAgo: 2,
      },
    ],
  },
  {
    title: 'Ladle crane 2 main hoist rope-drum emergency brake',
    machine: 'LC-2',
    position: 'DB-1',
    sheetType: 'caliper-disc-brake',
    owner: E2,
    revisions: [
      {
        state: 'approved',
        author: E2,
        checker: C2,
        changeNote: 'First issue.',
        vary: [0, 1.05],
        set: CORE_1_0_CALIPER,
        leaveOut: ['loadMass', 'brokenTrainInertia'],
        daysAgo: 200,
      },
      {
        state: 'approved',
        author: E2,
        checker: C,
        changeNote:
          'Re-checked with calculation core 1.2.0: pad p·v and rubbing speed at the speed the brake sets with; no credit for gear losses in the emergency stop (η_bd 0.95 → 1); 2 stops per hour split into 1 service and 1 emergency stop; hoisted mass 10 300 kg entered, so static torque, load speed and inertia are checked against one another; motor maximum speed 2200 rpm from the motor data; shaft rating checked at μ max with the clamp force at the top of its range. All checks pass; no change on site.',
        demoValues: [...RECHECK_1_1, 'loadMass'],
        daysAgo: 6,
      },
      {
        state: 'draft',
        author: E2,
        changeNote:
          'New pads with a lower friction class. The stop with the drive train broken is now checked (drum-side inertia 120 kg·m² from the drum and disc drawings): with the present release unit (0.3 s) the drum would run 0.57 m, so the quick-drop release unit (0.2 s, maker’s data) is fitted with the pads.',
        set: [
          ['muMin', 0.27],
          ['muNominal', 0.32],
          ['muMax', 0.38],
          ['setDelay', { value: 0.2, unit: 's' }],
        ],
        demoValues: ['brokenTrainInertia'],
        daysAgo: 4,
      },
    ],
  },
  {
    title: 'Main hoist brake 1 shoe holder disc-spring stacks',
    machine: 'LC-1',
    position: 'MH-B1',
    sheetType: 'disc-spring-stack',
    owner: E,
    revisions: [
      { state: 'approved', author: E, checker: C, changeNote: 'First issue.', daysAgo: 29 },
    ],
  },
  {
    title: 'Main hoist brake 2 equaliser disc-spring stack',
    machine: 'LC-1',
    position: 'MH-B2',
    sheetType: 'disc-spring-stack',
    owner: E2,
    revisions: [
      {
        state: 'in_check',
        author: E2,
        changeNote: 'First issue.',
        vary: [3, 1.04],
        daysAgo: 2,
        comments: [
          {
            by: C,
            body: 'Checking the back-off angle against the thread pitch now.',
            anchor: { kind: 'check', key: 'first-check' },
          },
        ],
      },
    ],
  },
  {
    title: 'Coil conveyor 4 drive station brake',
    machine: 'CC-4',
    position: 'DR-B1',
    sheetType: 'drive-shoe-brake',
    owner: E2,
    revisions: [
      {
        state: 'draft',
        author: E2,
        changeNote: 'First issue: the new coil conveyor, brake on the motor shaft.',
        daysAgo: 1,
      },
    ],
  },
];
