import { describe, expect, it } from 'vitest';
import type { RevisionSummary, SheetDetail } from '@holdfast/shared';
import { testUsers } from '../../../testing/fixtures';
import { visibleRevisions } from './sheet-page';

const person = { id: testUsers.engineer.id, displayName: 'Erin Vale', initials: 'EV' };
const revision = (label: string, state: RevisionSummary['state']): RevisionSummary => ({
  id: `00000000-0000-4000-8000-00000000000${label.charCodeAt(0) - 64}`,
  label,
  state,
  author: person,
  checker: null,
  changeNote: '',
  createdAt: '2026-12-01T08:00:00.000Z',
  submittedAt: null,
  approvedAt: null,
  returnedAt: null,
});
const sheet = {
  revisions: [revision('A', 'superseded'), revision('B', 'approved'), revision('C', 'draft')],
} as SheetDetail;
const labels = (rs: RevisionSummary[]) => rs.map((r) => r.label).join('');

describe('visibleRevisions', () => {
  it('shows engineers and checkers every revision, drafts too', () => {
    expect(labels(visibleRevisions(sheet, testUsers.engineer))).toBe('ABC');
    expect(labels(visibleRevisions(sheet, testUsers.checker))).toBe('ABC');
  });

  it('shows viewers, fitters and admins the released revisions only, as the server reads them', () => {
    for (const user of [testUsers.viewer, testUsers.technician, testUsers.admin])
      expect(labels(visibleRevisions(sheet, user))).toBe('AB');
  });
});
