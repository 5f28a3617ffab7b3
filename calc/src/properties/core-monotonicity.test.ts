import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  averageHeat,
  energyPerHour,
  peakCycleTemperature,
  steadyTemperature,
} from '../energy/heat.js';
import { pivotDistance, pivotedShoeTorque } from '../shoe-brake/pivoted-shoe.js';
import { shoeNormalForce } from '../shoe-brake/shoe-force.js';
import { shortShoeTorque } from '../shoe-brake/short-shoe.js';
import { wornSpringForce } from '../shoe-brake/worn-lining.js';
import { caliperTorque } from '../disc-brake/caliper.js';
import {
  angle,
  area,
  energy,
  force,
  frequency,
  heatTransferCoefficient,
  length,
  power,
  ratio,
  stiffness,
  temperature,
  temperatureDifference,
  time,
} from '../units/quantities.js';

const pos = (min: number, max: number) =>
  fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const pair = (min: number, max: number) =>
  fc
    .tuple(pos(min, max), pos(min, max))
    .filter(([a, b]) => Math.abs(a - b) > Math.max(1e-9 * Math.max(a, b), 1e-12))
    .map(([a, b]): readonly [number, number] => (a < b ? [a, b] : [b, a]));

describe('core monotonicity', () => {
  it('more spring force gives more torque (short-shoe and pivoted-shoe models)', () => {
    fc.assert(
      fc.property(
        pair(10, 1e6),
        pos(0.5, 10),
        pos(0.5, 1),
        pos(0.05, 0.8),
        pos(0.05, 1.5),
        pos(0.2, 1.4),
        ([f1, f2], lever, eta, mu, r, half) => {
          const n1 = shoeNormalForce(force(f1), ratio(lever), ratio(eta));
          const n2 = shoeNormalForce(force(f2), ratio(lever), ratio(eta));
          expect(shortShoeTorque(ratio(mu), n2, length(r))).toBeGreaterThan(
            shortShoeTorque(ratio(mu), n1, length(r)),
          );
          const a = pivotDistance(length(r), angle(half));
          expect(pivotedShoeTorque(ratio(mu), n2, a)).toBeGreaterThan(
            pivotedShoeTorque(ratio(mu), n1, a),
          );
          expect(caliperTorque(ratio(mu), force(f2), length(r), 2, 1)).toBeGreaterThan(
            caliperTorque(ratio(mu), force(f1), length(r), 2, 1),
          );
        },
      ),
      { numRuns: 300 },
    );
  }, 30_000);

  it('more lining wear gives less spring force and so less torque', () => {
    fc.assert(
      // travel ≤ 9 keeps k·w·travel below F, so the spring never goes slack (that case throws by design).
      fc.property(pair(0, 5e-3), pos(0.5, 9), pos(0.1, 0.6), ([w1, w2], travel, mu) => {
        const F = 5e4;
        const k = 1e6;
        const a = wornSpringForce(force(F), stiffness(k), length(w1), ratio(travel));
        const b = wornSpringForce(force(F), stiffness(k), length(w2), ratio(travel));
        expect(b.force).toBeLessThan(a.force);
        const ta = shortShoeTorque(
          ratio(mu),
          shoeNormalForce(force(Math.max(a.force, 0)), ratio(3), ratio(0.95)),
          length(0.2),
        );
        const tb = shortShoeTorque(
          ratio(mu),
          shoeNormalForce(force(Math.max(b.force, 0)), ratio(3), ratio(0.95)),
          length(0.2),
        );
        expect(tb).toBeLessThanOrEqual(ta);
      }),
      { numRuns: 300 },
    );
  }, 30_000);

  it('more stops per hour give more heat, a hotter steady drum and a hotter peak', () => {
    fc.assert(
      fc.property(
        pair(1 / 3600, 600 / 3600),
        pos(100, 1e6),
        pos(5, 100),
        pos(0.05, 5),
        pos(60, 5000),
        ([z1, z2], E, alpha, A, tau) => {
          expect(energyPerHour(frequency(z2), energy(E))).toBeGreaterThan(
            energyPerHour(frequency(z1), energy(E)),
          );
          const p1 = averageHeat(frequency(z1), energy(E));
          const p2 = averageHeat(frequency(z2), energy(E));
          expect(p2).toBeGreaterThan(p1);
          const cool = {
            ambient: temperature(293.15),
            coefficient: heatTransferCoefficient(alpha),
            area: area(A),
          };
          expect(steadyTemperature({ ...cool, averageHeat: power(p2) })).toBeGreaterThan(
            steadyTemperature({ ...cool, averageHeat: power(p1) }),
          );
          const rise = temperatureDifference(20);
          expect(
            peakCycleTemperature(temperature(293.15), rise, frequency(z2), time(tau)),
          ).toBeGreaterThanOrEqual(
            peakCycleTemperature(temperature(293.15), rise, frequency(z1), time(tau)),
          );
        },
      ),
      { numRuns: 300 },
    );
  }, 30_000);
});
