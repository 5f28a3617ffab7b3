import { describe, expect, it } from 'vitest';
import type { RevisionSummary, SheetDetail } from '@holdfast/shared';
import { revisionSummary, testUsers } from '../../../testing/fixtures';
import { visibleRevisions } from './sheet-page';

const revision = revisionSummary;
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
