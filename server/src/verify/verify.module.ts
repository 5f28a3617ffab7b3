import { Module } from '@nestjs/common';
import { FieldRecordsModule } from '../field-records/field-records.module.js';
import { VerifyThrottlerGuard } from './verify-throttler.guard.js';
import { VerifyController } from './verify.controller.js';
import { VerifyService } from './verify.service.js';

@Module({
  imports: [FieldRecordsModule],
  controllers: [VerifyController],
  providers: [VerifyService, VerifyThrottlerGuard],
})
export class VerifyModule {}
