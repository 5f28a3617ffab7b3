import { Injectable, NotFoundException } from '@nestjs/common';
import { getSheetType } from '@holdfast/calc';
import type { PrintQuery } from '@holdfast/shared';
import type { AuthUser } from '../../auth/auth-user.js';
import { AppConfig } from '../../config/app-config.js';
import { CriteriaService } from '../../criteria/criteria.service.js';
import { FieldRecordsService } from '../../field-records/field-records.service.js';
import { CHECK_LABELS } from '../../field-records/field-targets.js';
import { RevisionsService } from '../../revisions/revisions.service.js';
import { SheetsService } from '../../sheets/sheets.service.js';
import { buildPrintableSheet } from '../build-printable-sheet.js';
import { renderFieldRecordPdf } from './render-field-record.js';

/**
 * The printed field record: the revision's title block and look, with the record's own
 * verification code and QR (so /verify answers for the record, not for the sheet).
 */
@Injectable()
export class FieldRecordPrintService {
  constructor(
    private readonly records: FieldRecordsService,
    private readonly revisions: RevisionsService,
    private readonly sheets: SheetsService,
    private readonly criteria: CriteriaService,
    private readonly config: AppConfig,
  ) {}

  async print(user: AuthUser, id: string, paper: PrintQuery['paper']) {
    const record = await this.records.get(id);
    const revision = await this.revisions.get(user, record.revisionId);
    const sheetType = getSheetType(revision.sheetType);
    if (!sheetType)
      throw new NotFoundException(`Sheet type ${revision.sheetType} is not known to this server.`);
    const [sheet, criteriaSet] = await Promise.all([
      this.sheets.detail(revision.sheetId),
      this.criteria.load(revision.criteriaSetId, revision.criteriaSetVersion),
    ]);
    const printable = buildPrintableSheet({
      sheet,
      revision,
      sheetType,
      criteriaSet,
      verifyBaseUrl: this.config.settings.PUBLIC_URL,
      paper,
    });
    const base = this.config.settings.PUBLIC_URL.replace(/\/$/, '');
    printable.verification = record.verificationCode
      ? { code: record.verificationCode, url: `${base}/verify/${record.verificationCode}` }
      : null;
    const bytes = await renderFieldRecordPdf(record, printable, CHECK_LABELS);
    const marking = record.status === 'draft' ? '-draft' : '';
    const fileName =
      `${record.positionTag}-field-record-${record.performedAt.slice(0, 10)}${marking}.pdf`.replace(
        /[^\w.-]/g,
        '_',
      );
    return { bytes, fileName };
  }
}
