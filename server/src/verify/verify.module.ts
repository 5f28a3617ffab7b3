import { Module } from '@nestjs/common';
import { VerifyThrottlerGuard } from './verify-throttler.guard.js';
import { VerifyController } from './verify.controller.js';
import { VerifyService } from './verify.service.js';

@Module({ controllers: [VerifyController], providers: [VerifyService, VerifyThrottlerGuard] })
export class VerifyModule {}
