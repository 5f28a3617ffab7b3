import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isCalcInputError } from '../core/errors.js';
import { length, time } from '../units/quantities.js';
import { fitWearTrend, type WearReading } from './wear-trend.js';

const DAY = 86400;
const MM = 1e-3;
const readings = (pairs: [number, number][]): WearReading[] =>
  pairs.map(([days, mm]) => ({ at: time(days * DAY), value: length(mm * MM) }));

function fieldsOf(fn: () => unknown): string[] {
  try {
    fn();
  } catch (e) {
    if (isCalcInputError(e)) return e.fields.map((f) => f.field);
    throw e;
  }
  return [];
}

describe('wear trend, case computed by hand', () => {
  // Reserve stroke readings at 0, 100, 200, 300 days: 12.0, 11.0, 10.4, 9.2 mm; minimum 6 mm.
  // In days and mm:  t̄ = 600/4 = 150,  ȳ = 42.6/4 = 10.65
  //   t − t̄ = −150, −50, 50, 150         y − ȳ = 1.35, 0.35, −0.25, −1.45
  //   S_tt = 22500 + 2500 + 2500 + 22500 = 50000
  //   S_ty = −202.5 − 17.5 − 12.5 − 217.5 = −450
  //   b = −450/50000 = −0.009 mm/day, a = 10.65 + 0.009·150 = 12.0 mm
  //   fitted 12.0, 11.1, 10.2, 9.3; residuals 0, −0.1, 0.2, −0.1; SSE = 0.06
  //   s² = 0.06/2 = 0.03, s = 0.1732051 mm, se(b) = s/√50000 = 7.745967e-4 mm/day
  //   t = 0.009/7.745967e-4 = 11.619; t_0.975,2 = 0.95/√(2·0.975·0.025) = 4.302653
  //   crossing t₀ = 150 + (6 − 10.65)/(−0.009) = 666.667 days
  //   band: c = 6 − 10.65 = −4.65, t²s² = 18.51282·0.03 = 0.5553846,
  //   D = b² − t²s²/S_tt = 8.1e-5 − 1.110769e-5 = 6.989231e-5
  //   root = t·s·√(1.25·D + c²/S_tt) = 0.7452413·√(8.736538e-5 + 4.3245e-4) = 0.01699122
  //   t₀,1 = 150 + (0.04185 − 0.01699122)/D = 505.67 days, t₀,2 = 150 + (0.04185 + 0.01699122)/D = 991.88 days
  const fit = fitWearTrend({
    readings: readings([
      [0, 12.0],
      [100, 11.0],
      [200, 10.4],
      [300, 9.2],
    ]),
    minimum: length(6 * MM),
    field: 'reserveStroke',
  });

  it('gives the rate, its standard error and the t statistic', () => {
    expect(fit.kind).toBe('trend');
    expect((fit.rate / MM) * DAY).toBeCloseTo(0.009, 12);
    expect((fit.rateStandardError / MM) * DAY).toBeCloseTo(7.745967e-4, 9);
    expect(fit.residualStd / MM).toBeCloseTo(0.1732051, 7);
    expect(fit.intercept / MM).toBeCloseTo(12.0, 9);
    expect(fit.tStatistic).toBeCloseTo(11.619, 3);
    expect(fit.tQuantile).toBeCloseTo(4.302653, 6);
  });

  it('gives the crossing date and its prediction interval', () => {
    if (fit.kind !== 'trend' || !fit.crossing) throw new Error('expected a crossing');
    expect(fit.crossing.at / DAY).toBeCloseTo(666.667, 3);
    expect(fit.crossing.lower / DAY).toBeCloseTo(505.67, 2);
    expect(fit.crossing.upper / DAY).toBeCloseTo(991.88, 2);
  });

  it('records each step with its formula and source', () => {
    const ids = fit.steps.map((s) => s.id);
    expect(ids).toEqual([
      'wear-slope',
      'wear-residual-std',
      'wear-rate-se',
      'wear-crossing',
      'wear-crossing-root-1',
      'wear-crossing-root-2',
    ]);
    expect(fit.steps.every((s) => s.reference.includes('Draper & Smith'))).toBe(true);
  });
});

