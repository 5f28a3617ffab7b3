import type { AuditEvent } from '@holdfast/shared';
import { describe, expect, it } from 'vitest';
import { auditActionWords, auditDetail } from './audit-words';

const event = (action: string, after: unknown): AuditEvent => ({
  id: '00000000-0000-4000-8000-000000000001',
  at: '2026-12-03T08:00:00.000Z',
  actor: null,
  action,
  entity: 'revision',
  entityId: 'r1',
  before: null,
  after,
});

describe('audit trail in words', () => {
  it('names the review events the server writes, never their codes', () => {
    for (const action of [
      'revision.under-review',
      'revision.review-disposed',
      'revision.review-cleared',
    ]) {
      expect(auditActionWords(action)).not.toBe(action);
    }
  });

  it("names the field-record events a sheet's trail shows, never their codes", () => {
    expect(auditActionWords('field-record.created')).toBe('Field record started');
    expect(auditActionWords('field-record.signed')).toBe('Field record signed');
    expect(auditActionWords('field-record.countersigned')).toBe('Field record countersigned');
    for (const action of ['field-record.updated', 'field-record.photo-added'])
      expect(auditActionWords(action)).not.toBe(action);
  });

  it('says how many values that came with the sheet were confirmed unchanged', () => {
    expect(auditActionWords('revision.values-confirmed')).toBe('Values confirmed unchanged');
    const many = event('revision.values-confirmed', { label: 'A', count: 104, confirmed: [] });
    expect(auditDetail(many)).toBe(
      'rev. A · 104 values that came with the sheet confirmed as right for this brake',
    );
    const one = event('revision.values-confirmed', { label: 'B', count: 1, confirmed: ['load'] });
    expect(auditDetail(one)).toBe(
      'rev. B · 1 value that came with the sheet confirmed as right for this brake',
    );
  });

  it('says which criteria flagged a revision and why a disposition lets it stand', () => {
    const flagged = event('revision.under-review', {
      criteriaSet: 'crane-hoist@2',
      failing: ['pv', 'temperature-peak'],
    });
    expect(auditDetail(flagged, () => 'A')).toBe(
      'rev. A · criteria crane-hoist v2 · 2 checks failing',
    );
    const disposed = event('revision.review-disposed', {
      disposition: 'Stands: the lining maker confirms 2.1 MPa·m/s.',
    });
    expect(auditDetail(disposed)).toContain('Stands: the lining maker confirms 2.1 MPa·m/s.');
  });
});
