import {
  force,
  leverBending,
  length,
  pinStrength,
  pressure,
  ratio,
  shoePinLoad,
} from '../../calc-api.js';
import { defineCase } from '../../case.js';

// The companion's printed sizes: fulcrum pin d_f × l_f and lever section b × d (mm).
const PIN = { d: 20.242469, l: 25.303086 };
const SECTION = { b: 16.09149, h: 48.274469 };
const F = 5000;
const P = 1111.111111;

export const verificationCase = defineCase({
  id: 'lv-bhandari-4-16',
  family: 'levers',
  title: 'Bell-crank lever: bending stress of the lever section, fulcrum pin bearing pressure',
  source:
    'Bhandari, Design of Machine Elements (McGraw-Hill), Example 4.16, as coded in the FOSSEE Scilab Textbook Companion, book 764 (load F 5 kN on the 100 mm arm, effort P = F·100/450 = 1111.111111 N on the 450 mm arm; 30C8, S_yt 400 MPa, factor of safety 5: σ = 80 MPa; p = 10 MPa, l/d 1.25, section d/b 3; printed sizes: fulcrum pin d 20.242469 mm, l 25.303086 mm; lever section b 16.091490 mm, d 48.274469 mm; reaction R = √(F² + P²), M = F·100 mm)',
  confidence: 'secondary',
  inputs: {
    F: '5 kN at 100 mm',
    P: '1111.111111 N at 450 mm',
    'pin d × l': '20.242469 × 25.303086 mm',
    'section b × d': '16.091490 × 48.274469 mm',
  },
  expected: [
    { key: 'M', label: 'Bending moment in the lever', value: 500, unit: 'N·m', rel: 1e-12 },
    {
      key: 'sigma',
      label: 'Bending stress at the printed section',
      value: 80,
      unit: 'MPa',
      rel: 1e-6,
    },
    {
      key: 'p',
      label: 'Bearing pressure on the printed fulcrum pin',
      value: 10,
      unit: 'MPa',
      rel: 1e-6,
    },
  ],
  toleranceNote:
    'the companion prints the sizes to 1e-6 mm (about 1e-7 relative); the stresses are the permissible values the example sizes to',
  run() {
    const lever = leverBending({
      force: force(F),
      momentArm: length(0.1),
      width: length(SECTION.b * 1e-3),
      depth: length(SECTION.h * 1e-3),
      allowableStress: pressure(80e6),
    });
    // R = √(F² + P²) is the shoe-pin resultant with i = 1 and "μ" = P/F.
    const R = shoePinLoad({ leverRatio: ratio(1), springForce: force(F), muMax: ratio(P / F) });
    const pin = pinStrength({
      load: R,
      diameter: length(PIN.d * 1e-3),
      bearingLength: length(PIN.l * 1e-3),
      allowableShear: pressure(40e6),
      allowableBearing: pressure(10e6),
    });
    return { M: lever.moment, sigma: lever.stress / 1e6, p: pin.bearingPressure / 1e6 };
  },
});
