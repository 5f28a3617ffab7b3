import type { AuditEvent } from '@holdfast/shared';

const ACTIONS: Record<string, string> = {
  'sheet.created': 'Sheet created',
  'revision.created': 'Revision started',
  'revision.saved': 'Draft saved',
  'revision.values-confirmed': 'Values confirmed unchanged',
  'revision.submitted': 'Sent for check',
  'revision.approved': 'Approved',
  'revision.returned': 'Returned to the author',
  'revision.superseded': 'Superseded',
  'revision.under-review': 'Under review: fails newer criteria',
  'revision.review-disposed': 'Review closed: stands',
  'revision.review-cleared': 'Review closed: superseded',
  'comment.created': 'Comment',
  'comment.replied': 'Reply',
  'comment.resolved': 'Comment resolved',
  'comment.reopened': 'Comment reopened',
  'attachment.uploaded': 'File attached',
  // Field work on the sheet's position shows in its trail too.
  'field-record.created': 'Field record started',
  'field-record.updated': 'Field record saved',
  'field-record.photo-added': 'Field record photo added',
  'field-record.signed': 'Field record signed',
  'field-record.countersigned': 'Field record countersigned',
};

/** The audit action in words; an unknown action reads as its code. */
export function auditActionWords(action: string): string {
  return ACTIONS[action] ?? action;
}

const text = (v: unknown) => (typeof v === 'string' && v.trim() ? v.trim() : null);

const changedInputs = (before: Record<string, unknown>, after: Record<string, unknown>) => {
  const a = (before.inputs ?? {}) as Record<string, unknown>;
  const b = (after.inputs ?? {}) as Record<string, unknown>;
  return [...new Set([...Object.keys(a), ...Object.keys(b)])].filter(
    (k) => JSON.stringify(a[k] ?? null) !== JSON.stringify(b[k] ?? null),
  ).length;
};

/**
 * The one line of detail worth reading for an event: a note, a comment, a file name, a label.
 * `revisionLabel` names a revision by id (events on a revision carry its id, not always its label).
 */
export function auditDetail(
  e: AuditEvent,
  revisionLabel?: (id: string) => string | undefined,
): string {
  const after = (e.after ?? {}) as Record<string, unknown>;
  const before = (e.before ?? {}) as Record<string, unknown>;
  const parts: string[] = [];
  const label =
    text(after.label) ??
    text(after.revision) ??
    text(before.label) ??
    (e.entity === 'revision' ? revisionLabel?.(e.entityId) : undefined);
  if (label) parts.push(`rev. ${label}`);
  if (e.action === 'revision.saved') {
    if ('inputs' in after) {
      const n = changedInputs(before, after);
      parts.push(n === 0 ? 'no input changed' : `${n} input${n === 1 ? '' : 's'} changed`);
    }
    return parts.join(' · ');
  }
  const note =
    text(after.justification) ??
    text(after.note) ??
    text(after.comment) ??
    text(after.body) ??
    text(after.changeNote) ??
    text(after.fileName);
  if (note) parts.push(note);
  if (e.action === 'revision.submitted' && after.pass === false) parts.push('with failing checks');
  if (e.action === 'revision.values-confirmed' && typeof after.count === 'number') {
    const n = after.count;
    parts.push(
      `${n} value${n === 1 ? '' : 's'} that came with the sheet confirmed as right for this brake`,
    );
  }
  if (e.action === 'revision.under-review') {
    const set = text(after.criteriaSet);
    const failing = Array.isArray(after.failing) ? after.failing.length : 0;
    if (set) parts.push(`criteria ${set.replace('@', ' v')}`);
    if (failing) parts.push(`${failing} check${failing === 1 ? '' : 's'} failing`);
  }
  if (e.action === 'revision.review-disposed' && text(after.disposition))
    parts.push(String(after.disposition).trim());
  if (e.action === 'revision.superseded' && text(after.supersededBy))
    parts.push(`by rev. ${String(after.supersededBy)}`);
  return parts.join(' · ');
}
