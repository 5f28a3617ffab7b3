import { describe, expect, it } from 'vitest';
import { createSheet, getRevision, sheetsSuite } from './sheets-fixture.js';

// Issue 10 item 6 through the API: the scenarios that found each gap are refused at submit
// (failing checks need a written justification) and name the check.
describe('checks at the speed the brake sets with, through the API', () => {
  const s = sheetsSuite();

  async function submitWith(sheetType: string, change: Record<string, unknown>) {
    const sheet = await createSheet(s.ctx, s.reg, { sheetType });
    const rev = await getRevision(s.ctx, sheet.revisions[0].id);
    const put = await s.ctx.request('PUT', `/api/revisions/${rev.id}`, {
      as: 'engineer',
      body: {
        inputs: { ...rev.inputs, ...change },
        unitSystem: 'SI',
        changeNote: 'Test scenario.',
        unconfirmed: [],
        rowVersion: rev.rowVersion,
      },
    });
    expect(put.status, put.text).toBe(200);
    const saved = await getRevision(s.ctx, rev.id);
    return s.ctx.request('POST', `/api/revisions/${rev.id}/submit`, {
      as: 'engineer',
      body: { rowVersion: saved.rowVersion },
    });
  }

  it('the demo hoist passes every check and is submitted without a justification', async () => {
    const res = await submitWith('hoist-shoe-brake', {});
    expect(res.status, res.text).toBe(200);
    expect(res.body.evaluation.pass).toBe(true);
    const ids = res.body.evaluation.checks.map((c: { id: string }) => c.id);
    expect(ids).toEqual(
      expect.arrayContaining(['motor-overspeed', 'spring-travel-ratio-geometry', 'pv']),
    );
  });

  it('a 10 s set delay is refused for the motor overspeed', async () => {
    const res = await submitWith('hoist-shoe-brake', { setDelay: { value: 10, unit: 's' } });
    expect(res.status, res.text).toBe(400);
    expect(res.body.error.fields[0].path).toBe('justification');
    expect(res.body.error.fields[0].message).toContain(
      'Motor speed when the brake sets ≤ motor maximum speed',
    );
  });

  it('a drive-train rating below the top-of-range torque is refused', async () => {
    const res = await submitWith('hoist-shoe-brake', {
      maxBrakeTorque: { value: 650, unit: 'N m' },
    });
    expect(res.status, res.text).toBe(400);
    expect(res.body.error.fields[0].message).toContain('spring at the top of its range');
  });

  it('a caliper hoisted mass that does not match torque and speed is refused', async () => {
    const res = await submitWith('caliper-disc-brake', { loadMass: { value: 12_000, unit: 'kg' } });
    expect(res.status, res.text).toBe(400);
    expect(res.body.error.fields[0].message).toContain(
      'Static torque agrees with the hoisted mass',
    );
  });
});
