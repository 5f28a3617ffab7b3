import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  approve,
  createSheet,
  createSheetsContext,
  makeRegister,
  submit,
  type Register,
  type SheetsContext,
} from './sheets-fixture.js';

type Pos = {
  id: string;
  tag: string;
  brakeKind: string;
  thruster: string;
  lining: string;
  inForce: { sheetType: string; documentNumber: string }[];
  openSheets: { documentNumber: string; state: string }[];
};

describe('the register kept in the app', () => {
  let ctx: SheetsContext;
  let reg: Register;
  beforeAll(async () => {
    ctx = await createSheetsContext();
  });
  beforeEach(async () => {
    await ctx.resetAll();
    reg = await makeRegister(ctx);
  });
  afterAll(() => ctx?.closeAll());

  const position = async (): Promise<Pos> => {
    const tree = (await ctx.request('GET', '/api/register', { as: 'viewer' })).body;
    return tree.sites[0].machines[0].positions[0];
  };

  it('edits a site, a machine and a position in the plant’s words, audited, by role', async () => {
    const patch = (path: string, as: any, body: unknown) =>
      ctx.request('PATCH', `/api/register/${path}`, { as, body });
    expect(
      (await patch(`sites/${reg.siteId}`, 'engineer', { name: 'Test works east' })).status,
    ).toBe(200);
    const machine = await patch(`machines/${reg.machineId}`, 'admin', { name: 'Ladle crane 2' });
    expect(machine.status, machine.text).toBe(200);
    expect(machine.body).toMatchObject({ name: 'Ladle crane 2', tag: 'CR-01' });
    const words = {
      brakeKind: 'two-shoe drum brake, 400 mm drum',
      thruster: 'electro-hydraulic thruster, 800 N',
      lining: 'woven lining, bonded',
    };
    const pos = await patch(`positions/${reg.positionId}`, 'checker', words);
    expect(pos.status, pos.text).toBe(200);
    expect(await position()).toMatchObject({ tag: 'MH-B1', ...words });

    // Viewers read the register but do not keep it; bad input says which field.
    expect((await patch(`positions/${reg.positionId}`, 'viewer', { lining: 'x' })).status).toBe(
      403,
    );
    expect(
      (await ctx.request('PATCH', `/api/register/positions/${reg.positionId}`, { body: {} }))
        .status,
    ).toBe(401);
    const bad = await patch(`positions/${reg.positionId}`, 'engineer', { motion: 'sideways' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields[0].path).toBe('motion');
    const none = await patch(`positions/${reg.positionId}`, 'engineer', {});
    expect(none.status).toBe(400);
    const missing = await patch('positions/00000000-0000-4000-8000-000000000000', 'engineer', {
      lining: 'x',
    });
    expect(missing.status).toBe(404);
    // The site code is part of every document number: it cannot be patched.
    expect((await patch(`sites/${reg.siteId}`, 'engineer', { code: 'NEW' })).status).toBe(400);

    const audit = await ctx.db
      .selectFrom('auditEvents')
      .select('action')
      .where('entityId', 'in', [reg.siteId, reg.machineId, reg.positionId])
      .execute();
    expect(audit.map((a) => a.action).sort()).toEqual(
      [
        'machine.created',
        'machine.updated',
        'position.created',
        'position.updated',
        'site.created',
        'site.updated',
      ].sort(),
    );
  });

  it('lists the sheet in force per sheet type and the open sheets of a position', async () => {
    const brake = await createSheet(ctx, reg, { title: 'Main hoist brake' });
    await submit(ctx, brake.revisions[0].id);
    await approve(ctx, brake.revisions[0].id);
    const springs = await createSheet(ctx, reg, {
      title: 'Shoe holder disc springs',
      sheetType: 'disc-spring-stack',
    });
    await submit(ctx, springs.revisions[0].id);
    await approve(ctx, springs.revisions[0].id);
    const draft = await createSheet(ctx, reg, { title: 'Second look at the brake' });

    const p = await position();
    expect(p.inForce.map((f) => [f.sheetType, f.documentNumber]).sort()).toEqual(
      [
        ['disc-spring-stack', springs.documentNumber],
        ['hoist-shoe-brake', brake.documentNumber],
      ].sort(),
    );
    expect(p.openSheets).toEqual([
      expect.objectContaining({ documentNumber: draft.documentNumber, state: 'draft' }),
    ]);
  });
});
