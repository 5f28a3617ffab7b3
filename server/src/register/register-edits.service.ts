import { Injectable } from '@nestjs/common';
import type { UpdateMachineInput, UpdatePositionInput, UpdateSiteInput } from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { badRequest, notFound } from '../common/errors/api-exception.js';
import { Database } from '../database/database.js';
import { AuditService } from '../audit/audit.service.js';

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
    private readonly db: Database,
    private readonly audit: AuditService,
  ) {}

  async updateSite(user: AuthUser, id: string, input: UpdateSiteInput) {
    return this.db.transaction().execute(async (trx) => {
      const before = await trx
        .selectFrom('sites')
        .select(['id', 'code', 'name'])
        .where('id', '=', id)
        .forUpdate()
        .executeTakeFirst();
      if (!before) throw notFound('Site not found.');
      const after = await trx
        .updateTable('sites')
        .set(input)
        .where('id', '=', id)
        .returning(['id', 'code', 'name'])
        .executeTakeFirstOrThrow();
      await this.audit.record(trx, {
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
    return this.db.transaction().execute(async (trx) => {
      const before = await trx
        .selectFrom('machines')
        .select(['id', 'siteId', 'tag', 'name', 'kind'])
        .where('id', '=', id)
        .forUpdate()
        .executeTakeFirst();
      if (!before) throw notFound('Machine not found.');
      const after = await trx
        .updateTable('machines')
        .set(input)
        .where('id', '=', id)
        .returning(['id', 'siteId', 'tag', 'name', 'kind'])
        .executeTakeFirstOrThrow();
      await this.audit.record(trx, {
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
    const columns = [
      'id',
      'machineId',
      'tag',
      'description',
      'motion',
      'brakeKind',
      'thruster',
      'lining',
    ] as const;
    return this.db.transaction().execute(async (trx) => {
      const before = await trx
        .selectFrom('brakePositions')
        .select(columns)
        .where('id', '=', id)
        .forUpdate()
        .executeTakeFirst();
      if (!before) throw notFound('Brake position not found.');
      const after = await trx
        .updateTable('brakePositions')
        .set(input)
        .where('id', '=', id)
        .returning(columns)
        .executeTakeFirstOrThrow();
      await this.audit.record(trx, {
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
