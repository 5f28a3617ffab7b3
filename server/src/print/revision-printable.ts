import { Injectable, NotFoundException } from '@nestjs/common';
import type { PrintQuery } from '@holdfast/shared';
import { buildPrintableSheet, type PrintableSheet } from '@holdfast/print';
import { notFound } from '../common/errors/api-exception.js';
import { AppConfig } from '../config/app-config.js';
import { CriteriaService } from '../criteria/criteria.service.js';
import { sheetTypeDefinition, UnknownSheetTypeError } from '../calc/calc-engine.js';
import type { RevisionWithSheet } from '../revisions/revisions.repository.js';
import { RevisionsRepository } from '../revisions/revisions.repository.js';
import { SheetsRepository } from '../sheets/sheets.repository.js';
import { UsersRepository } from '../users/users.repository.js';
import { revisionSource, sheetSource } from './printable-source.js';

/**
 * A revision as the renderers take it: its sheet, history, people, sheet type and criteria set
 * read from the repositories and put together as print's plain data. The calculation sheet, the
 * field card and the field record all start here.
 */
@Injectable()
export class RevisionPrintable {
  constructor(
    private readonly sheets: SheetsRepository,
    private readonly revisions: RevisionsRepository,
    private readonly users: UsersRepository,
    private readonly criteria: CriteriaService,
    private readonly config: AppConfig,
  ) {}

  /**
   * The caller has already read `revision` through the read rules. `verificationCode` replaces
   * the revision's own (a field record prints its own code; a draft record none).
   */
  async build(
    revision: RevisionWithSheet,
    paper: PrintQuery['paper'],
    verificationCode: string | null = revision.verificationCode,
  ): Promise<PrintableSheet> {
    const sheetType = this.sheetType(revision.sheetType);
    const [summary, history, criteriaSet, supersededByLabel] = await Promise.all([
      this.sheets.findSummary(revision.sheetId),
      this.revisions.listForSheet(revision.sheetId),
      this.criteria.load(revision.criteriaSetId, revision.criteriaSetVersion),
      revision.supersededById ? this.revisions.label(revision.supersededById) : undefined,
    ]);
    if (!summary) throw notFound('Sheet not found.');
    const people = await this.users.people(
      [revision, ...history].flatMap((r) => [r.authorId, r.checkerId]),
    );
    return buildPrintableSheet({
      sheet: sheetSource(summary, history, people),
      revision: revisionSource(revision, people, { supersededByLabel, verificationCode }),
      sheetType,
      criteriaSet,
      verifyBaseUrl: this.config.settings.PUBLIC_URL,
      paper,
    });
  }

  private sheetType(id: string) {
    try {
      return sheetTypeDefinition(id);
    } catch (e) {
      if (e instanceof UnknownSheetTypeError)
        throw new NotFoundException(`Sheet type ${id} is not known to this server.`);
      throw e;
    }
  }
}
