import { defineCase } from '../../case.js';
import { length, overspeedChecks, ratio, rpm, speed } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'st-overspeed-at-set',
  family: 'stopping',
  title: 'Overspeed at set: motor and drum speeds from the brake-shaft speed, against their limits',
  source:
    'kinematics (definition): ω_mot = ω_set·i_m, v = ω_set·D/2, ω_rd = ω_set/i_g — values computed by hand (derived); limits are invented test values',
  confidence: 'derived',
  inputs: {
    n_set: '1500 rpm',
    i_m: 1,
    'n_mot,max': '3000 rpm',
    D: '400 mm',
    v_max: '30 m/s',
    i_g: 40,
    'n_rd,max': '40 rpm',
  },
  expected: [
    { key: 'vD', label: 'Drum peripheral speed', value: 10 * Math.PI, unit: 'm/s', rel: 1e-12 },
    { key: 'uMotor', label: 'Motor utilisation', value: 0.5, unit: '', rel: 1e-12 },
    { key: 'uDrum', label: 'Drum utilisation', value: Math.PI / 3, unit: '', rel: 1e-12 },
    { key: 'nRope', label: 'Rope drum speed', value: 37.5, unit: 'rpm', rel: 1e-12 },
    { key: 'drumPass', label: 'Drum check passes (1) or fails (0)', value: 0, unit: '', abs: 0 },
  ],
  toleranceNote: 'exact arithmetic (π·0.4 m·1500/60 s = 10π m/s)',
  run() {
    const r = overspeedChecks({
      setSpeed: rpm(1500),
      motorRatio: ratio(1),
      motorMaxSpeed: rpm(3000),
      drumDiameter: length(0.4),
      drumMaxPeripheralSpeed: speed(30),
      ropeDrum: { gearRatio: ratio(40), maxSpeed: rpm(40) },
    });
    return {
      // Given here (the drum inputs are optional), so the speed is always computed.
      vD: r.drumPeripheralSpeed ?? Number.NaN,
      uMotor: r.checks[0].utilisation,
      uDrum: r.checks[1].utilisation,
      nRope: (r.ropeDrumSpeed! * 30) / Math.PI,
      drumPass: r.checks[1].pass ? 1 : 0,
    };
  },
});
