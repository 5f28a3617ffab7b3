import { apiRoutes } from '@holdfast/shared';
import { Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { FailedMailList } from '@holdfast/shared';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { Roles } from '../auth/policy.js';
import { UuidParamPipe } from '../common/pipes/uuid-param.pipe.js';
import { FailedMailService } from './failed-mail.service.js';

@ApiTags('admin')
@ApiBearerAuth()
@Roles('admin')
@Controller()
export class FailedMailController {
  constructor(private readonly failed: FailedMailService) {}

  @Get(apiRoutes.admin.failedMail.path)
  async list(): Promise<FailedMailList> {
    return { items: await this.failed.list() };
  }

  @Post(apiRoutes.admin.resendMail.path)
  @HttpCode(202)
  async resend(@CurrentUser() admin: AuthUser, @Param('id', UuidParamPipe) id: string) {
    await this.failed.resend(id, admin.id);
    return { queued: true };
  }
}
