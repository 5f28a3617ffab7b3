import { bench, describe } from 'vitest';
import { getCriteriaSet } from '../criteria/lookup.js';
import { demoInputs, sheetTypes } from '../sheets/registry.js';
import { wornTorqueFraction } from '../shoe-brake/worn-lining.js';
import { pivotedTorqueFormula } from '../shoe-brake/pivoted-shoe.js';

const criteria = getCriteriaSet('general-industry')!;

describe('full sheet evaluation (inputs parsed, every step with formula text and substitution)', () => {
  for (const sheet of sheetTypes) {
    const inputs = demoInputs(sheet);
    bench(sheet.id, () => {
      sheet.evaluate(inputs, criteria);
    });
  }
});

describe('sweeps', () => {
  bench('torque vs lining wear, 10 000 points (formula evaluate per point)', () => {
    const N0 = 2612.5;
    let acc = 0;
    for (let k = 0; k < 10_000; k++) {
      const w = (0.004 * k) / 9_999;
      const f = wornTorqueFraction(1100, 40_000, w, 5);
      acc += pivotedTorqueFormula.evaluate({ n: 2, a: 0.2123, mu: 0.3, N: N0 * f });
    }
    if (!Number.isFinite(acc)) throw new Error('sweep produced a non-finite value');
  });
});
