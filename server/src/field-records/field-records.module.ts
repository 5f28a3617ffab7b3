import { Module } from '@nestjs/common';
import { StorageModule } from '../storage/storage.module.js';
import { UsersModule } from '../users/users.module.js';
import { FieldRecordSigningRepository } from './field-record-signing.repository.js';
import { FieldRecordSigningService } from './field-record-signing.service.js';
import { FieldRecordPhotosService } from './field-record-photos.service.js';
import { FieldRecordsController } from './field-records.controller.js';
import { FieldRecordsRepository } from './field-records.repository.js';
import { FieldRecordsService } from './field-records.service.js';
import { InspectionRemindersJob } from './inspection-reminders.job.js';
import { InspectionScheduleRepository } from './inspection-schedule.repository.js';
import { InspectionScheduleService } from './inspection-schedule.service.js';
import { PositionFieldController } from './position-field.controller.js';

@Module({
  imports: [StorageModule, UsersModule],
  controllers: [FieldRecordsController, PositionFieldController],
  providers: [
    FieldRecordsRepository,
    FieldRecordSigningRepository,
    FieldRecordsService,
    FieldRecordSigningService,
    InspectionScheduleRepository,
    InspectionScheduleService,
    InspectionRemindersJob,
    FieldRecordPhotosService,
  ],
  exports: [
    FieldRecordsRepository,
    FieldRecordsService,
    FieldRecordSigningService,
    FieldRecordPhotosService,
  ],
})
export class FieldRecordsModule {}
