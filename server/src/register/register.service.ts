import { Injectable } from '@nestjs/common';
import type {
  CreateMachineInput,
  CreatePositionInput,
  CreateSiteInput,
  OpenSheet,
  Register,
} from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { badRequest } from '../common/errors/api-exception.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { AuditService } from '../audit/audit.service.js';
import { RegisterRepository } from './register.repository.js';

@Injectable()
export class RegisterService {
  constructor(
    private readonly units: UnitOfWork,
    private readonly repo: RegisterRepository,
    private readonly audit: AuditService,
  ) {}

  /** The whole register as a tree, with each position's approved revision in force. */
  async tree(): Promise<Register> {
    const [sites, machines, positions, approved] = await Promise.all([
      this.repo.sites(),
      this.repo.machines(),
      this.repo.positions(),
      this.repo.approvedSheets(),
    ]);
    const open = await this.openSheets();
    // Several sheets may cover one position over time: the most recently approved is in force.
    const current = new Map(approved.map((a) => [a.positionId, a]));
    // A position carries a sheet per kind of calculation (the brake, its disc springs): the most
    // recently approved of each sheet type is in force beside the others.
    const byType = new Map<string, Map<string, (typeof approved)[number]>>();
    for (const a of approved) {
      const types = byType.get(a.positionId) ?? new Map();
      types.set(a.sheetType, a);
      byType.set(a.positionId, types);
    }
    return {
      sites: sites.map((s) => ({
        ...s,
        machines: machines
          .filter((m) => m.siteId === s.id)
          .map((m) => ({
            id: m.id,
            tag: m.tag,
            name: m.name,
            kind: m.kind as Register['sites'][number]['machines'][number]['kind'],
            positions: positions
              .filter((p) => p.machineId === m.id)
              .map((p) => {
                const a = current.get(p.id);
                return {
                  id: p.id,
                  tag: p.tag,
                  description: p.description,
                  brakeKind: p.brakeKind,
                  thruster: p.thruster,
                  lining: p.lining,
                  inForce: [...(byType.get(p.id)?.values() ?? [])].map((x) => ({
                    sheetId: x.sheetId,
                    documentNumber: x.documentNumber,
                    revisionId: x.revisionId,
                    revisionLabel: x.label,
                    sheetType: x.sheetType,
                  })),
                  openSheets: open.get(p.id) ?? [],
                  motion:
                    p.motion as Register['sites'][number]['machines'][number]['positions'][number]['motion'],
                  currentApproved: a
                    ? {
                        sheetId: a.sheetId,
                        documentNumber: a.documentNumber,
                        revisionId: a.revisionId,
                        revisionLabel: a.label,
                      }
                    : null,
                };
              }),
          })),
      })),
    };
  }

  /** Per position, the sheets whose latest revision is still a draft, in check or returned. */
  private async openSheets(): Promise<Map<string, OpenSheet[]>> {
    const rows = await this.repo.openSheets();
    const out = new Map<string, OpenSheet[]>();
    for (const r of rows) {
      const list = out.get(r.positionId) ?? [];
      list.push({
        sheetId: r.id,
        documentNumber: r.documentNumber,
        sheetType: r.sheetType,
        revisionLabel: r.label,
        state: r.state,
      });
      out.set(r.positionId, list);
    }
    return out;
  }

  async createSite(user: AuthUser, input: CreateSiteInput) {
    return this.units.run(async (tx) => {
      const row = await this.repo.insertSite(input, tx);
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'site.created',
        entity: 'register',
        entityId: row.id,
        after: row,
      });
      return row;
    });
  }

  async createMachine(user: AuthUser, input: CreateMachineInput) {
    return this.units.run(async (tx) => {
      if (!(await this.repo.siteExists(input.siteId, tx)))
        throw badRequest('Some fields are not valid.', [
          { path: 'siteId', message: 'no such site' },
        ]);
      const row = await this.repo.insertMachine(input, tx);
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'machine.created',
        entity: 'register',
        entityId: row.id,
        after: row,
      });
      return row;
    });
  }

  async createPosition(user: AuthUser, input: CreatePositionInput) {
    return this.units.run(async (tx) => {
      if (!(await this.repo.machineExists(input.machineId, tx)))
        throw badRequest('Some fields are not valid.', [
          { path: 'machineId', message: 'no such machine' },
        ]);
      const row = await this.repo.insertPosition(input, tx);
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'position.created',
        entity: 'register',
        entityId: row.id,
        after: row,
      });
      return row;
    });
  }
}
