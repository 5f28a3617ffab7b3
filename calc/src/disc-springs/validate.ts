import { FieldErrorCollector } from '../core/errors.js';
import type { DiscSpring } from './disc.js';
import type { DiscStack } from './stack.js';

const finite = (x: number) => typeof x === 'number' && Number.isFinite(x);

/**
 * Checks a disc's geometry and material; throws one CalcInputError naming every bad field.
 * Rules: all lengths finite and positive, Di < De, l0 > t (a cone height), 0.8·t ≤ t′ ≤ t when given,
 * 0 < E, −1 < ν < 0.5.
 */
export function validateDisc(d: DiscSpring, collector?: FieldErrorCollector): void {
  const out = collector ?? new FieldErrorCollector();
  const f = (k: string) => k;
  for (const k of ['De', 'Di', 't', 'l0', 'E'] as const) {
    if (!finite(d[k]) || d[k] <= 0) out.add(f(k), `${k} must be a positive finite value`);
  }
  if (finite(d.De) && finite(d.Di) && d.Di >= d.De) {
    out.add(f('Di'), 'inner diameter Di must be smaller than outer diameter De');
  }
  if (finite(d.t) && finite(d.l0) && d.l0 <= d.t) {
    out.add(
      f('l0'),
      'free height l0 must exceed the thickness t (the cone height h0 = l0 − t must be positive)',
    );
  }
  if (d.tReduced !== undefined) {
    if (!finite(d.tReduced) || d.tReduced <= 0) {
      out.add(f('tReduced'), 'reduced thickness t′ must be a positive finite value');
    } else if (finite(d.t) && (d.tReduced > d.t || d.tReduced < 0.8 * d.t)) {
      // Contact flats reduce t by a few per cent (t′/t ≈ 0.94–0.96 in DIN 2093); far less is a typo.
      out.add(f('tReduced'), 'reduced thickness t′ must lie between 0.8·t and t');
    }
  }
  if (!finite(d.nu) || d.nu <= -1 || d.nu >= 0.5) {
    out.add(f('nu'), "Poisson's ratio must lie between −1 and 0.5");
  }
  if (!collector) out.throwIfAny();
}

/** Checks a stack (counts, friction) and its disc. */
export function validateStack(st: DiscStack, out = new FieldErrorCollector()): void {
  validateDisc(st.disc, out);
  if (!Number.isInteger(st.seriesCount) || st.seriesCount < 1 || st.seriesCount > 200) {
    out.add('seriesCount', 'sets in series must be a whole number from 1 to 200');
  }
  if (!Number.isInteger(st.parallelCount) || st.parallelCount < 1 || st.parallelCount > 10) {
    out.add('parallelCount', 'discs in parallel must be a whole number from 1 to 10');
  }
  for (const k of ['frictionCone', 'frictionEdge'] as const) {
    if (!finite(st[k]) || st[k] < 0 || st[k] >= 0.2)
      out.add(k, 'friction factor must be in [0, 0.2)');
  }
  if (out.errors.length === 0) {
    const n = Number.isInteger(st.parallelCount) ? st.parallelCount : 1;
    if (st.frictionCone * (n - 1) + st.frictionEdge >= 0.9) {
      out.add('frictionCone', 'friction sum wM·(n−1) + wR must stay below 0.9');
    }
  }
  out.throwIfAny();
}

/** Checks a deflection per set: finite, 0 ≤ s ≤ h0 (beyond flat is impossible). */
export function validateDeflection(s: number, h0: number, field = 'deflection'): void {
  const out = new FieldErrorCollector();
  if (!finite(s) || s < 0) out.add(field, 'deflection must be a finite value ≥ 0');
  else if (s > h0 * (1 + 1e-9)) out.add(field, 'deflection beyond flat: s must not exceed h0');
  out.throwIfAny();
}
