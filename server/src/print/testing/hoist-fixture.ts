import type { FieldDefinition, SheetEvaluation } from '@holdfast/calc';
import { buildPrintableSheet, type RevisionLike, type SheetLike } from '../build-printable-sheet.js';
import type { Paper, PrintableSheet, PrintRevisionState, PrintUnitSystem } from '../printable-sheet.js';

/**
 * A hand-made, invented hoist sheet used to exercise every part of the printout (demo data,
 * not a design). The numbers are consistent enough to read, not a verified calculation.
 */
const fields: FieldDefinition[] = [
  { key: 'motorPower', section: 'duty', label: 'Motor rated power', symbol: 'P_m', kind: 'quantity', dimension: 'power', unitSI: 'kW', unitUS: 'hp', default: { value: 90, unit: 'kW' } },
  { key: 'motorSpeed', section: 'duty', label: 'Motor rated speed', symbol: 'n_m', kind: 'quantity', dimension: 'angularSpeed', unitSI: 'rpm', unitUS: 'rpm', default: { value: 985, unit: 'rpm' } },
  { key: 'torqueReference', section: 'duty', label: 'Torque reference', symbol: 'ref', kind: 'choice', default: 'motor', choices: [{ value: 'motor', label: 'Motor rated torque' }, { value: 'load', label: 'Static load torque' }] },
  { key: 'gearEfficiency', section: 'duty', label: 'Gear efficiency (load driving)', symbol: 'η_g', kind: 'number', default: 0.94 },
  { key: 'drumDiameter', section: 'brake', label: 'Brake drum diameter', symbol: 'D', kind: 'quantity', dimension: 'length', unitSI: 'mm', unitUS: 'in', default: { value: 500, unit: 'mm' } },
  { key: 'springForce', section: 'brake', label: 'Main spring force at set length', symbol: 'F_s', kind: 'quantity', dimension: 'force', unitSI: 'kN', unitUS: 'lbf', default: { value: 12.4, unit: 'kN' } },
  { key: 'leverRatio', section: 'brake', label: 'Lever ratio', symbol: 'i_L', kind: 'number', default: 2.6 },
  { key: 'muMin', section: 'lining', label: 'Friction coefficient, minimum', symbol: 'μ_min', kind: 'number', default: 0.35 },
  { key: 'liningWidth', section: 'lining', label: 'Lining width', symbol: 'b', kind: 'quantity', dimension: 'length', unitSI: 'mm', unitUS: 'in', default: { value: 190, unit: 'mm' } },
  { key: 'hotMetal', section: 'duty', label: 'Hot-metal duty', symbol: 'HM', kind: 'boolean', default: true },
];

const step = (id: string, section: string, label: string, symbol: string, formula: string, substituted: string, value: number, unit: string, dimension: SheetEvaluation['derivation'][number]['dimension'], reference: string) =>
  ({ id, section, label, symbol, formula, substituted, value, unit, dimension, reference });

