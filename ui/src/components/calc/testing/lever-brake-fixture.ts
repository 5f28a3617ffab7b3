import {
  CalcInputError,
  parseQuantity,
  type CriteriaSet,
  type SheetEvaluation,
  type SheetInputs,
  type SheetTypeDefinition,
} from '@holdfast/calc';

/**
 * A deliberately small sheet type for UI tests: brake torque = 2 · μ · F · i · r (two shoes, spring
 * force F through lever ratio i onto a drum of radius r), checked against a required torque.
 * It parses inputs with the real calc unit parser, so unit handling and field errors are real.
 */
export const leverBrakeFixture: SheetTypeDefinition = {
  id: 'test-lever-brake',
  title: 'Lever brake (test)',
  description: 'Test fixture',
  fieldCard: { settings: {}, springTables: [] },
  sections: [
    { id: 'duty', title: 'Duty' },
    { id: 'brake', title: 'Brake' },
  ],
  fields: [
    {
      key: 'requiredTorque',
      section: 'duty',
      label: 'Required torque',
      symbol: 'M_req',
      kind: 'quantity',
      dimension: 'torque',
      unitSI: 'N m',
      unitUS: 'lbf ft',
      demo: { value: 1000, unit: 'N m' },
      required: true,
    },
    {
      key: 'springForce',
      section: 'brake',
      label: 'Spring force',
      symbol: 'F_s',
      kind: 'quantity',
      dimension: 'force',
      unitSI: 'N',
      unitUS: 'lbf',
      demo: { value: 2000, unit: 'N' },
      required: true,
      min: 0,
      exclusiveMin: true,
    },
    {
      key: 'leverRatio',
      section: 'brake',
      label: 'Lever ratio',
      symbol: 'i',
      kind: 'number',
      demo: 2,
      required: true,
    },
    {
      key: 'drumDiameter',
      section: 'brake',
      label: 'Drum diameter',
      symbol: 'D',
      kind: 'quantity',
      dimension: 'length',
      unitSI: 'mm',
      unitUS: 'in',
      demo: { value: 400, unit: 'mm' },
      required: true,
    },
    {
      key: 'mu',
      section: 'brake',
      label: 'Friction coefficient',
      symbol: 'μ',
      kind: 'number',
      demo: 0.4,
      required: true,
    },
  ],
  evaluate(inputs: SheetInputs, criteria: CriteriaSet): SheetEvaluation {
    const errors: { field: string; message: string }[] = [];
    const read = <T>(fn: () => T, fallback: T): T => {
      try {
        return fn();
      } catch (e) {
        if (e instanceof CalcInputError) errors.push(...e.fields);
        else throw e;
        return fallback;
      }
    };
    const required = read<number>(
      () => parseQuantity(inputs.requiredTorque, 'torque', 'requiredTorque'),
      0,
    );
    const force = read<number>(() => parseQuantity(inputs.springForce, 'force', 'springForce'), 0);
    const diameter = read<number>(
      () => parseQuantity(inputs.drumDiameter, 'length', 'drumDiameter'),
      0,
    );
    const ratio = typeof inputs.leverRatio === 'number' ? inputs.leverRatio : Number.NaN;
    const mu = typeof inputs.mu === 'number' ? inputs.mu : Number.NaN;
    if (!(ratio > 0))
      errors.push({ field: 'leverRatio', message: 'must be a number greater than 0' });
    if (!(mu > 0)) errors.push({ field: 'mu', message: 'must be a number greater than 0' });
    if (!(force > 0) && !errors.some((e) => e.field === 'springForce'))
      errors.push({ field: 'springForce', message: 'must be greater than 0 N' });
    if (errors.length) throw new CalcInputError(errors);
    const factor = criteria.values.find((v) => v.key === 'torqueFactor')?.value ?? 1;
    const torque = 2 * mu * force * ratio * (diameter / 2);
    const limit = required * factor;
    const pass = torque >= limit;
    return {
      sheetType: 'test-lever-brake',
      coreVersion: 'test',
      criteriaSetId: criteria.id,
      criteriaSetVersion: criteria.version,
      results: [
        {
          key: 'brakeTorque',
          section: 'brake',
          label: 'Brake torque',
          symbol: 'M_b',
          value: torque,
          unit: 'N m',
          dimension: 'torque',
        },
      ],
      checks: [
        {
          id: 'torque',
          section: 'brake',
          label: 'Brake torque against required',
          value: torque,
          limit,
          unit: 'N m',
          dimension: 'torque',
          kind: 'min',
          utilisation: limit / torque,
          pass,
          source: 'test criteria',
          message: '',
        },
      ],
      derivation: [
        {
          id: 'brake-torque',
          section: 'brake',
          label: 'Brake torque',
          symbol: 'M_b',
          formula: 'M_b = 2 · μ · F_s · i · D/2',
          substituted: `M_b = 2 · ${mu} · ${force} N · ${ratio} · ${diameter / 2} m`,
          value: torque,
          unit: 'N m',
          dimension: 'torque',
          reference: 'definition',
        },
      ],
      charts: [],
      fieldSettings: [],
      tables: [],
      warnings: [],
      pass,
    };
  },
};

export const fixtureCriteria: CriteriaSet = {
  id: 'test-set',
  version: 1,
  name: 'Test set',
  description: 'for tests',
  values: [
    {
      key: 'torqueFactor',
      label: 'Torque factor',
      value: 1.5,
      unit: '',
      source: 'test',
      confidence: 'memory',
    },
  ],
};
