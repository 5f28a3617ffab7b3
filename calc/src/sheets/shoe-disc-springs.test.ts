import { describe, expect, it } from 'vitest';
import { getCriteriaSet } from '../criteria/lookup.js';
import { nearlyEqual } from '../testing/expect-close.js';
import { demoInputs, getSheetType } from './registry.js';

const crane = getCriteriaSet('crane-hoist')!;
const hoist = getSheetType('hoist-shoe-brake')!;
type E = ReturnType<typeof hoist.evaluate>;
const check = (e: E, id: string) => e.checks.find((c) => c.id === id);

describe('disc springs on the shoe sheets', () => {
  const demo = hoist.evaluate(demoInputs(hoist), crane);

  it('checks σOM at flat for both statically loaded stacks (demo disc 40 × 20.4 × 1.5: about −1359 MPa)', () => {
    for (const p of ['holder', 'equaliser']) {
      const c = check(demo, `${p}-sigma-om-flat`)!;
      expect(c.pass).toBe(true);
      expect(Math.abs(c.value / 1e6 - 1359)).toBeLessThan(1);
    }
  });

  it('the stiffer modulus entered raises σOM in proportion (E is an input)', () => {
    const e = hoist.evaluate({ ...demoInputs(hoist), discE: '226600 MPa' }, crane);
    const ratio =
      check(e, 'holder-sigma-om-flat')!.value / check(demo, 'holder-sigma-om-flat')!.value;
    expect(nearlyEqual(ratio, 1.1, 1e-9)).toBe(true);
  });

  it('stopping short by the tolerance leaves the equaliser at 180° − 30° outside the band', () => {
    const e = hoist.evaluate({ ...demoInputs(hoist), equaliserBackOff: '180 deg' }, crane);
    const c = check(e, 'equaliser-band-short')!;
    expect(c.value).toBeGreaterThan(0.75);
    expect(c.pass).toBe(false);
    expect(check(e, 'equaliser-set-deflection-max')!.pass).toBe(true);
  });

  it('the demo back-off angles keep both ends of their tolerance inside 0.15–0.75 h0', () => {
    for (const id of [
      'holder-band-short',
      'holder-band-past',
      'equaliser-band-short',
      'equaliser-band-past',
    ])
      expect(check(demo, id)!.pass, id).toBe(true);
  });

  it('the holder preload is checked at the far end of the tolerance against the preload it needs', () => {
    const c = check(demo, 'holder-preload-needed')!;
    const set = demo.fieldSettings.find((f) => f.key === 'holderPreload')!.value;
    expect(c.value).toBeLessThan(set);
    const e = hoist.evaluate({ ...demoInputs(hoist), holderRequiredPreload: '2200 N' }, crane);
    expect(check(e, 'holder-preload-needed')!.pass).toBe(false);
  });

  it('prints the tolerance and the never-tighten rule on the back-off setting', () => {
    const n = demo.fieldSettings.find((f) => f.key === 'equaliserBackOff')!.note!;
    expect(n).toMatch(/back off up to 30° further/);
    expect(n).toMatch(/never tighten/);
  });

  it('a friction coefficient out of the core range is refused on the sheet field', () => {
    expect(() => hoist.evaluate({ ...demoInputs(hoist), discFrictionEdge: 0.5 }, crane)).toThrow(
      /discFrictionEdge/,
    );
  });
});

describe('the back-off tolerance the card measures against', () => {
  const demo = hoist.evaluate(demoInputs(hoist), crane);
  const setting = (key: string) => demo.fieldSettings.find((f) => f.key === key);

  it("is the sheet's declared tolerance, one-sided (holder 60° +15°, equaliser 240° +30°)", () => {
    const deg = Math.PI / 180;
    for (const [key, plus] of [
      ['holderBackOff', 15],
      ['equaliserBackOff', 30],
    ] as const) {
      const band = setting(key)?.tolerance?.band;
      expect(band?.kind).toBe('absolute');
      if (band?.kind !== 'absolute') continue;
      expect(band.minus).toBe(0);
      expect(nearlyEqual(band.plus, plus * deg, 1e-12)).toBe(true);
      expect(setting(key)?.tolerance?.direction).toBe('loosen');
    }
  });

  it('goes with the input: a 20° tolerance gives a +20° band', () => {
    const e = hoist.evaluate(
      { ...demoInputs(hoist), equaliserBackOffTolerance: { value: 20, unit: 'deg' } },
      crane,
    );
    const band = e.fieldSettings.find((f) => f.key === 'equaliserBackOff')?.tolerance?.band;
    expect(band?.kind === 'absolute' && Math.round((band.plus * 180) / Math.PI)).toBe(20);
  });
});
