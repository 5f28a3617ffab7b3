import { describe, expect, it } from 'vitest';
import { caliperTorque, uniformPressureRadius, uniformWearRadius } from './caliper.js';
import { nearlyEqual } from '../testing/expect-close.js';
import { force, length, ratio } from '../units/quantities.js';

describe('caliper disc brake (Budynas & Nisbett, Shigley MED 8th ed., §16-5)', () => {
  it('uniform-wear radius is the mean radius and below the uniform-pressure radius', () => {
    expect(nearlyEqual(uniformWearRadius(length(0.35), length(0.25)), 0.3, 1e-12)).toBe(true);
    expect(uniformPressureRadius(0.35, 0.25)).toBeGreaterThan(0.3);
    expect(
      nearlyEqual(
        uniformPressureRadius(0.35, 0.25),
        ((2 / 3) * (0.35 ** 3 - 0.25 ** 3)) / (0.35 ** 2 - 0.25 ** 2),
        1e-12,
      ),
    ).toBe(true);
  });
  it('torque = μ·F·r_e·faces·calipers', () => {
    expect(
      nearlyEqual(caliperTorque(ratio(0.4), force(20_000), length(0.3), 2, 2), 9600, 1e-12),
    ).toBe(true);
  });
  it('rejects inner radius ≥ outer radius', () => {
    expect(() => uniformWearRadius(length(0.2), length(0.3))).toThrow(/outer radius/);
  });
});
