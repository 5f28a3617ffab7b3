import { Injectable } from '@nestjs/common';
import type { SheetInputs } from '@holdfast/calc';
import type {
  Compare,
  CompareQuery,
  CreateSheetInput,
  NewRevisionInput,
  Revision,
  SheetDetail,
  SheetList,
  SheetListQuery,
} from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { badRequest, conflict, forbidden, notFound } from '../common/errors/api-exception.js';
import { type Tx, UnitOfWork } from '../database/unit-of-work.js';
import { AuditService } from '../audit/audit.service.js';
import { CriteriaService } from '../criteria/criteria.service.js';
import {
  coreVersion,
  defaultCriteriaSetId,
  blankFields,
  evaluateSheet,
  fieldLabel,
  startingInputs,
  withoutRetiredInputs,
} from '../calc/calc-engine.js';
import { diffChecks, diffInputs, diffResults } from '../revisions/diff.js';
import { canReadContent } from '../revisions/revision-access.js';
import { auditFor } from '../revisions/read-rules.js';
import { revisionLabel } from '../revisions/revision-codes.js';
import { toRevisionSummary } from '../revisions/revision-mapper.js';
import { RevisionsRepository } from '../revisions/revisions.repository.js';
import { RevisionsService } from '../revisions/revisions.service.js';
import type { SheetEvaluation } from '@holdfast/calc';
import type { JsonText } from '../http/json-text.js';
import { toSheetSummary } from './sheet-mapper.js';
import { SheetRowsRepository } from './sheet-rows.repository.js';
import { SheetsRepository } from './sheets.repository.js';
import { UsersRepository } from '../users/users.repository.js';

/** A preview evaluation for a new draft; a draft may start incomplete, so failures give null. */
function preview(
  sheetType: string,
  inputs: SheetInputs,
  criteria: Parameters<typeof evaluateSheet>[2],
) {
  try {
    return JSON.stringify(evaluateSheet(sheetType, inputs, criteria));
  } catch {
    return null;
  }
}

@Injectable()
export class SheetsService {
  constructor(
    private readonly units: UnitOfWork,
    private readonly repo: SheetsRepository,
    private readonly rows: SheetRowsRepository,
    private readonly revisionsRepo: RevisionsRepository,
    private readonly users: UsersRepository,
    private readonly revisions: RevisionsService,
    private readonly criteria: CriteriaService,
    private readonly audit: AuditService,
  ) {}

  /** The register page as JSON text, in the key order of `SheetList`. */
  async list(query: SheetListQuery): Promise<JsonText<SheetList>> {
    const { items, total } = await this.repo.listJson(query);
    return `{"items":${items},"total":${total},"page":${query.page},"pageSize":${query.pageSize}}`;
  }

  async detail(id: string, tx?: Tx): Promise<SheetDetail> {
    const row = await this.repo.findSummary(id, tx);
    if (!row) throw notFound('Sheet not found.');
    const revs = await this.revisionsRepo.listForSheet(id, tx);
    const people = await this.users.people(
      revs.flatMap((r) => [r.authorId, r.checkerId]),
      tx,
    );
    return {
      ...toSheetSummary(row),
      criteriaSetId: row.criteriaSetId,
      revisions: revs.map((r) => toRevisionSummary(r, people)),
    };
  }

