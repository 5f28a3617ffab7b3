import { Module } from '@nestjs/common';
import { FieldRecordsController } from './field-records.controller.js';
import { FieldRecordsRepository } from './field-records.repository.js';
import { FieldRecordsService } from './field-records.service.js';
import { InspectionRemindersJob } from './inspection-reminders.job.js';
import { InspectionScheduleRepository } from './inspection-schedule.repository.js';
import { InspectionScheduleService } from './inspection-schedule.service.js';
import { PositionFieldController } from './position-field.controller.js';

@Module({
  controllers: [FieldRecordsController, PositionFieldController],
  providers: [
    FieldRecordsRepository,
    FieldRecordsService,
    InspectionScheduleRepository,
    InspectionScheduleService,
    InspectionRemindersJob,
  ],
  exports: [FieldRecordsRepository, FieldRecordsService],
})
export class FieldRecordsModule {}
