import fc from 'fast-check';
import type {
  FieldDefinition,
  InputValue,
  SheetInputs,
  SheetTypeDefinition,
} from '../core/types.js';
import { fromSI, toSI } from '../units/conversion.js';
import { DIMENSIONS } from '../units/unit-table.js';

/** SI bounds of a field for generation: its own bounds, or a band around the default. */
function bounds(f: FieldDefinition): [number, number] {
  const def = defaultSI(f);
  const lo = f.min ?? (def > 0 ? def / 5 : def === 0 ? 0 : def * 5);
  const hi = f.max ?? (def > 0 ? def * 5 : def === 0 ? 1 : def / 5);
  return [lo, hi];
}

/** The default of a field in SI (quantities) or plain (numbers). */
export function defaultSI(f: FieldDefinition): number {
  const d = f.demo;
  if (typeof d === 'number') return d;
  if (typeof d === 'object' && d !== null)
    return toSI(d.value, d.unit, f.dimension ?? 'dimensionless');
  return 0;
}

/** An input value for a field inside its bounds, expressed in the field's SI display unit. */
export function fieldValueArb(f: FieldDefinition): fc.Arbitrary<InputValue> {
  switch (f.kind) {
    case 'boolean':
      return fc.boolean();
    case 'choice':
      return fc.constantFrom(...(f.choices ?? []).map((c) => c.value));
    case 'integer': {
      const [lo, hi] = bounds(f);
      return fc.integer({ min: Math.ceil(lo), max: Math.floor(Math.min(hi, lo + 1000)) });
    }
    default: {
      const [lo, hi] = bounds(f);
      const v = fc.double({
        min: lo,
        max: hi,
        noNaN: true,
        noDefaultInfinity: true,
        minExcluded: f.exclusiveMin === true,
      });
      if (f.kind === 'number') return v;
      const unit = f.unitSI ?? DIMENSIONS[f.dimension ?? 'dimensionless'].siUnit;
      return v.map((x) => ({ value: fromSI(x, unit, f.dimension ?? 'dimensionless'), unit }));
    }
  }
}

/**
 * A value near the field's default (×0.6 … ×1.6, clipped to the bounds): fields are coupled
 * (Di < De, l0 > t …), so independent full-range values are mostly rejected; near-default inputs
 * exercise the evaluation itself.
 */
export function nearDefaultArb(f: FieldDefinition): fc.Arbitrary<InputValue> {
  if (f.kind === 'boolean' || f.kind === 'choice') return fieldValueArb(f);
  const def = defaultSI(f);
  const [lo, hi] = bounds(f);
  const clip = (x: number) => Math.min(hi, Math.max(lo, x));
  if (f.kind === 'integer')
    return fc.integer({ min: Math.ceil(clip(def - 2)), max: Math.floor(clip(def + 2)) });
  const v = fc.double({ min: 0.6, max: 1.6, noNaN: true }).map((k) => clip(def * k));
  if (f.kind === 'number') return v;
  const unit = f.unitSI ?? DIMENSIONS[f.dimension ?? 'dimensionless'].siUnit;
  return v.map((x) => ({ value: fromSI(x, unit, f.dimension ?? 'dimensionless'), unit }));
}

/** Random complete inputs for a sheet type, each field inside its bounds (full range or near the default). */
export function sheetInputsArb(
  sheet: SheetTypeDefinition,
  mode: 'full' | 'near' = 'full',
): fc.Arbitrary<SheetInputs> {
  const rec: Record<string, fc.Arbitrary<InputValue>> = {};
  for (const f of sheet.fields) rec[f.key] = mode === 'full' ? fieldValueArb(f) : nearDefaultArb(f);
  return fc.record(rec);
}

/** The sheet's defaults re-expressed in US customary units (round trip through SI). */
export function defaultsInUS(sheet: SheetTypeDefinition): SheetInputs {
  const out: SheetInputs = {};
  for (const f of sheet.fields) {
    if (f.kind === 'quantity' && f.unitUS && f.dimension) {
      out[f.key] = { value: fromSI(defaultSI(f), f.unitUS, f.dimension), unit: f.unitUS };
    } else out[f.key] = f.demo;
  }
  return out;
}

/** Invalid values for a field, each of which must be rejected naming the field. */
export function invalidValues(f: FieldDefinition): InputValue[] {
  const out: InputValue[] = [];
  switch (f.kind) {
    case 'boolean':
      out.push('yes');
      break;
    case 'choice':
      out.push('no-such-choice');
      break;
    case 'quantity': {
      const unit = f.unitSI ?? DIMENSIONS[f.dimension ?? 'dimensionless'].siUnit;
      out.push(
        { value: Number.NaN, unit },
        { value: 1, unit: f.dimension === 'force' ? 'mm' : 'kN' },
        'not a number',
      );
      if (f.min !== undefined)
        out.push({
          value: fromSI(
            f.min - Math.max(1e-6, Math.abs(f.min)),
            unit,
            f.dimension ?? 'dimensionless',
          ),
          unit,
        });
      if (f.max !== undefined)
        out.push({ value: fromSI(f.max * 2 + 1, unit, f.dimension ?? 'dimensionless'), unit });
      break;
    }
    default:
      out.push(Number.NaN, Number.POSITIVE_INFINITY);
      if (f.kind === 'integer') out.push((f.min ?? 0) + 0.5);
      if (f.min !== undefined) out.push(f.min - Math.max(1, Math.abs(f.min)));
      if (f.max !== undefined) out.push(f.max * 2 + 1);
  }
  return out;
}

/** Every number an evaluation carries (results, checks, derivation, charts, settings, tables). */
export function allNumbers(e: ReturnType<SheetTypeDefinition['evaluate']>): number[] {
  const nums: number[] = [];
  for (const r of e.results) nums.push(r.value);
  for (const c of e.checks) nums.push(c.value, c.limit, c.utilisation);
  for (const s of e.derivation) nums.push(s.value);
  for (const c of e.charts) {
    for (const s of c.series) for (const p of s.points) nums.push(p.x, p.y);
    for (const m of c.markers ?? []) nums.push(m.x, m.y);
    for (const l of c.referenceLines ?? []) nums.push(l.value);
  }
  for (const f of e.fieldSettings) nums.push(f.value);
  for (const t of e.tables) for (const row of t.rows) nums.push(...Object.values(row));
  return nums;
}

/** Convenience for tests: SI value of a field given in its US unit. */
export function usToSI(f: FieldDefinition, value: number): number {
  return toSI(value, f.unitUS ?? '', f.dimension ?? 'dimensionless');
}
