import { Controller, Get, Param, UseGuards } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import { verificationCodeSchema, type VerifyResult, apiRoutes } from '@holdfast/shared';
import { Public } from '../auth/policy.js';
import { ZodValidationPipe } from '../common/pipes/zod-validation.pipe.js';
import { VerifyThrottlerGuard, verifyLimit } from './verify-throttler.guard.js';
import { VerifyService } from './verify.service.js';

@ApiTags('verify')
@Controller()
export class VerifyController {
  constructor(private readonly verifier: VerifyService) {}

  @Get(apiRoutes.verify.byCode.path)
  @Public()
  @UseGuards(VerifyThrottlerGuard)
  // The app's throttler is named 'login'; this route gets its own limit and counter.
  @Throttle({ login: { limit: verifyLimit, ttl: 60_000 } })
  verify(
    @Param('code', new ZodValidationPipe(verificationCodeSchema, 'code')) code: string,
  ): Promise<VerifyResult> {
    return this.verifier.verify(code);
  }
}
