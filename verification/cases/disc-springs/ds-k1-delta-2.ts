import { discSprings } from '../../calc-api.js';
import { defineCase } from '../../case.js';

export const verificationCase = defineCase({
  id: 'ds-k1-delta-2',
  family: 'disc-springs',
  title: 'Factor K1 at δ = De/Di = 2',
  source:
    "DIN EN 16984 (formerly DIN 2092) K1 relation; value 0.6943332 as asserted to 1e-8 by a public implementation's test (reference-values.md §1)",
  confidence: 'derived',
  inputs: { delta: 2 },
  expected: [{ key: 'K1', label: 'K1', value: 0.6943332, unit: '', abs: 1e-7 }],
  toleranceNote: 'the value is quoted to seven decimals: ±1e-7',
  run: () => ({ K1: discSprings.k1(2) }),
});
