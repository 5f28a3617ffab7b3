import { Injectable } from '@nestjs/common';
import { renderFieldRecordPdf } from '@holdfast/print';
import type { PrintQuery } from '@holdfast/shared';
import type { AuthUser } from '../../auth/auth-user.js';
import { FieldRecordPhotosService } from '../../field-records/field-record-photos.service.js';
import { FieldRecordsService } from '../../field-records/field-records.service.js';
import { RevisionsService } from '../../revisions/revisions.service.js';
import { RevisionPrintable } from '../revision-printable.js';
import { printableFieldRecord } from './printable-field-record.js';

/**
 * The printed field record: the revision's title block and look, with the record's own
 * verification code and QR (so /verify answers for the record, not for the sheet).
 */
@Injectable()
export class FieldRecordPrintService {
  constructor(
    private readonly records: FieldRecordsService,
    private readonly photos: FieldRecordPhotosService,
    private readonly revisions: RevisionsService,
    private readonly printable: RevisionPrintable,
  ) {}

  async print(user: AuthUser, id: string, paper: PrintQuery['paper']) {
    const record = await this.records.get(id);
    const revision = await this.revisions.load(user, record.revisionId);
    // The record's code, not the sheet's: a draft record carries none.
    const printable = await this.printable.build(revision, paper, record.verificationCode);
    const bytes = Buffer.from(
      await renderFieldRecordPdf(
        printableFieldRecord(record, printable.sheetType.id, await this.photos.list(id)),
        printable,
      ),
    );
    const marking = record.status === 'draft' ? '-draft' : '';
    const fileName =
      `${record.positionTag}-field-record-${record.performedAt.slice(0, 10)}${marking}.pdf`.replace(
        /[^\w.-]/g,
        '_',
      );
    return { bytes, fileName };
  }
}
