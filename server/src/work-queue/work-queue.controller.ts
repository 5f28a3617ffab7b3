import { apiRoutes } from '@holdfast/shared';
import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { WorkQueue } from '@holdfast/shared';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { SignedIn } from '../auth/policy.js';
import { WorkQueueService } from './work-queue.service.js';

@ApiTags('work-queue')
@ApiBearerAuth()
@Controller()
export class WorkQueueController {
  constructor(private readonly queue: WorkQueueService) {}

  @Get(apiRoutes.workQueue.mine.path)
  @SignedIn()
  get(@CurrentUser() user: AuthUser): Promise<WorkQueue> {
    return this.queue.forUser(user);
  }
}
