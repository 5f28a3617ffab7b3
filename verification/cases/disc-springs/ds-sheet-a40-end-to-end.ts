import { defineCase } from '../../case.js';
import { discSpringStackSheet } from '../../calc-api.js';
import { CODE_TABLE } from '../../helpers/disc-row.js';

const criteria = {
  id: 'verification',
  version: 1,
  name: 'verification',
  description: '',
  values: [],
};

export const verificationCase = defineCase({
  id: 'ds-sheet-a40-end-to-end',
  family: 'disc-springs',
  title:
    'Disc-spring sheet end to end: A 40 set flat and backed off to s = 0.75·h0 on M20×2.5, inputs in US units',
  source: `${CODE_TABLE}: A 40 gives 6500 N at s = 0.75·h0; back-off angle 0.25·h0/P·360° = 32.4° (thread geometry)`,
  confidence: 'secondary',
  inputs: {
    De: '1.574803 in',
    Di: '0.80315 in',
    t: '0.088583 in',
    l0: '0.124016 in',
    P: '2.5 mm',
    theta: '32.4 deg',
    friction: 'none',
    E: '29 877 774 psi (206 000 N/mm²)',
    nu: 0.3,
  },
  expected: [
    { key: 'F', label: 'Preload (no friction)', value: 6500, unit: 'N', rel: 0.005 },
    { key: 's', label: 'Deflection per disc', value: 0.675, unit: 'mm', rel: 2e-4 },
  ],
  toleranceNote:
    'three significant figures in the table (±0.5 %); inch inputs rounded to 1e-6 in (±0.02 % on s)',
  run() {
    const e = discSpringStackSheet.evaluate(
      {
        E: { value: 206000e6 / 6894.757293168361, unit: 'psi' },
        nu: 0.3,
        bEnabled: false,
        aEnabled: true,
        aSize: 'custom',
        atReduced: '0 mm',
        aSeries: 1,
        aParallel: 1,
        aDe: '1.574803 in',
        aDi: '0.80315 in',
        at: '0.088583 in',
        al0: '0.124016 in',
        aPitch: '2.5 mm',
        aBackOff: '32.4 deg',
        aBackOffTolerance: '15 deg',
        aFrictionCone: 0,
        aFrictionEdge: 0,
        aRequiredPreload: '0 N',
      },
      criteria,
    );
    const get = (k: string) => e.results.find((r) => r.key === k)?.value ?? Number.NaN;
    return { F: get('a.preload'), s: get('a.setDeflection') * 1e3 };
  },
});
