import type { InputValue } from '@holdfast/calc';
import type { FieldRecordKind } from '@holdfast/shared';
import type { CheckDraft } from '../components/check-items';
import type { MeasurementDraft } from '../components/measurement-entry';

/**
 * What a fitter has typed on a record form, kept on the device as they type (localStorage, per
 * user and revision) so a reload, a closed tab or a lost session does not throw it away. It
 * holds the record's device id, so the outbox state of a record already saved shows again.
 * Photos are not kept here (too large for localStorage): they are kept once the record is saved.
 * No token or other secret is ever written.
 */
export interface FormDraft {
  id: string;
  kind: FieldRecordKind;
  performedAt: string;
  drafts: Record<string, MeasurementDraft>;
  checks: Record<string, CheckDraft>;
  findings: string;
  meterHours?: InputValue;
}

function key(userId: string, revisionId: string): string {
  return `holdfast.field-form.${userId}.${revisionId}`;
}

/** The draft kept for this user and revision, or null (none, unreadable, or no storage). */
export function loadFormDraft(userId: string, revisionId: string): FormDraft | null {
  try {
    const text = localStorage.getItem(key(userId, revisionId));
    if (!text) return null;
    const draft = JSON.parse(text) as Partial<FormDraft>;
    if (typeof draft.id !== 'string' || typeof draft.kind !== 'string') return null;
    return {
      id: draft.id,
      kind: draft.kind,
      performedAt: typeof draft.performedAt === 'string' ? draft.performedAt : '',
      drafts: draft.drafts ?? {},
      checks: draft.checks ?? {},
      findings: typeof draft.findings === 'string' ? draft.findings : '',
      meterHours: draft.meterHours,
    };
  } catch {
    return null;
  }
}

export function storeFormDraft(userId: string, revisionId: string, draft: FormDraft): void {
  try {
    localStorage.setItem(key(userId, revisionId), JSON.stringify(draft));
  } catch {
    // Storage full or refused (private mode): the form still works, only a reload loses it.
  }
}

export function clearFormDraft(userId: string, revisionId: string): void {
  try {
    localStorage.removeItem(key(userId, revisionId));
  } catch {
    /* nothing kept */
  }
}

/** Whether a kept draft holds anything the fitter entered (not just a form opened once). */
export function hasEntries(draft: FormDraft): boolean {
  return (
    Object.keys(draft.drafts).length > 0 ||
    Object.keys(draft.checks).length > 0 ||
    draft.findings.trim() !== '' ||
    (draft.meterHours !== undefined && draft.meterHours !== '')
  );
}
