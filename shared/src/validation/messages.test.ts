import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import './messages.js';

const why = (schema: z.ZodType, value: unknown) => {
  const r = schema.safeParse(value);
  if (r.success) throw new Error(`accepted ${JSON.stringify(value)}`);
  return r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};

describe('plain validation messages (every schema)', () => {
  const body = z
    .object({
      title: z.string().min(3),
      note: z.string().min(1).max(5),
      count: z.number().int().min(1).max(10),
      ratio: z.number().gt(0).lt(1),
      kind: z.enum(['crane', 'conveyor']),
      id: z.uuid(),
      email: z.email(),
      tags: z.array(z.string()).min(1).max(2),
      flag: z.boolean(),
    })
    .strict();

  it('says what is missing, of what kind a value must be and which bounds it broke', () => {
    expect(why(body, { extra: 1 })).toEqual([
      'title: is required',
      'note: is required',
      'count: is required',
      'ratio: is required',
      'kind: must be one of "crane", "conveyor"',
      'id: is required',
      'email: is required',
      'tags: is required',
      'flag: is required',
      ': "extra" is not a known field',
    ]);
    expect(
      why(body, {
        title: 'ab',
        note: '',
        count: 0,
        ratio: 1,
        kind: 'hoist',
        id: 'x',
        email: 'x',
        tags: [],
        flag: 'yes',
      }),
    ).toEqual([
      'title: at least 3 characters',
      'note: must not be empty',
      'count: must be at least 1',
      'ratio: must be less than 1',
      'kind: must be one of "crane", "conveyor"',
      'id: must be a UUID',
      'email: not a valid e-mail address',
      'tags: at least 1 item',
      'flag: must be true or false',
    ]);
    expect(why(body.shape.note, 'longer')).toEqual([': at most 5 characters']);
    expect(why(body.shape.count, 1.5)).toEqual([': must be a whole number']);
    expect(why(body.shape.ratio, 0)).toEqual([': must be greater than 0']);
  });

  it('keeps a message a schema gives itself', () => {
    expect(why(z.string().min(2, 'name the set'), '')).toEqual([': name the set']);
  });
});
