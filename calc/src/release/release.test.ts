import { describe, expect, it } from 'vitest';
import { releaseAndStroke } from './release.js';
import { springLength, settingTable } from '../spring-setting/setting-table.js';
import { nearlyEqual } from '../testing/expect-close.js';
import { force, length, ratio, stiffness } from '../units/quantities.js';

const close = (a: number, b: number, rel: number, abs = 0) =>
  expect(nearlyEqual(a, b, rel, abs), `${a} vs ${b}`).toBe(true);

const input = {
  springForce: force(5000),
  springRate: stiffness(100_000),
  clearance: length(0.001),
  springTravelRatio: ratio(5),
  thrusterTravelRatio: ratio(20),
  efficiency: ratio(0.9),
  thrusterForce: force(2000),
  nominalStroke: length(0.06),
  reserveStroke: length(0.025),
  wear: length(0.001),
  minReserveStroke: length(0.005),
};

describe('release and stroke budget', () => {
  it('virtual work through the linkage and the stroke budget', () => {
    const r = releaseAndStroke(input);
    close(r.releasedSpringForce, 5500, 1e-12);
    close(r.thrusterForceNeeded, (5500 * 5) / (20 * 0.9), 1e-12);
    close(r.forceRatio, 2000 / r.thrusterForceNeeded, 1e-12);
    close(r.workingStroke, 0.02, 1e-12);
    close(r.headroom, 0.015, 1e-12);
    close(r.wornReserveStroke, 0.005, 1e-12);
    close(r.wearToReadjust, 0.001, 1e-12);
    expect(r.warnings).toEqual([]);
  });
  it('warns when the reserve reaches zero', () => {
    const r = releaseAndStroke({ ...input, wear: length(0.002) });
    expect(r.wornReserveStroke).toBeLessThanOrEqual(0);
    expect(r.warnings[0]).toMatch(/can lose all holding torque/);
  });
});

describe('spring setting', () => {
  it('L = L0 − F/k and the table spans the range linearly', () => {
    close(springLength(length(0.3), force(10_000), stiffness(100_000)), 0.2, 1e-12);
    const rows = settingTable(2000, 8000, 0.3, 100_000, 0.4, 0.3, 7);
    expect(rows).toHaveLength(7);
    close(rows[0].springLength, 0.28, 1e-12);
    close(rows[6].torqueNominal, 3200, 1e-12);
    close(rows[3].springForce, 5000, 1e-12);
  });
  it('a spring compressed to zero length is rejected', () => {
    expect(() => springLength(length(0.1), force(20_000), stiffness(100_000))).toThrow(
      /spring force/,
    );
  });
});
