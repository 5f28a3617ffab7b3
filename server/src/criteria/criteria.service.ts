import { Injectable, Logger, type OnModuleInit } from '@nestjs/common';
import type { CriteriaSet } from '@holdfast/calc';
import type {
  CriteriaSetDetail,
  CriteriaSetSummary,
  PublishCriteriaVersionInput,
} from '@holdfast/shared';
import { badRequest, notFound } from '../common/errors/api-exception.js';
import { UnitOfWork, type Tx } from '../database/unit-of-work.js';
import { AuditService } from '../audit/audit.service.js';
import { criterionUnit, shippedCriteriaSets } from '../calc/calc-engine.js';
import { ReviewsService } from '../reviews/reviews.service.js';
import { UsersRepository } from '../users/users.repository.js';
import { CriteriaRepository } from './criteria.repository.js';
import { confirmationsFor } from './confirmations.js';

@Injectable()
export class CriteriaService implements OnModuleInit {
  private readonly logger = new Logger('CriteriaService');

  constructor(
    private readonly units: UnitOfWork,
    private readonly repo: CriteriaRepository,
    private readonly users: UsersRepository,
    private readonly audit: AuditService,
    private readonly reviews: ReviewsService,
  ) {}

  /** The calc core's shipped sets exist in the database as version 1. */
  async onModuleInit(): Promise<void> {
    const sets = shippedCriteriaSets();
    if (sets.length === 0) this.logger.warn('the calculation core ships no criteria sets yet');
    for (const set of sets) await this.repo.ensureShipped(set);
  }

  async list(): Promise<CriteriaSetSummary[]> {
    const rows = await this.repo.listWithLatest();
    return rows.map((r) => ({ ...r, publishedAt: r.publishedAt.toISOString() }));
  }

  /** A version as calc's CriteriaSet, for evaluation. */
  async load(id: string, version: number | 'latest', tx?: Tx): Promise<CriteriaSet> {
    const set = await this.repo.findSet(id);
    const row = set && (await this.repo.version(id, version, tx));
    if (!set || !row) throw notFound(`Criteria set ${id} version ${version} does not exist.`);
    return {
      id,
      version: row.version,
      name: set.name,
      description: set.description,
      values: row.values,
    };
  }

  async detail(id: string, version?: number): Promise<CriteriaSetDetail> {
    const set = await this.repo.findSet(id);
    if (!set) throw notFound(`Criteria set ${id} does not exist.`);
    const versions = await this.repo.versions(id);
    const row =
      version === undefined ? versions.at(-1) : versions.find((v) => v.version === version);
    if (!row) throw notFound(`Criteria set ${id} has no version ${version}.`);
    const publisher = row.publishedBy
      ? (await this.users.people([row.publishedBy])).get(row.publishedBy)
      : undefined;
    return {
      id,
      version: row.version,
      name: set.name,
      description: set.description,
      values: row.values,
      note: row.note,
      publishedAt: row.publishedAt.toISOString(),
      publishedBy: publisher ?? null,
      versions: versions.map((v) => ({
        version: v.version,
        publishedAt: v.publishedAt.toISOString(),
      })),
      confirmations: confirmationsFor(row.version, versions, await this.repo.confirmations(id)),
    };
  }

  /** The confirmations holding for one version (for print). */
  async confirmations(id: string, version: number) {
    const versions = await this.repo.versions(id);
    return confirmationsFor(version, versions, await this.repo.confirmations(id));
  }

  /** Publish the next version. Values must cover exactly the keys of the latest version. */
  async publish(
    actorId: string,
    id: string,
    input: PublishCriteriaVersionInput,
  ): Promise<CriteriaSetDetail> {
    const next = await this.units.run(async (tx) => {
      if (!(await this.repo.lockSet(id, tx))) throw notFound(`Criteria set ${id} does not exist.`);
      const latest = await this.repo.version(id, 'latest', tx);
      if (!latest) throw notFound(`Criteria set ${id} has no versions.`);
      const want = new Set(latest.values.map((v) => v.key));
      const got = input.values.map((v) => v.key);
      const fields = [
        ...[...want]
          .filter((k) => !got.includes(k))
          .map((k) => ({ path: 'values', message: `value "${k}" is missing` })),
        ...got
          .map((k, i) => ({ k, i }))
          .filter(({ k, i }) => !want.has(k) || got.indexOf(k) !== i)
          .map(({ k, i }) => ({
            path: `values.${i}.key`,
            message: `"${k}" is unknown or repeated`,
          })),
      ];
      if (fields.length) throw badRequest('The values do not match the set.', fields);
      const version = latest.version + 1;
      await this.repo.insertVersion(tx, {
        criteriaSetId: id,
        version,
        // An empty unit means the declared one; the record always names it.
        values: input.values.map((v) => ({ ...v, unit: criterionUnit(v.key) ?? v.unit })),
        note: input.note,
        publishedBy: actorId,
      });
      await this.audit.record(tx, {
        actorId,
        action: 'criteria-set.published',
        entity: 'criteria-set',
        entityId: id,
        before: { version: latest.version, values: latest.values },
        after: { version, values: input.values, note: input.note },
      });
      // Approvals follow criteria changes: in the same transaction, so no version is ever
      // published without its flags.
      await this.reviews.flagAfterPublish(tx, actorId, await this.load(id, version, tx));
      return version;
    });
    return this.detail(id, next);
  }
}
