import { describe, expect, it } from 'vitest';
import { saveRevisionSchema, submitRevisionSchema } from '../revisions/revision.schema.js';
import { verificationCodeSchema } from '../verify/verify.schema.js';
import { createSheetSchema, sheetListQuerySchema } from './sheet.schema.js';

describe('sheets API schemas', () => {
  it('fills list defaults and coerces query strings', () => {
    expect(sheetListQuerySchema.parse({})).toEqual({
      page: 1,
      pageSize: 25,
      sort: 'documentNumber',
      order: 'asc',
    });
    expect(
      sheetListQuerySchema.parse({ page: '3', pageSize: '50', state: 'in_check' }),
    ).toMatchObject({ page: 3, pageSize: 50, state: 'in_check' });
  });

  it('refuses unknown list parameters, sorts and oversized pages', () => {
    expect(sheetListQuerySchema.safeParse({ sort: 'owner' }).success).toBe(false);
    expect(sheetListQuerySchema.safeParse({ pageSize: '500' }).success).toBe(false);
    expect(sheetListQuerySchema.safeParse({ limit: '5' }).success).toBe(false);
  });

  it('never accepts a client evaluation on save or submit', () => {
    const save = {
      inputs: { springForce: { value: 12, unit: 'kN' } },
      unitSystem: 'SI',
      changeNote: '',
      rowVersion: 0,
    };
    expect(saveRevisionSchema.safeParse(save).success).toBe(true);
    expect(saveRevisionSchema.safeParse({ ...save, evaluation: { pass: true } }).success).toBe(
      false,
    );
    expect(submitRevisionSchema.safeParse({ rowVersion: 0, hash: 'x' }).success).toBe(false);
  });

  it('checks input values: quantities need a finite value and a unit', () => {
    const base = { unitSystem: 'SI', changeNote: '', rowVersion: 0 };
    expect(
      saveRevisionSchema.safeParse({ ...base, inputs: { f: { value: Infinity, unit: 'N' } } })
        .success,
    ).toBe(false);
    expect(saveRevisionSchema.safeParse({ ...base, inputs: { f: { value: 1 } } }).success).toBe(
      false,
    );
    expect(saveRevisionSchema.safeParse({ ...base, inputs: { 'bad key': 1 } }).success).toBe(false);
    expect(
      saveRevisionSchema.safeParse({ ...base, inputs: { n: 2, c: 'M5', b: true } }).success,
    ).toBe(true);
  });

  it('accepts only the registry sheet types and verification codes in base32', () => {
    const sheet = { title: 'Hoist brake', positionId: '00000000-0000-4000-8000-000000000000' };
    expect(createSheetSchema.safeParse({ ...sheet, sheetType: 'hoist-shoe-brake' }).success).toBe(
      true,
    );
    expect(createSheetSchema.safeParse({ ...sheet, sheetType: 'band-brake' }).success).toBe(false);
    expect(verificationCodeSchema.parse(' abcdefgh23 ')).toBe('ABCDEFGH23');
    // A 0, 1 or 8 is not in the alphabet: typed for O, I or B, it is taken as that letter.
    expect(verificationCodeSchema.parse('4p07jzd46a')).toBe('4PO7JZD46A');
    expect(verificationCodeSchema.parse('ABCDE-FGH18')).toBe('ABCDEFGHIB');
    expect(verificationCodeSchema.parse('4PO7 JZD4 6A')).toBe('4PO7JZD46A');
    expect(verificationCodeSchema.safeParse('ABCDEFGH19').success).toBe(false);
    expect(verificationCodeSchema.safeParse('ABCDEFGH2').success).toBe(false);
  });
});
