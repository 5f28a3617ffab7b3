import { z } from 'zod';

/**
 * Text hygiene for every free-text field a person types. PostgreSQL cannot store NUL in text or
 * jsonb, and other control characters only ever arrive by accident or by attack, so they are
 * refused with the field's path rather than failing deep in the database. Bidi controls and
 * zero-width characters are invisible: a title made only of them says nothing, and in a file
 * name they disguise the extension (`photo\u202Egnp.exe` reads as "photoexe.png").
 */

// eslint-disable-next-line no-control-regex -- matching control characters is the point
const CONTROL_ANY = /[\u0000-\u001f\u007f-\u009f]/;
// eslint-disable-next-line no-control-regex -- tab, line feed and carriage return are allowed
const CONTROL_MULTILINE = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f]/;

/** Bidirectional embedding, override and isolate controls, and the directional marks. */
export const BIDI_CONTROLS = /[\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/g;
/** Characters that take no space: zero-width space/joiners, word joiner, BOM and friends. */
export const ZERO_WIDTH = /\u034f|[\u00ad\u180e\u200b-\u200d\u2060-\u2064\ufeff]/g;
/** Blank-looking letters (Hangul fillers, braille blank) that render as empty space. */
const BLANK_LETTERS = /[\u115f\u1160\u2800\u3164\uffa0]/g;

/** Whether `s` holds a character a reader can see. */
export function hasVisibleText(s: string): boolean {
  return (
    s.replace(BIDI_CONTROLS, '').replace(ZERO_WIDTH, '').replace(BLANK_LETTERS, '').trim().length >
    0
  );
}

/** `s` without bidi controls and zero-width characters. */
export function stripInvisible(s: string): string {
  return s.replace(BIDI_CONTROLS, '').replace(ZERO_WIDTH, '');
}

/** Whether `s` carries a control character (tab and line breaks allowed when `multiline`). */
export function hasControlCharacter(s: string, multiline = false): boolean {
  return (multiline ? CONTROL_MULTILINE : CONTROL_ANY).test(s);
}

const CONTROL_MESSAGE = 'must not contain control characters';
const INVISIBLE_MESSAGE = 'must contain visible characters';

interface TextLimits {
  /** Smallest length after trimming; 0 allows an empty value. */
  min?: number;
  max: number;
  minMessage?: string;
}

function text(multiline: boolean, { min = 0, max, minMessage }: TextLimits) {
  let schema = z.string().trim();
  if (min > 0) schema = schema.min(min, minMessage ?? `at least ${min} characters`);
  return schema
    .max(max, `at most ${max} characters`)
    .refine((s) => !hasControlCharacter(s, multiline), CONTROL_MESSAGE)
    .refine((s) => s.length === 0 || hasVisibleText(s), INVISIBLE_MESSAGE);
}

/** One line of text (titles, names): no control characters at all, trimmed. */
export const singleLineText = (limits: TextLimits) => text(false, limits);

/** Running text (comments, notes): tab and line breaks allowed, other controls refused. */
export const multiLineText = (limits: TextLimits) => text(true, limits);

/**
 * The path of the first string (value or object key) in `value` that holds NUL, or undefined.
 * The validation pipe runs this over every body and query, including free JSON such as a
 * sheet's inputs, so no NUL ever reaches PostgreSQL.
 */
export function findNul(value: unknown, path: PropertyKey[] = []): string | undefined {
  const at = (p: PropertyKey[]) => p.map(String).join('.') || '(body)';
  if (typeof value === 'string') return value.includes('\u0000') ? at(path) : undefined;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const found = findNul(value[i], [...path, i]);
      if (found) return found;
    }
    return undefined;
  }
  if (value && typeof value === 'object') {
    for (const [key, item] of Object.entries(value)) {
      if (key.includes('\u0000')) return at([...path, key.replaceAll('\u0000', '\\0')]);
      const found = findNul(item, [...path, key]);
      if (found) return found;
    }
  }
  return undefined;
}
