import { Injectable } from '@nestjs/common';
import type { UpdateMachineInput, UpdatePositionInput, UpdateSiteInput } from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { badRequest, notFound } from '../common/errors/api-exception.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { AuditService } from '../audit/audit.service.js';
import { RegisterEditsRepository } from './register-edits.repository.js';

const nothing = () =>
  badRequest('Nothing to change.', [{ path: '', message: 'send at least one field' }]);

/**
 * Edits of the register, each with its before and after in the audit trail. Sheets refer to
 * positions by id, so a renamed tag shows on them at once; a site's code stays, because it is
 * part of every document number already issued.
 */
@Injectable()
export class RegisterEditsService {
  constructor(
    private readonly units: UnitOfWork,
    private readonly repo: RegisterEditsRepository,
    private readonly audit: AuditService,
  ) {}

  async updateSite(user: AuthUser, id: string, input: UpdateSiteInput) {
    return this.units.run(async (tx) => {
      const before = await this.repo.siteForUpdate(id, tx);
      if (!before) throw notFound('Site not found.');
      const after = await this.repo.updateSite(id, input, tx);
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'site.updated',
        entity: 'register',
        entityId: id,
        before,
        after,
      });
      return after;
    });
  }

  async updateMachine(user: AuthUser, id: string, input: UpdateMachineInput) {
    if (Object.keys(input).length === 0) throw nothing();
    return this.units.run(async (tx) => {
      const before = await this.repo.machineForUpdate(id, tx);
      if (!before) throw notFound('Machine not found.');
      const after = await this.repo.updateMachine(id, input, tx);
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'machine.updated',
        entity: 'register',
        entityId: id,
        before,
        after,
      });
      return after;
    });
  }

  async updatePosition(user: AuthUser, id: string, input: UpdatePositionInput) {
    if (Object.keys(input).length === 0) throw nothing();
    return this.units.run(async (tx) => {
      const before = await this.repo.positionForUpdate(id, tx);
      if (!before) throw notFound('Brake position not found.');
      const after = await this.repo.updatePosition(id, input, tx);
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'position.updated',
        entity: 'register',
        entityId: id,
        before,
        after,
      });
      return after;
    });
  }
}
