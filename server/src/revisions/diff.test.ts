import { describe, expect, it } from 'vitest';
import type { SheetEvaluation } from '@holdfast/calc';
import { diffChecks, diffInputs, diffResults, moved } from './diff.js';

const evaluation = (
  results: [string, number][],
  checks: [string, number, boolean][],
): SheetEvaluation =>
  ({
    results: results.map(([key, value]) => ({
      key,
      label: key,
      value,
      unit: 'N*m',
      section: 's',
      symbol: 'x',
      dimension: 'torque',
    })),
    checks: checks.map(([id, value, pass]) => ({
      id,
      label: id,
      value,
      limit: 1,
      utilisation: value,
      pass,
      unit: '',
      kind: 'max',
      section: 's',
      dimension: 'dimensionless',
      source: 's',
      message: '',
    })),
  }) as unknown as SheetEvaluation;

describe('diff', () => {
  it('treats relative changes up to 1e-9 as unchanged', () => {
    expect(moved(1000, 1000 * (1 + 5e-10))).toBe(false);
    expect(moved(1000, 1000 * (1 + 5e-9))).toBe(true);
    expect(moved(0, 0)).toBe(false);
    expect(moved(0, 1e-12)).toBe(false);
  });

  it('lists moved, added and removed results with delta and percent', () => {
    const d = diffResults(
      evaluation(
        [
          ['a', 100],
          ['b', 5],
          ['gone', 1],
        ],
        [],
      ),
      evaluation(
        [
          ['a', 110],
          ['b', 5],
          ['new', 2],
        ],
        [],
      ),
    );
    expect(d.map((r) => r.key).sort()).toEqual(['a', 'gone', 'new']);
    const a = d.find((r) => r.key === 'a')!;
    expect(Math.abs(a.delta! - 10)).toBeLessThan(1e-12);
    expect(Math.abs(a.deltaPct! - 10)).toBeLessThan(1e-9);
    expect(d.find((r) => r.key === 'gone')).toMatchObject({ from: 1, to: null, delta: null });
  });

  it('gives absolute temperatures a difference in kelvin but no percent change', () => {
    const temp = (k: number) => {
      const e = evaluation([['t', k]], []);
      e.results[0] = { ...e.results[0], unit: 'K', dimension: 'temperature' };
      return e;
    };
    const [t] = diffResults(temp(413.6), temp(468.8));
    expect(t).toMatchObject({ dimension: 'temperature', deltaPct: null });
    expect(Math.abs(t.delta! - 55.2)).toBeLessThan(1e-9);
  });

  it('reports checks whose verdict or value changed', () => {
    const d = diffChecks(
      evaluation(
        [],
        [
          ['c1', 0.5, true],
          ['c2', 0.9, true],
        ],
      ),
      evaluation(
        [],
        [
          ['c1', 0.5, true],
          ['c2', 1.1, false],
        ],
      ),
    );
    expect(d).toHaveLength(1);
    expect(d[0]).toMatchObject({ id: 'c2', from: { pass: true }, to: { pass: false } });
  });

  it('compares inputs with their units', () => {
    const d = diffInputs(
      { f: { value: 10, unit: 'kN' }, n: 2, same: 'x' },
      { f: { value: 10000, unit: 'N' }, n: 2, same: 'x', added: true },
      (k) => k.toUpperCase(),
    );
    expect(d).toEqual([
      { key: 'f', label: 'F', from: { value: 10, unit: 'kN' }, to: { value: 10000, unit: 'N' } },
      { key: 'added', label: 'ADDED', from: null, to: true },
    ]);
  });
});
