import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { fieldCheckKeys } from '@holdfast/shared';
import { Database } from '../src/database/database.js';
import { approve, createSheet, sheetsSuite, submit } from './sheets-fixture.js';

describe('signing a field record needs every check item answered', () => {
  const suite = sheetsSuite();

  it('a draft may hold some checks; signing it is a 400 naming each unanswered item, and changes nothing', async () => {
    const sheet = await createSheet(suite.ctx, suite.reg);
    const rev = await submit(suite.ctx, sheet.revisions[0].id);
    await approve(suite.ctx, rev.id);
    const id = randomUUID();
    const answered = ['no-drag-shoe-a', 'set-release-cycles'];
    const created = await suite.ctx.request('POST', '/api/field-records', {
      as: 'technician',
      body: {
        id,
        positionId: suite.reg.positionId,
        revisionId: rev.id,
        kind: 'periodic-inspection',
        performedAt: '2026-11-30T09:00:00Z',
        checks: answered.map((key) => ({ key, result: 'ok' })),
      },
    });
    expect(created.status, created.text).toBe(201);
    // Still a draft: saving it with one more item (and one left out) is fine.
    const saved = await suite.ctx.request('PATCH', `/api/field-records/${id}`, {
      as: 'technician',
      body: { checks: [...answered, 'linkage-condition'].map((key) => ({ key, result: 'ok' })) },
    });
    expect(saved.status, saved.text).toBe(200);

    const refused = await suite.ctx.request('POST', `/api/field-records/${id}/sign`, {
      as: 'technician',
      body: {},
    });
    expect(refused.status, refused.text).toBe(400);
    const fields = refused.body.error.fields as { path: string; message: string }[];
    const open = fieldCheckKeys.filter((k) => ![...answered, 'linkage-condition'].includes(k));
    expect(fields.map((f) => f.path)).toEqual(open.map((k) => `checks.${k}`));
    expect(fields.find((f) => f.path === 'checks.no-drag-shoe-b')?.message).toMatch(
      /No drag on shoe B when released: not answered/,
    );

    const db = suite.ctx.app.get(Database);
    const row = await db
      .selectFrom('fieldRecords')
      .select(['status', 'verificationCode'])
      .where('id', '=', id)
      .executeTakeFirstOrThrow();
    expect(row).toEqual({ status: 'draft', verificationCode: null });
    const signatures = await db
      .selectFrom('fieldRecordSignatures')
      .select('kind')
      .where('recordId', '=', id)
      .execute();
    expect(signatures).toEqual([]);
    const audit = await db
      .selectFrom('auditEvents')
      .select('action')
      .where('entityId', '=', id)
      .execute();
    expect(audit.map((a) => a.action)).not.toContain('field-record.signed');

    // Answered, "not applicable" included, it signs.
    await suite.ctx.request('PATCH', `/api/field-records/${id}`, {
      as: 'technician',
      body: {
        checks: fieldCheckKeys.map((key) => ({
          key,
          result: key === 'thruster-condition' ? 'not-applicable' : 'ok',
        })),
      },
    });
    const signed = await suite.ctx.request('POST', `/api/field-records/${id}/sign`, {
      as: 'technician',
      body: {},
    });
    expect(signed.status, signed.text).toBe(200);
    expect(signed.body.status).toBe('signed');
  });
});
