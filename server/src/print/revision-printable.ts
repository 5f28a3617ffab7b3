import { Injectable, NotFoundException } from '@nestjs/common';
import { getSheetType } from '@holdfast/calc';
import type { PrintQuery, Revision } from '@holdfast/shared';
import { AppConfig } from '../config/app-config.js';
import { CriteriaService } from '../criteria/criteria.service.js';
import { SheetsService } from '../sheets/sheets.service.js';
import { buildPrintableSheet } from './build-printable-sheet.js';
import type { PrintableSheet } from './printable-sheet.js';

/**
 * A revision as the renderers take it: its sheet, sheet type and criteria set loaded and put
 * together. The calculation sheet, the field card and the field record all start here.
 */
@Injectable()
export class RevisionPrintable {
  constructor(
    private readonly sheets: SheetsService,
    private readonly criteria: CriteriaService,
    private readonly config: AppConfig,
  ) {}

  /** The caller has already read `revision` through the read rules. */
  async build(revision: Revision, paper: PrintQuery['paper']): Promise<PrintableSheet> {
    const sheetType = getSheetType(revision.sheetType);
    if (!sheetType)
      throw new NotFoundException(`Sheet type ${revision.sheetType} is not known to this server.`);
    const [sheet, criteriaSet] = await Promise.all([
      this.sheets.detail(revision.sheetId),
      this.criteria.load(revision.criteriaSetId, revision.criteriaSetVersion),
    ]);
    return buildPrintableSheet({
      sheet,
      revision,
      sheetType,
      criteriaSet,
      verifyBaseUrl: this.config.settings.PUBLIC_URL,
      paper,
    });
  }
}
