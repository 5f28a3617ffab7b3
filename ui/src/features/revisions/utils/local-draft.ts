import { canonicalJson } from '@holdfast/shared';
import type { DraftContent } from '../hooks/use-draft-autosave';

/**
 * Unsaved edits kept on this device, one entry per revision, so that a reload, a closed tab or
 * an expired session loses nothing typed. The entry names the row version it was based on; the
 * editor offers it back when the revision is opened again. Stored in localStorage (synchronous,
 * so it is written even while the page is being hidden).
 */
export interface LocalDraft {
  revisionId: string;
  /** Row version of the saved revision these edits were typed over. */
  baseRowVersion: number;
  savedAt: string;
  content: DraftContent;
}

const PREFIX = 'holdfast.unsaved.';

function storage(): Storage | null {
  try {
    return typeof window === 'undefined' ? null : window.localStorage;
  } catch {
    return null;
  }
}

export function readLocalDraft(revisionId: string): LocalDraft | null {
  const raw = storage()?.getItem(PREFIX + revisionId);
  if (!raw) return null;
  try {
    const parsed = JSON.parse(raw) as LocalDraft;
    return parsed && parsed.revisionId === revisionId && parsed.content?.inputs ? parsed : null;
  } catch {
    return null;
  }
}

export function writeLocalDraft(draft: Omit<LocalDraft, 'savedAt'>): void {
  try {
    storage()?.setItem(
      PREFIX + draft.revisionId,
      JSON.stringify({ ...draft, savedAt: new Date().toISOString() }),
    );
  } catch {
    // A full or blocked storage must not stop typing; the server save still runs.
  }
}

export function clearLocalDraft(revisionId: string): void {
  try {
    storage()?.removeItem(PREFIX + revisionId);
  } catch {
    // Nothing to clear.
  }
}

/** Keys whose values differ between two drafts (what a restore would change). */
export function changedKeys(a: DraftContent, b: DraftContent): string[] {
  const keys = new Set([...Object.keys(a.inputs), ...Object.keys(b.inputs)]);
  // Canonical text: the server's JSON hands object keys back in its own order.
  const same = (x: unknown, y: unknown) => {
    try {
      return canonicalJson(x ?? null) === canonicalJson(y ?? null);
    } catch {
      return false;
    }
  };
  const out = [...keys].filter((k) => !same(a.inputs[k], b.inputs[k]));
  if (a.changeNote !== b.changeNote) out.push('changeNote');
  if (a.unitSystem !== b.unitSystem) out.push('unitSystem');
  return out;
}
