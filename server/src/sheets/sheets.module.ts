import { Module } from '@nestjs/common';
import { CriteriaModule } from '../criteria/criteria.module.js';
import { RevisionsModule } from '../revisions/revisions.module.js';
import { SheetRowsRepository } from './sheet-rows.repository.js';
import { SheetsController } from './sheets.controller.js';
import { SheetsRepository } from './sheets.repository.js';
import { SheetsService } from './sheets.service.js';

@Module({
  imports: [CriteriaModule, RevisionsModule],
  controllers: [SheetsController],
  providers: [SheetsRepository, SheetRowsRepository, SheetsService],
})
export class SheetsModule {}
