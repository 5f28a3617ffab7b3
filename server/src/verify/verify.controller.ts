import { Controller, Get, Param, UseGuards } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import {
  apiRoutes,
  verificationCodeSchema,
  type FieldRecordVerify,
  type VerifyResult,
} from '@holdfast/shared';
import { FieldRecordSigningService } from '../field-records/field-record-signing.service.js';
import { Public } from '../auth/policy.js';
import { ZodValidationPipe } from '../common/pipes/zod-validation.pipe.js';
import { VerifyThrottlerGuard, verifyLimit } from './verify-throttler.guard.js';
import { VerifyService } from './verify.service.js';

@ApiTags('verify')
@Controller()
export class VerifyController {
  constructor(
    private readonly verifier: VerifyService,
    private readonly fieldRecords: FieldRecordSigningService,
  ) {}

  @Get(apiRoutes.verify.byCode.path)
  @Public()
  @UseGuards(VerifyThrottlerGuard)
  // The app's throttler is named 'login'; this route gets its own limit and counter.
  @Throttle({ login: { limit: verifyLimit, ttl: 60_000 } })
  async verify(
    @Param('code', new ZodValidationPipe(verificationCodeSchema, 'code')) code: string,
  ): Promise<VerifyResult | FieldRecordVerify> {
    // A printed field record carries a code of the same shape; its answer says so (`kind`).
    const record = await this.fieldRecords.verify(code);
    return record ?? this.verifier.verify(code);
  }
}