export function hoistEvaluation(opts: { failing?: boolean } = {}): SheetEvaluation {
  const derivation = [
    step('motorTorque', 'duty', 'Motor rated torque', 'T_m', 'T_m = P_m / ω_m', 'T_m = 90.00 kW / 103.1 rad/s', 872.5, 'N m', 'torque', 'definition'),
    step('required', 'duty', 'Required brake torque', 'T_req', 'T_req = k · T_m', 'T_req = 2.000 · 872.5 N·m', 1745, 'N m', 'torque', 'Criteria set: torque factor k (see design basis)'),
    ...Array.from({ length: 14 }, (_, i) =>
      step(`shoe${i}`, 'brake', `Shoe force check ${i + 1} (η ≤ 1, √ of Δθ · σ)`, `N_${i}`, 'N = F_s · i_L · η_L => N ≥ 0', `N = 12.40 kN · 2.600 · 0.95${i}`, 30630 + i * 10, 'N', 'force', 'Textbook of machine elements, 3rd ed., §12.4 (from memory — check)'),
    ),
    step('torqueMin', 'brake', 'Brake torque at μ_min', 'T_b,min', 'T_b = 2 · μ_min · N · D/2', 'T_b = 2 · 0.3500 · 30.63 kN · 250.0 mm', 5360, 'N m', 'torque', 'Short-shoe approximation, common practice'),
    step('torqueWorn', 'wear', 'Brake torque at fully worn lining', 'T_b,w', 'T_b,w = T_b · F_s,w / F_s', 'T_b,w = 5.360 kN·m · 11.10 kN / 12.40 kN', 4798, 'N m', 'torque', 'Spring rate and wear extension, common practice'),
    step('pressure', 'lining', 'Mean lining pressure', 'p', 'p = N / (b · L)', 'p = 30.63 kN / (190.0 mm · 300.0 mm)', 0.537e6, 'Pa', 'pressure', 'definition'),
    step('energy', 'energy', 'Energy per stop', 'E', 'E = ½ · J · ω² + m · g · s', 'E = ½ · 12.30 kg·m² · (103.1 rad/s)² + …', 96_300, 'J', 'energy', 'definition'),
    step('tempRise', 'energy', 'Temperature rise per stop', 'ΔT', 'ΔT = E / (m_d · c)', 'ΔT = 96.30 kJ / (85.00 kg · 460.0 J/(kg·K))', 2.46, 'K', 'temperatureDifference', 'definition'),
  ];
  const check = (id: string, label: string, value: number, limit: number, kind: 'max' | 'min', dimension: SheetEvaluation['checks'][number]['dimension'], unit: string, source: string) => {
    const utilisation = kind === 'max' ? value / limit : limit / value;
    return { id, section: 'checks', label, value, limit, unit, dimension, kind, utilisation, pass: utilisation <= 1, source, message: `${label}: utilisation ${(utilisation * 100).toFixed(0)} %` };
  };
  const checks = [
    check('torqueMin', 'Torque at minimum friction ≥ required', 5360, 1745, 'min', 'torque', 'N m', 'Demo criteria: torque factor 2.0 (common practice)'),
    check('torqueWorn', 'Torque at worn lining ≥ required', 4798, 1745, 'min', 'torque', 'N m', 'Demo criteria: torque factor 2.0 (common practice)'),
    check('pressure', 'Mean lining pressure', 0.537e6, 0.8e6, 'max', 'pressure', 'Pa', 'Lining maker data sheet (demo)'),
    check('pv', 'Pressure × rubbing speed', 7.2e6, 5e6, opts.failing ? 'max' : 'min', 'pv', 'Pa m/s', 'Lining maker data sheet (demo)'),
    check('temp', 'Drum steady temperature', 523.15, 573.15, 'max', 'temperature', 'K', 'common practice'),
    check('stopTime', 'Stopping time', 0.9, 1.5, 'max', 'time', 's', 'Demo duty specification'),
    check('reserve', 'Reserve stroke remaining', 0.018, 0.01, 'min', 'length', 'm', 'common practice'),
  ];
  const curve = Array.from({ length: 21 }, (_, i) => ({ x: i * 0.0002, y: 40000 * (i / 20) * (1.6 - 0.6 * (i / 20)) }));
  const wear = Array.from({ length: 11 }, (_, i) => ({ x: i * 0.0006, y: 5360 - 56 * i }));
  const stop = Array.from({ length: 16 }, (_, i) => ({ x: i * 0.06, y: Math.max(0, 103 - (i * 0.06 < 0.15 ? 0 : (i * 0.06 - 0.15) * 137)) }));
  return {
    sheetType: 'hoist-shoe-brake',
    coreVersion: '0.3.0-fixture',
    criteriaSetId: 'demo-hoist',
    criteriaSetVersion: 3,
    results: [],
    checks,
    derivation,
    charts: [
      { id: 'disc', title: 'Disc-spring stack: load against deflection', xLabel: 'Deflection s', xUnit: 'm', xDimension: 'length', yLabel: 'Load F', yUnit: 'N', yDimension: 'force', series: [{ name: 'Stack of 3 in series', points: curve }], markers: [{ label: 'Set point', x: 0.0021, y: 28000 }], referenceLines: [{ label: 'Flat (s = h₀)', axis: 'x', value: 0.004 }] },
      { id: 'wear', title: 'Brake torque against lining wear', xLabel: 'Wear', xUnit: 'm', xDimension: 'length', yLabel: 'Torque', yUnit: 'N m', yDimension: 'torque', series: [{ name: 'μ_min', points: wear }, { name: 'μ_nom', points: wear.map((p) => ({ x: p.x, y: p.y * 1.2 })) }], referenceLines: [{ label: 'Required torque', axis: 'y', value: 1745 }] },
      { id: 'stop', title: 'Stopping curve', xLabel: 'Time', xUnit: 's', xDimension: 'time', yLabel: 'Motor speed', yUnit: 'rad/s', yDimension: 'angularSpeed', series: [{ name: 'Speed', points: stop }], markers: [{ label: 'Brake sets', x: 0.15, y: 103 }] },
    ],
    fieldSettings: [
      { key: 'springLength', label: 'Main spring set length', value: 0.2315, unit: 'm', dimension: 'length', note: 'measured between spring cups' },
      { key: 'springForce', label: 'Main spring force at set length', value: 12400, unit: 'N', dimension: 'force' },
      { key: 'thrusterStroke', label: 'Thruster working stroke', value: 0.05, unit: 'm', dimension: 'length' },
      { key: 'reserveStroke', label: 'Minimum reserve stroke to keep', value: 0.01, unit: 'm', dimension: 'length' },
      { key: 'shoeClearance', label: 'Shoe clearance each side', value: 0.0008, unit: 'm', dimension: 'length' },
      { key: 'holder.backOff', label: 'Shoe-holder stack: back-off angle', value: Math.PI / 3, unit: 'rad', dimension: 'angle', note: 'common practice, no published source' },
      { key: 'holder.preload', label: 'Shoe-holder stack: preload', value: 3100, unit: 'N', dimension: 'force' },
      { key: 'equaliser.backOff', label: 'Equaliser stack: back-off angle', value: Math.PI, unit: 'rad', dimension: 'angle', note: 'common practice, no published source' },
      { key: 'equaliser.preload', label: 'Equaliser stack: preload', value: 5200, unit: 'N', dimension: 'force' },
    ],
    tables: [
      {
        id: 'springSetting',
        title: 'Spring setting table',
        columns: [
          { key: 'torque', label: 'Brake torque', unit: 'N m', dimension: 'torque' },
          { key: 'force', label: 'Spring force', unit: 'N', dimension: 'force' },
          { key: 'length', label: 'Spring length', unit: 'm', dimension: 'length' },
        ],
        rows: Array.from({ length: 8 }, (_, i) => ({ torque: 3000 + i * 500, force: 6940 + i * 1157, length: 0.26 - i * 0.004 })),
      },
    ],
    warnings: ['Hot-metal duty: the governing standard may require two brakes (check).'],
    pass: !opts.failing,
  };
}

