import { defineCase } from '../../case.js';
import { driveTrainOverload, force, ratio, torque } from '../../calc-api.js';

export const verificationCase = defineCase({
  id: 'du-drive-train-top-of-range',
  family: 'duty',
  title: 'Drive-train overload: brake torque at μ max with the spring at the top of its range',
  source:
    "torque ∝ μ·F_s for short and pivoted shoes and disc brakes (Budynas & Nisbett, Shigley's MED 8th ed., §16-2, §16-4, §16-5); values computed by hand (derived)",
  confidence: 'derived',
  inputs: {
    'M_ref (μ 0.40, F_s 1000 N)': '400 N·m',
    'μ max': 0.5,
    'F_s,max': '1500 N',
    'brakes on the train': 2,
    'drive-train rating': '1600 N·m',
  },
  expected: [
    // 400 · 0.5/0.4 · 1500/1000 = 750 N·m; two brakes 1500 N·m ≤ 1600 N·m
    {
      key: 'M',
      label: 'Torque at the top of the range, one brake',
      value: 750,
      unit: 'N·m',
      rel: 1e-12,
    },
    {
      key: 'Mtrain',
      label: 'Torque on the drive train, both brakes',
      value: 1500,
      unit: 'N·m',
      rel: 1e-12,
    },
    { key: 'u', label: 'Utilisation of the rating', value: 0.9375, unit: '', rel: 1e-12 },
  ],
  toleranceNote: 'exact arithmetic',
  run() {
    const r = driveTrainOverload({
      torqueAtReference: torque(400),
      muAtReference: ratio(0.4),
      springForceAtReference: force(1000),
      muMax: ratio(0.5),
      springForceMax: force(1500),
      brakesOnTrain: 2,
      driveTrainRating: torque(1600),
    });
    return { M: r.torqueTopOfRange, Mtrain: r.trainTorque, u: r.check.utilisation };
  },
});
