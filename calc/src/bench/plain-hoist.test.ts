import { describe, expect, it } from 'vitest';
import { getCriteriaSet } from '../criteria/lookup.js';
import { demoInputs, getSheetType } from '../sheets/registry.js';
import { PLAIN_DEMO_HOIST, plainHoist } from './plain-hoist.js';

// The benchmark's plain-arithmetic hoist sheet must compute what the sheet computes, or the ratio
// `npm run bench` prints compares different work.
const sheet = getSheetType('hoist-shoe-brake')!;
const evaluation = sheet.evaluate(demoInputs(sheet), getCriteriaSet('general-industry')!);
const plain = plainHoist(PLAIN_DEMO_HOIST);

const close = (actual: number, expected: number, what: string) =>
  expect(Math.abs(actual - expected), what).toBeLessThanOrEqual(1e-9 * Math.abs(expected));

describe('plain-arithmetic hoist sheet (benchmark)', () => {
  it('gives every check of the sheet: value, limit, utilisation', () => {
    expect(Object.keys(plain.checks).sort()).toEqual(evaluation.checks.map((c) => c.id).sort());
    for (const c of evaluation.checks) {
      const [value, limit, utilisation] = plain.checks[c.id]!;
      close(value, c.value, `${c.id} value`);
      close(limit, c.limit, `${c.id} limit`);
      close(utilisation, c.utilisation, `${c.id} utilisation`);
    }
    expect(plain.pass).toBe(evaluation.pass);
  });

  it('gives the key results of the sheet', () => {
    const step = (id: string) => evaluation.derivation.find((s) => s.id === id)!.value;
    const pairs: [number, string][] = [
      [plain.motorTorque, 'motor-torque'],
      [plain.requiredTorque, 'required-torque'],
      [plain.torqueNominal, 'torque-nominal'],
      [plain.torqueMin, 'torque-min'],
      [plain.torqueMax, 'torque-max'],
      [plain.torqueWornMin, 'torque-worn-min'],
      [plain.torqueDrumLimit, 'torque-drum-limit'],
      [plain.stoppingDistance, 'stopping-distance'],
      [plain.stoppingTime, 'stopping-time'],
      [plain.peakTemperature, 'peak-temperature'],
      [plain.thrusterForceRatio, 'thruster-force-ratio'],
      [plain.springShearStress, 'spring-shear-stress'],
      [plain.holderPreload, 'holder-preload'],
      [plain.equaliserPreload, 'equaliser-preload'],
      [plain.baseBoltTension, 'base-bolt-tension'],
    ];
    for (const [value, id] of pairs) close(value, step(id), id);
  });
});
