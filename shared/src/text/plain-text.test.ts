import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createCommentSchema } from '../comments/comment.schema.js';
import { confirmCriterionSchema, createCriteriaSetSchema } from '../criteria/criteria.schema.js';
import { updatePositionSchema, updateSiteSchema } from '../register/register.schema.js';
import { reviewDispositionSchema } from '../reviews/criteria-review.schema.js';
import { createSheetSchema } from '../sheets/sheet.schema.js';
import { createUserSchema, updateUserSchema } from '../users/user.schema.js';
import {
  findNul,
  hasControlCharacter,
  hasVisibleText,
  multiLineText,
  singleLineText,
  stripInvisible,
} from './plain-text.js';

const seed = process.env.FC_SEED === 'random' ? undefined : 20261203;
const controls = [
  ...Array.from({ length: 32 }, (_, i) => String.fromCharCode(i)),
  ...Array.from({ length: 33 }, (_, i) => String.fromCharCode(0x7f + i)),
];
const invisibles = [
  '\u200b',
  '\u200c',
  '\u200d',
  '\u2060',
  '\ufeff',
  '\u00ad',
  '\u200e',
  '\u200f',
  '\u202a',
  '\u202e',
  '\u2066',
  '\u2069',
  '\u3164',
  ' ',
];
const position = {
  positionId: '00000000-0000-4000-8000-000000000001',
  sheetType: 'hoist-shoe-brake',
};

describe('free text hygiene', () => {
  it('refuses NUL and other control characters with the field path', () => {
    const sheet = createSheetSchema.safeParse({ ...position, title: 'Hoist\u0000 brake' });
    expect(sheet.success).toBe(false);
    expect(sheet.error?.issues.map((i) => [i.path.join('.'), i.message])).toContainEqual([
      'title',
      'must not contain control characters',
    ]);
    expect(createCommentSchema.safeParse({ body: 'ok\u0000' }).success).toBe(false);
    expect(updateUserSchema.safeParse({ displayName: 'Erin\u0007 Vale' }).success).toBe(false);
  });

  it('edits, criteria sets, confirmations and dispositions follow the same text rules as creates', () => {
    const pathOf = (r: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }) =>
      r.success ? undefined : r.error!.issues[0]!.path.join('.');
    expect(pathOf(updateSiteSchema.safeParse({ name: 'Melt\u0000shop' }))).toBe('name');
    expect(pathOf(updatePositionSchema.safeParse({ lining: 'woven\u001b[31m' }))).toBe('lining');
    expect(pathOf(updatePositionSchema.safeParse({ description: '\u200b\u200b\u200b' }))).toBe(
      'description',
    );
    expect(
      pathOf(
        confirmCriterionSchema.safeParse({ key: 'pvLimit', document: 'Spec\u0007', clause: '4' }),
      ),
    ).toBe('document');
    expect(
      pathOf(reviewDispositionSchema.safeParse({ disposition: 'Stands because\u0000 of data.' })),
    ).toBe('disposition');
    expect(
      pathOf(
        createCriteriaSetSchema.safeParse({
          id: 'plant-std',
          name: '\u200b\u200b\u200b\u200b',
          description: 'The plant standard for hoists.',
          values: [],
          note: 'From the plant standard.',
        }),
      ),
    ).toBe('name');
    // Running text keeps its line breaks.
    expect(
      reviewDispositionSchema.safeParse({ disposition: 'Reviewed.\nStands: maker data holds.' })
        .success,
    ).toBe(true);
  });

  it('keeps line breaks and tabs in running text only', () => {
    expect(createCommentSchema.parse({ body: 'line one\n\tline two' }).body).toBe(
      'line one\n\tline two',
    );
    expect(createSheetSchema.safeParse({ ...position, title: 'two\nlines' }).success).toBe(false);
  });

  it('refuses titles and names made only of invisible characters', () => {
    const title = '\u200b\u200b\u200b\u200b\u200b';
    const result = createSheetSchema.safeParse({ ...position, title });
    expect(result.error?.issues.map((i) => i.message)).toContain('must contain visible characters');
    expect(
      createUserSchema.safeParse({
        email: 'a@b.test',
        displayName: '\u3164\u3164\u3164',
        initials: 'AB',
        role: 'viewer',
        password: 'x'.repeat(12),
      }).success,
    ).toBe(false);
    expect(createSheetSchema.parse({ ...position, title: 'Hoist 1 \u2013 main' }).title).toBe(
      'Hoist 1 \u2013 main',
    );
  });

  it('property: a string with any control character never passes a single-line field', () => {
    const schema = singleLineText({ min: 1, max: 500 });
    fc.assert(
      fc.property(
        fc.string({ maxLength: 40 }),
        fc.constantFrom(...controls),
        fc.string({ maxLength: 40 }),
        (before, control, after) => {
          const value = `x${before}${control}${after}x`;
          expect(schema.safeParse(value).success).toBe(false);
        },
      ),
      { seed, numRuns: 500 },
    );
  });

  it('property: text of invisible characters only is refused, any visible letter admits it', () => {
    const schema = multiLineText({ min: 1, max: 500 });
    const invisible = fc.array(fc.constantFrom(...invisibles), { minLength: 1, maxLength: 30 });
    fc.assert(
      fc.property(invisible, fc.constantFrom('a', 'Ω', '7', '—', '漢'), invisible, (a, v, b) => {
        expect(schema.safeParse(a.join('')).success).toBe(false);
        expect(schema.safeParse(a.join('') + v + b.join('')).success).toBe(true);
      }),
      { seed, numRuns: 300 },
    );
  });

  it('property: what passes has no control character, something visible, and is trimmed', () => {
    const schema = singleLineText({ min: 1, max: 200 });
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 60 }), (raw) => {
        const parsed = schema.safeParse(raw);
        if (!parsed.success) return;
        expect(hasControlCharacter(parsed.data)).toBe(false);
        expect(hasVisibleText(parsed.data)).toBe(true);
        expect(parsed.data).toBe(parsed.data.trim());
      }),
      { seed, numRuns: 1000 },
    );
  });

  it('property: stripping invisible characters leaves none and is idempotent', () => {
    fc.assert(
      fc.property(
        fc.array(fc.oneof(fc.constantFrom(...invisibles), fc.string({ maxLength: 3 }))),
        (parts) => {
          const once = stripInvisible(parts.join(''));
          expect(stripInvisible(once)).toBe(once);
          expect(/[\u200b-\u200f\u202a-\u202e\u2066-\u2069\ufeff]/.test(once)).toBe(false);
        },
      ),
      { seed, numRuns: 500 },
    );
  });

  it('finds NUL anywhere in free JSON, keys included, and names the path', () => {
    expect(findNul({ inputs: { a: { value: 1, unit: 'k\u0000N' } } })).toBe('inputs.a.unit');
    expect(findNul({ list: ['ok', 'n\u0000'] })).toBe('list.1');
    expect(findNul({ ['bad\u0000key']: 1 })).toBe('bad\\0key');
    expect(findNul({ fine: ['text', 1, null, { deep: 'x' }] })).toBeUndefined();
    fc.assert(
      fc.property(fc.jsonValue(), (v) => {
        const text = JSON.stringify(v) ?? '';
        expect(findNul(v) !== undefined).toBe(text.includes('\\u0000'));
      }),
      { seed, numRuns: 500 },
    );
  });
});
