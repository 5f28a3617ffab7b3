/**
 * Reading numbers as engineers type them, key by key. The text of a field is the truth while the
 * user types: "2." and "1e-" are steps on the way to a number, never rewritten into "2" or "1".
 * A decimal comma is read only when the user's number format says so; otherwise a comma gets a
 * plain message instead of being taken for the start of a unit.
 */
import { powerOfTen } from '@holdfast/calc';

export type NumberFormat = 'point' | 'comma';

export type NumberEntry =
  | { kind: 'empty' }
  | { kind: 'number'; value: number; unitText: string }
  | { kind: 'incomplete'; message: string }
  | { kind: 'invalid'; message: string };

const MANTISSA_POINT = String.raw`[-+]?(?:\d+\.?\d*|\.\d+)`;
const MANTISSA_COMMA = String.raw`[-+]?(?:\d+[.,]?\d*|[.,]\d+)`;
const EXPONENT = String.raw`(?:[eE][-+]?\d+)?`;
const complete = (format: NumberFormat) =>
  new RegExp(`^(${format === 'comma' ? MANTISSA_COMMA : MANTISSA_POINT}${EXPONENT})(.*)$`);
const COMPLETE = { point: complete('point'), comma: complete('comma') };
/** On the way to a number: a sign, a lone separator, or an exponent still missing its digits. */
const INCOMPLETE = /^(?:[-+]?[.,]?|[-+]?(?:\d+[.,]?\d*|[.,]\d+)[eE][-+]?)$/;

/** Unit text may start with a letter, a degree sign, a micro sign, a percent or a slash. */
const UNIT_START = /^[\p{L}°µ%/]/u;

/**
 * Reads typed text as a number with an optional unit after it. Surrounding spaces are ignored.
 * @example readNumber('0,85', 'comma') // { kind: 'number', value: 0.85, unitText: '' }
 * @example readNumber('2.', 'point') // { kind: 'number', value: 2, unitText: '' }
 * @example readNumber('1e-', 'point') // { kind: 'incomplete', … }
 */
export function readNumber(text: string, format: NumberFormat): NumberEntry {
  const t = text.trim();
  if (t === '') return { kind: 'empty' };
  if (INCOMPLETE.test(t)) {
    return { kind: 'incomplete', message: 'Finish the number (e.g. 2.5, −3 or 1.2e-3).' };
  }
  if (format === 'point' && /^[-+]?\d*,/.test(t)) {
    const asPoint = /^[-+]?\d*,\d+$/.test(t) ? t.replace(',', '.') : '0.85';
    return {
      kind: 'invalid',
      message: `Use a point for decimals, e.g. ${asPoint}. A decimal comma can be chosen under “Number format” in your profile.`,
    };
  }
  if (/^[-+]?\d{1,3}[ .,']\d{3}[.,]\d/.test(t)) {
    return { kind: 'invalid', message: 'Type the number without thousands separators.' };
  }
  const m = COMPLETE[format].exec(t);
  if (!m) return { kind: 'invalid', message: 'Not a number. Type digits, e.g. 2.5 or 12 kN.' };
  const value = Number(m[1]!.replace(',', '.'));
  const rest = m[2]!.trim();
  if (!Number.isFinite(value)) return { kind: 'invalid', message: 'The number is too large.' };
  if (rest !== '' && !UNIT_START.test(rest)) {
    if (/^\d/.test(m[2]!.trimStart()) && /^\s/.test(m[2]!)) {
      return { kind: 'invalid', message: 'Leave out the spaces between digits.' };
    }
    return { kind: 'invalid', message: `“${rest}” is not a unit here.` };
  }
  return { kind: 'number', value, unitText: rest };
}

/** A number written back into a field in the user's format, without float noise. */
export function writeNumber(value: number, format: NumberFormat): string {
  if (!Number.isFinite(value)) return String(value);
  const text = String(Number(value.toPrecision(12)));
  return format === 'comma' ? text.replace('.', ',') : text;
}

/** True when two texts read as the same number (so a field need not rewrite what was typed). */
export function sameNumberText(a: string, b: string, format: NumberFormat): boolean {
  if (a === b) return true;
  const x = readNumber(a, format);
  const y = readNumber(b, format);
  return (
    x.kind === 'number' &&
    y.kind === 'number' &&
    x.value === y.value &&
    x.unitText === '' &&
    y.unitText === ''
  );
}

/** A figure for a message: at most 4 significant figures, a real minus sign, no trailing zeros. */
export function messageNumber(value: number, format: NumberFormat = 'point'): string {
  if (value === 0 || !Number.isFinite(value)) return String(value);
  const abs = Math.abs(value);
  let text: string;
  if (abs < 1e-3 || abs >= 1e7) {
    const [mantissa, exponent] = Number(value.toPrecision(4)).toExponential().split('e') as [
      string,
      string,
    ];
    text = `${mantissa}×${powerOfTen(Number(exponent))}`;
  } else {
    text = String(Number(value.toPrecision(4)));
  }
  text = text.replace('-', '−');
  return format === 'comma' ? text.replace('.', ',') : text;
}