  async create(user: AuthUser, input: CreateSheetInput): Promise<SheetDetail> {
    const id = await this.units.run(async (tx) => {
      const position = await this.rows.findPosition(input.positionId, tx);
      if (!position)
        throw badRequest('Some fields are not valid.', [
          { path: 'positionId', message: 'no such brake position' },
        ]);
      const criteriaSetId =
        input.criteriaSetId ?? defaultCriteriaSetId(input.sheetType, position.motion);
      if (!(await this.rows.criteriaSetExists(criteriaSetId, tx)))
        throw badRequest('Some fields are not valid.', [
          { path: 'criteriaSetId', message: 'no such criteria set' },
        ]);
      const criteria = await this.criteria.load(criteriaSetId, 'latest', tx);
      const documentNumber = await this.rows.nextDocumentNumber(position.siteId, tx);
      const sheetId = await this.rows.insert(
        {
          documentNumber,
          title: input.title,
          positionId: position.id,
          machineId: position.machineId,
          siteId: position.siteId,
          tags: `${position.machineTag} ${position.tag}`,
          sheetType: input.sheetType,
          ownerId: user.id,
          criteriaSetId,
        },
        tx,
      );
      const { inputs, unconfirmed, copiedFrom } = await this.startOf(input, tx);
      const evaluation =
        blankFields(inputs).length > 0 ? null : preview(input.sheetType, inputs, criteria);
      const revisionId = await this.revisionsRepo.insert(
        {
          sheetId,
          seq: 1,
          label: 'A',
          inputs: JSON.stringify(inputs),
          unitSystem: user.unitSystem,
          criteriaSetId,
          criteriaSetVersion: criteria.version,
          evaluation,
          coreVersion: evaluation ? coreVersion() : null,
          authorId: user.id,
          changeNote: 'First issue.',
          unconfirmed: JSON.stringify(unconfirmed),
        },
        tx,
      );
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'sheet.created',
        entity: 'sheet',
        entityId: sheetId,
        sheetId,
        after: {
          documentNumber,
          title: input.title,
          sheetType: input.sheetType,
          positionId: position.id,
          criteriaSetId,
          revisionId,
          label: 'A',
          start: input.start?.kind ?? 'example (unmarked)',
          ...(copiedFrom ? { copiedFrom } : {}),
        },
      });
      return sheetId;
    });
    return this.detail(id);
  }

  /** What the first revision of a new sheet holds, by the way the engineer chose to start it. */
  private async startOf(
    input: CreateSheetInput,
    tx: Tx,
  ): Promise<{ inputs: SheetInputs; unconfirmed: string[]; copiedFrom?: string }> {
    const start = input.start;
    // No choice made is the example duty, every value marked: nothing invented goes to check
    // unless someone confirms it, whichever client made the sheet.
    if (!start || start.kind !== 'copy')
      return startingInputs(input.sheetType, start?.kind ?? 'example');
    const source = await this.revisionsRepo.find(start.revisionId, tx);
    const refuse = (message: string) =>
      badRequest('Some fields are not valid.', [{ path: 'start.revisionId', message }]);
    if (!source) throw refuse('no such revision');
    if (source.state !== 'approved') throw refuse('only an approved revision can be copied');
    if (source.sheetType !== input.sheetType)
      throw refuse(`that revision is a ${source.sheetType} sheet, not ${input.sheetType}`);
    const inputs = withoutRetiredInputs(
      input.sheetType,
      structuredClone(source.inputs as SheetInputs),
    );
    // Copied values were right for another brake: each stays marked until confirmed for this one.
    return { inputs, unconfirmed: Object.keys(inputs), copiedFrom: source.id };
  }

  /** A new draft copying the latest revision's inputs; refused while a revision is open. */
  async newRevision(user: AuthUser, sheetId: string, input: NewRevisionInput): Promise<Revision> {
    const id = await this.units.run(async (tx) => {
      const sheet = await this.rows.findForUpdate(sheetId, tx);
      if (!sheet) throw notFound('Sheet not found.');
      const latest = await this.revisionsRepo.latestForSheet(sheetId, tx);
      if (['draft', 'in_check', 'returned'].includes(latest.state)) {
        throw conflict(
          `Revision ${latest.label} is still ${latest.state.replace('_', ' ')}; finish it first.`,
          {
            openRevisionId: latest.id,
          },
        );
      }
      const criteria = await this.criteria.load(sheet.criteriaSetId, 'latest', tx);
      const inputs = withoutRetiredInputs(sheet.sheetType, latest.inputs as SheetInputs);
      const evaluation = preview(sheet.sheetType, inputs, criteria);
      const seq = latest.seq + 1;
      const revisionId = await this.revisionsRepo.insert(
        {
          sheetId,
          seq,
          label: revisionLabel(seq),
          inputs: JSON.stringify(inputs),
          unitSystem: latest.unitSystem,
          criteriaSetId: sheet.criteriaSetId,
          criteriaSetVersion: criteria.version,
          evaluation,
          coreVersion: evaluation ? coreVersion() : null,
          authorId: user.id,
          changeNote: input.changeNote,
        },
        tx,
      );
      await this.audit.record(tx, {
        actorId: user.id,
        action: 'revision.created',
        entity: 'revision',
        entityId: revisionId,
        sheetId,
        before: { latest: latest.label, state: latest.state },
        after: {
          label: revisionLabel(seq),
          state: 'draft',
          copiedFrom: latest.id,
          changeNote: input.changeNote,
        },
      });
      return revisionId;
    });
    return this.revisions.get(user, id);
  }

  async compare(user: AuthUser, sheetId: string, query: CompareQuery): Promise<Compare> {
    const [a, b] = await Promise.all([
      this.revisionsRepo.find(query.from),
      this.revisionsRepo.find(query.to),
    ]);
    if (!a || !b || a.sheetId !== sheetId || b.sheetId !== sheetId)
      throw notFound('Both revisions must belong to this sheet.');
    if (!canReadContent(user, a) || !canReadContent(user, b))
      throw forbidden('Only approved revisions are open to your role.');
    const people = await this.users.people([a.authorId, a.checkerId, b.authorId, b.checkerId]);
    return {
      from: toRevisionSummary(a, people),
      to: toRevisionSummary(b, people),
      inputs: diffInputs(a.inputs as SheetInputs, b.inputs as SheetInputs, (k) =>
        fieldLabel(a.sheetType, k),
      ),
      results: diffResults(
        a.evaluation as SheetEvaluation | null,
        b.evaluation as SheetEvaluation | null,
      ),
      checks: diffChecks(
        a.evaluation as SheetEvaluation | null,
        b.evaluation as SheetEvaluation | null,
      ),
    };
  }

  /** Who did what and when; payloads follow the revision read rules (see read-rules.ts). */
  async auditTrail(user: AuthUser, sheetId: string) {
    if (!(await this.rows.exists(sheetId))) throw notFound('Sheet not found.');
    return { items: auditFor(user, await this.audit.forSheet(sheetId)) };
  }
}