describe('wear trend, refusals and no trend', () => {
  it('refuses fewer than 3 readings with a field-level error', () => {
    const two = readings([
      [0, 12],
      [100, 11],
    ]);
    expect(fieldsOf(() => fitWearTrend({ readings: two, field: 'reserveStroke' }))).toEqual([
      'reserveStroke',
    ]);
  });

  it('refuses readings all on one date', () => {
    const same = readings([
      [5, 12],
      [5, 11],
      [5, 10],
    ]);
    expect(fieldsOf(() => fitWearTrend({ readings: same, field: 'liningThickness' }))).toEqual([
      'liningThickness',
    ]);
  });

  it('names the reading that is not a number', () => {
    const bad = readings([
      [0, 12],
      [100, Number.NaN],
      [200, 10],
    ]);
    expect(fieldsOf(() => fitWearTrend({ readings: bad, field: 'reserveStroke' }))).toEqual([
      'reserveStroke[1].value',
    ]);
  });

  it('says "no wear trend" for flat, rising or scattered readings', () => {
    const flat = fitWearTrend({
      readings: readings([
        [0, 10],
        [100, 10],
        [200, 10],
      ]),
      minimum: length(6 * MM),
      field: 'reserveStroke',
    });
    expect(flat.kind).toBe('no-trend');
    const rising = fitWearTrend({
      readings: readings([
        [0, 10],
        [100, 10.5],
        [200, 11],
      ]),
      field: 'reserveStroke',
    });
    expect(rising.kind).toBe('no-trend');
    const scattered = fitWearTrend({
      readings: readings([
        [0, 10],
        [100, 11],
        [200, 9.5],
        [300, 10.4],
      ]),
      minimum: length(6 * MM),
      field: 'reserveStroke',
    });
    expect(scattered.kind).toBe('no-trend');
    if (scattered.kind === 'no-trend') expect(scattered.reason).toMatch(/no wear trend/);
  });
});

describe('wear trend properties', () => {
  const line = fc.record({
    start: fc.double({ min: 5, max: 40, noNaN: true }),
    ratePerYear: fc.double({ min: 0.1, max: 10, noNaN: true }),
    days: fc.uniqueArray(fc.integer({ min: 0, max: 3650 }), { minLength: 3, maxLength: 12 }),
    epochDays: fc.integer({ min: 0, max: 25000 }),
  });

  it('exact linear data: zero residual, exact crossing date, zero-width interval', () => {
    fc.assert(
      fc.property(line, ({ start, ratePerYear, days, epochDays }) => {
        const pts = days.map(
          (d) => [epochDays + d, start - (ratePerYear * d) / 365] as [number, number],
        );
        const minimum = start / 2;
        const fit = fitWearTrend({
          readings: readings(pts),
          minimum: length(minimum * MM),
          field: 'y',
        });
        expect(fit.kind).toBe('trend');
        // A trend with a minimum always has a crossing: a missing one fails, not skips.
        if (fit.kind !== 'trend') return;
        expect(fit.crossing).toBeDefined();
        if (!fit.crossing) return;
        expect(fit.residualStd / MM).toBeLessThan(1e-6 * start);
        const exact = epochDays + ((start - minimum) / ratePerYear) * 365;
        expect(Math.abs(fit.crossing.at / DAY - exact)).toBeLessThan(1e-6 * exact + 1e-3);
        expect((fit.crossing.upper - fit.crossing.lower) / DAY).toBeLessThan(1e-3 + 1e-6 * exact);
      }),
    );
  });

  it('noise widens the interval around the crossing', () => {
    fc.assert(
      fc.property(
        line,
        fc.array(fc.double({ min: -0.02, max: 0.02, noNaN: true }), {
          minLength: 12,
          maxLength: 12,
        }),
        ({ start, ratePerYear, days, epochDays }, noise) => {
          const span = Math.max(...days) - Math.min(...days);
          fc.pre(span >= 365 && noise.slice(0, days.length).some((e) => Math.abs(e) > 1e-3));
          const pts = days.map(
            (d, i) =>
              [epochDays + d, start - (ratePerYear * d) / 365 + noise[i]] as [number, number],
          );
          const fit = fitWearTrend({
            readings: readings(pts),
            minimum: length((start / 2) * MM),
            field: 'y',
          });
          fc.pre(fit.kind === 'trend');
          if (fit.kind !== 'trend') return;
          expect(fit.crossing).toBeDefined();
          if (!fit.crossing) return;
          expect(fit.residualStd).toBeGreaterThan(0);
          expect(fit.crossing.upper).toBeGreaterThan(fit.crossing.lower);
          expect(fit.crossing.lower).toBeLessThanOrEqual(fit.crossing.at);
          expect(fit.crossing.upper).toBeGreaterThanOrEqual(fit.crossing.at);
        },
      ),
    );
  });

  it('moving the time origin moves the crossing by the same amount', () => {
    fc.assert(
      fc.property(
        line,
        fc.integer({ min: 1, max: 20000 }),
        ({ start, ratePerYear, days }, shift) => {
          const noisy = days.map(
            (d, i) =>
              [d, start - (ratePerYear * d) / 365 + (i % 2 ? 0.01 : -0.01)] as [number, number],
          );
          const shifted = noisy.map(([d, y]) => [d + shift, y] as [number, number]);
          const a = fitWearTrend({
            readings: readings(noisy),
            minimum: length(1 * MM),
            field: 'y',
          });
          const b = fitWearTrend({
            readings: readings(shifted),
            minimum: length(1 * MM),
            field: 'y',
          });
          expect(b.kind).toBe(a.kind);
          if (a.kind === 'trend' && b.kind === 'trend' && a.crossing && b.crossing) {
            expect(b.crossing.at / DAY - a.crossing.at / DAY).toBeCloseTo(shift, 3);
          }
        },
      ),
    );
  });
});
