import { Derivation } from '../core/step.js';
import { describe, expect, it } from 'vitest';
import { shoeNormalForce } from './shoe-force.js';
import { shortShoeTorque } from './short-shoe.js';
import {
  pivotDistance,
  pivotedNormalForce,
  pivotedPeakPressure,
  pivotedShoeTorque,
} from './pivoted-shoe.js';
import { shoeFromActuatingForce, shoeMomentCoefficients, actuatingForce } from './general-shoe.js';
import { wornSpringForce, wornTorqueFraction } from './worn-lining.js';
import { liningDuty } from './lining-duty.js';
import { CalcInputError } from '../core/errors.js';
import { nearlyEqual } from '../testing/expect-close.js';
import { degrees, force, length, pressure, ratio, rpm, stiffness } from '../units/quantities.js';

const close = (a: number, b: number, rel: number, abs = 0) =>
  expect(nearlyEqual(a, b, rel, abs), `${a} vs ${b}`).toBe(true);
const deg = (x: number) => (x * Math.PI) / 180;

describe('shoe normal force and short shoe', () => {
  it('N = F·i·η and M = 2μNr', () => {
    close(shoeNormalForce(force(5000), ratio(2.5), ratio(0.95)), 11_875, 1e-12);
    close(shortShoeTorque(ratio(0.35), force(12_400), length(0.2)), 1736, 1e-12);
  });
  it('rejects μ outside (0, 1]', () => {
    expect(() => shortShoeTorque(ratio(0), force(1), length(1))).toThrow(CalcInputError);
  });
});

describe('pivoted symmetrical shoe (Budynas & Nisbett, Shigley MED 8th ed., §16-4)', () => {
  it('Problem 16-8: θ2 = 60° gives a = 1.170·r (±0.001·r)', () => {
    close(pivotDistance(length(1), degrees(60)), 1.17, 0, 0.001);
  });
  it('derived instance (reference-values §2): N = 18 502.6 N, a = 0.29253 m, T = 1894.4 N·m per shoe', () => {
    const N = pivotedNormalForce(pressure(0.5e6), length(0.1), length(0.25), degrees(60));
    close(N, 18_502.6, 1e-5);
    const a = pivotDistance(length(0.25), degrees(60));
    close(a, 0.29253, 2e-5);
    close(pivotedShoeTorque(ratio(0.35), N, a, 1), 1894.4, 5e-5);
    close(pivotedPeakPressure(N, length(0.1), length(0.25), degrees(60)), 0.5e6, 1e-12);
  });
  it('pivoted torque exceeds short-shoe torque for the same N by a/r', () => {
    const a = pivotDistance(length(0.2), degrees(45));
    expect(a).toBeGreaterThan(0.2);
  });
  it('rejects half-angles at or above 90°', () => {
    expect(() => pivotDistance(length(0.2), degrees(90))).toThrow(/halfAngle/);
  });
});