const alice = { displayName: 'Ada Demo', initials: 'AD' };
const bob = { displayName: 'Ben Checker', initials: 'BC' };

export function hoistPrintable(o: { state: PrintRevisionState; paper?: Paper; unitSystem?: PrintUnitSystem; failing?: boolean }): PrintableSheet {
  const approvedLike = o.state === 'approved' || o.state === 'superseded';
  const revision: RevisionLike = {
    label: 'B',
    state: o.state,
    author: alice,
    checker: approvedLike || o.state === 'in_check' ? bob : null,
    changeNote: 'Heavier ladle: hook load 80 t → 95 t; new spring.',
    createdAt: '2026-11-02T08:00:00Z',
    submittedAt: o.state === 'draft' ? null : '2026-11-03T09:30:00Z',
    approvedAt: approvedLike ? '2026-11-04T14:00:00Z' : null,
    inputs: { motorPower: { value: 90, unit: 'kW' }, motorSpeed: { value: 985, unit: 'rpm' }, torqueReference: 'motor', gearEfficiency: 0.94, drumDiameter: { value: 500, unit: 'mm' }, springForce: { value: 12.4, unit: 'kN' }, leverRatio: 2.6, muMin: 0.35, liningWidth: { value: 7.48, unit: 'in' }, hotMetal: true },
    unitSystem: o.unitSystem ?? 'SI',
    criteriaSetVersion: 3,
    evaluation: hoistEvaluation({ failing: o.failing }),
    coreVersion: '0.3.0-fixture',
    verificationCode: approvedLike ? 'HF7K-2QX9' : null,
    justification: o.failing ? 'PV exceeds the lining limit only in the rare emergency stop; lining maker confirmed by letter (attached).' : null,
    supersededBy: o.state === 'superseded' ? { label: 'C', at: '2026-11-20T10:00:00Z' } : null,
  };
  const sheet: SheetLike = {
    documentNumber: 'HF-DEMO-0042',
    title: 'Ladle crane main hoist — holding brake 1',
    site: { code: 'NSW', name: 'North Shore Works (demo)' },
    machine: { tag: 'LC-2', name: 'Ladle crane 2' },
    position: { tag: 'MH-B1', description: 'main hoist, brake 1 (high-speed shaft)' },
    revisions: [
      { label: 'A', state: 'superseded', author: alice, checker: bob, changeNote: 'First issue.', createdAt: '2026-03-01T08:00:00Z', approvedAt: '2026-03-05T08:00:00Z' },
      revision,
      { label: 'C', state: 'draft', author: alice, checker: null, changeNote: 'Later draft (not printed in B).', createdAt: '2026-11-19T08:00:00Z' },
    ],
  };
  return buildPrintableSheet({
    sheet,
    revision,
    sheetType: { id: 'hoist-shoe-brake', title: 'Hoist shoe brake', description: 'Thruster-released spring-set shoe brake on a crane hoist.', sections: [{ id: 'duty', title: 'Duty' }, { id: 'brake', title: 'Brake' }, { id: 'lining', title: 'Lining' }, { id: 'wear', title: 'Wear' }, { id: 'energy', title: 'Energy and heat' }], fields },
    criteriaSet: { id: 'demo-hoist', version: 3, name: 'Demo hoist criteria', description: 'demo', values: [{ key: 'torqueFactor', label: 'Torque factor k', value: 2, unit: '', source: 'common practice', confidence: 'common practice' }, { key: 'pMax', label: 'Lining pressure limit', value: 0.8, unit: 'MPa', source: 'Lining maker data sheet (demo)', confidence: 'secondary' }] },
    verifyBaseUrl: 'https://holdfast.example.test/',
    paper: o.paper ?? 'A4',
    generatedAt: new Date('2026-12-01T12:00:00Z'),
  });
}
