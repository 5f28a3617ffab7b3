import { Module } from '@nestjs/common';
import { CriteriaModule } from '../criteria/criteria.module.js';
import { FieldRecordsModule } from '../field-records/field-records.module.js';
import { FieldRecordPrintController } from './field-record/field-record-print.controller.js';
import { FieldRecordPrintService } from './field-record/field-record-print.service.js';
import { RevisionsModule } from '../revisions/revisions.module.js';
import { ReviewsModule } from '../reviews/reviews.module.js';
import { SheetsRepository } from '../sheets/sheets.repository.js';
import { PrintController } from './print.controller.js';
import { PrintService } from './print.service.js';
import { RevisionPrintable } from './revision-printable.js';
import { SafetyFileController } from './safety-file.controller.js';
import { SafetyFileService } from './safety-file.service.js';

/**
 * The printed sheet, field card and field record: loads what is printed through the services and
 * repositories (read rules, caching, limits) and renders it with @holdfast/print.
 */
@Module({
  imports: [CriteriaModule, RevisionsModule, ReviewsModule, FieldRecordsModule],
  controllers: [PrintController, SafetyFileController, FieldRecordPrintController],
  providers: [
    PrintService,
    RevisionPrintable,
    SafetyFileService,
    SheetsRepository,
    FieldRecordPrintService,
  ],
})
export class PrintModule {}