describe('general shoe moments (Budynas & Nisbett, Shigley MED 8th ed., Problem 16-1)', () => {
  const g = { f: 0.28, b: 1.5, r: 6, a: 5, theta1: 0, theta2: deg(120) };
  it('Mf = 17.96·pa and MN = 56.87·pa (lbf·in per psi), ±0.5 %', () => {
    const k = shoeMomentCoefficients(g);
    close(k.mf, 17.96, 5e-3);
    close(k.mn, 56.87, 5e-3);
  });
  it('pa = 111.4 psi (right, self-energising) and 57.9 psi (left); torques 2530 + 1310 = 3840 lbf·in, ±0.5 %', () => {
    const right = shoeFromActuatingForce(g, 500, 8.66, true);
    const left = shoeFromActuatingForce(g, 500, 8.66, false);
    close(right.maxPressure, 111.4, 5e-3);
    close(left.maxPressure, 57.9, 5e-3);
    close(right.shoeTorque, 2530, 5e-3);
    close(left.shoeTorque, 1310, 5e-3);
    close(right.shoeTorque + left.shoeTorque, 3840, 5e-3);
    close(actuatingForce(g, right.maxPressure, 8.66, true), 500, 1e-12);
  });
  it('the recorded derivation reproduces the same values and closes back on F', () => {
    const d = new Derivation('shoe');
    const right = shoeFromActuatingForce(g, 500, 8.66, true, d);
    const plain = shoeFromActuatingForce(g, 500, 8.66, true);
    expect(d.steps.map((s) => s.id)).toEqual([
      'theta-a',
      'max-pressure',
      'friction-moment',
      'normal-moment',
      'shoe-torque',
      'actuating-force',
    ]);
    close(right.maxPressure, plain.maxPressure, 1e-12);
    close(right.shoeTorque, plain.shoeTorque, 1e-12);
    close(right.mf, 17.96, 5e-3);
    close(d.value('actuating-force'), 500, 1e-12);
    expect(d.steps[1].formula).toContain('p_a = F · c · sin(θ_a)');
    expect(d.steps[2].substituted).toMatch(/^M_f = 0\.28 · /);
    const e = new Derivation('shoe');
    close(
      actuatingForce(g, plain.maxPressure, 8.66, false, e),
      actuatingForce(g, plain.maxPressure, 8.66, false),
      1e-12,
    );
    expect(e.steps.at(-1)?.formula).toBe('F = (M_N + M_f) / c');
  });
  it('a self-locking shoe is an input error', () => {
    expect(() => shoeFromActuatingForce({ ...g, f: 1, a: 1 }, 500, 8.66, true)).toThrow(
      /self-locks/,
    );
  });
});

describe('worn lining', () => {
  it('spring extends by w·r_s and loses k·ΔL', () => {
    const r = wornSpringForce(force(5000), stiffness(100_000), length(0.002), ratio(5));
    close(r.extension, 0.01, 1e-12);
    close(r.force, 4000, 1e-12);
    close(wornTorqueFraction(5000, 100_000, 0.002, 5), 0.8, 1e-12);
  });
  it('with relaxation ρ_s the spring starts from F_s·(1 − ρ_s): 5000·0.97 − 1000 = 3850 N', () => {
    const d = new Derivation('lining');
    const r = wornSpringForce(force(5000), stiffness(100_000), length(0.002), ratio(5), d, {
      relaxation: ratio(0.03),
    });
    close(r.force, 3850, 1e-12);
    expect(d.find('spring-force-relaxed')!.substituted).toBe('F_s,r = 5000 N · (1 − 0.03)');
    expect(d.find('worn-spring-force')!.formula).toBe('F_s,w = F_s,r − k_s · ΔL_s');
    expect(() =>
      wornSpringForce(force(5000), stiffness(100_000), length(0.002), ratio(5), undefined, {
        relaxation: ratio(1),
      }),
    ).toThrow(
      expect.objectContaining({ fields: [expect.objectContaining({ field: 'springRelaxation' })] }),
    );
  });
  it('a spring that would go slack is reported on the wear field', () => {
    try {
      wornSpringForce(force(5000), stiffness(100_000), length(0.02), ratio(5));
      throw new Error('accepted');
    } catch (e) {
      expect((e as CalcInputError).fields[0].field).toBe('wear');
    }
  });
});

describe('lining duty', () => {
  it('projected area, mean pressure, rubbing speed and pv', () => {
    const r = liningDuty({
      normalForce: force(10_000),
      width: length(0.1),
      drumDiameter: length(0.4),
      contactAngle: degrees(90),
      brakeSpeed: rpm(1000),
    });
    close(r.projectedArea, 0.1 * 0.4 * Math.sin(deg(45)), 1e-12);
    close(r.meanPressure, 10_000 / (0.04 * Math.SQRT1_2), 1e-12);
    close(r.rubbingSpeed, ((1000 * Math.PI) / 30) * 0.2, 1e-12);
    close(r.pv, r.meanPressure * r.rubbingSpeed, 1e-12);
  });
});
