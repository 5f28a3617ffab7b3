import { beforeEach, describe, expect, it } from 'vitest';
import {
  clearFormDraft,
  hasEntries,
  loadFormDraft,
  storeFormDraft,
  type FormDraft,
} from './form-draft';

const U = 'user-1';
const R = 'rev-1';
const draft: FormDraft = {
  id: '0f5e2a1c-7d3b-4c8e-9a6f-1b2c3d4e5f60',
  kind: 'lining-replacement',
  performedAt: '2026-12-01T09:30',
  drafts: { reserveStroke: { asFound: { value: 9.5, unit: 'mm' }, reason: '' } },
  checks: { 'no-drag-shoe-a': { result: 'ok' } },
  findings: 'Shoe B drags at the toe',
  meterHours: 12406.5,
};

beforeEach(() => localStorage.clear());

describe('record form kept on the device', () => {
  it('comes back as typed, per user and revision, and goes when cleared', () => {
    storeFormDraft(U, R, draft);
    expect(loadFormDraft(U, R)).toEqual(draft);
    expect(loadFormDraft('user-2', R)).toBeNull();
    expect(loadFormDraft(U, 'rev-2')).toBeNull();
    clearFormDraft(U, R);
    expect(loadFormDraft(U, R)).toBeNull();
  });

  it('reads damaged storage as nothing kept rather than failing the form', () => {
    localStorage.setItem(`holdfast.field-form.${U}.${R}`, '{not json');
    expect(loadFormDraft(U, R)).toBeNull();
    localStorage.setItem(`holdfast.field-form.${U}.${R}`, JSON.stringify({ findings: 'x' }));
    expect(loadFormDraft(U, R)).toBeNull();
  });

  it('tells a form only opened from one with entries', () => {
    const opened = { ...draft, drafts: {}, checks: {}, findings: ' ', meterHours: undefined };
    expect(hasEntries(opened)).toBe(false);
    expect(hasEntries({ ...opened, findings: 'Lining worn' })).toBe(true);
    expect(hasEntries({ ...opened, meterHours: 0 })).toBe(true);
    expect(hasEntries(draft)).toBe(true);
  });
});
