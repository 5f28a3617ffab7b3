import { Injectable } from '@nestjs/common';
import { criterionUnit } from '../calc/calc-engine.js';
import type {
  ConfirmCriterionInput,
  CreateCriteriaSetInput,
  CriteriaSetDetail,
} from '@holdfast/shared';
import { badRequest, conflict, notFound } from '../common/errors/api-exception.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { AuditService } from '../audit/audit.service.js';
import { CriteriaRepository } from './criteria.repository.js';
import { CriteriaService } from './criteria.service.js';

/** Admins create criteria sets of their own; admins and checkers confirm values against documents. */
@Injectable()
export class CriteriaAdminService {
  constructor(
    private readonly units: UnitOfWork,
    private readonly repo: CriteriaRepository,
    private readonly criteria: CriteriaService,
    private readonly audit: AuditService,
  ) {}

  async create(actorId: string, input: CreateCriteriaSetInput): Promise<CriteriaSetDetail> {
    await this.units.run(async (tx) => {
      if (await this.repo.setExists(input.id, tx))
        throw conflict(`A criteria set with the id "${input.id}" exists already.`);
      const values = input.values.map((v) => ({
        ...v,
        unit: criterionUnit(v.key) ?? v.unit,
      }));
      await this.repo.createSet(
        tx,
        { id: input.id, name: input.name, description: input.description },
        values,
        input.note,
        actorId,
      );
      await this.audit.record(tx, {
        actorId,
        action: 'criteria-set.created',
        entity: 'criteria-set',
        entityId: input.id,
        after: { name: input.name, version: 1, values, note: input.note },
      });
    });
    return this.criteria.detail(input.id, 1);
  }

  async confirm(
    actorId: string,
    id: string,
    version: number,
    input: ConfirmCriterionInput,
  ): Promise<CriteriaSetDetail> {
    await this.units.run(async (tx) => {
      const row = await this.repo.version(id, version, tx);
      if (!row) throw notFound(`Criteria set ${id} has no version ${version}.`);
      const value = row.values.find((v) => v.key === input.key);
      if (!value) {
        throw badRequest('The set has no such value.', [
          { path: 'key', message: `version ${version} of "${id}" has no value "${input.key}"` },
        ]);
      }
      await this.repo.insertConfirmation(tx, {
        criteriaSetId: id,
        version,
        key: input.key,
        document: input.document,
        clause: input.clause,
        confirmedBy: actorId,
      });
      await this.audit.record(tx, {
        actorId,
        action: 'criteria-set.value-confirmed',
        entity: 'criteria-set',
        entityId: id,
        after: {
          version,
          key: input.key,
          value: value.value,
          document: input.document,
          clause: input.clause,
        },
      });
    });
    return this.criteria.detail(id, version);
  }
}
