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
@Controller('admin/mail')
export class FailedMailController {
  constructor(private readonly failed: FailedMailService) {}

  @Get('failed')
  async list(): Promise<FailedMailList> {
    return { items: await this.failed.list() };
  }

  @Post(':id/resend')
  @HttpCode(202)
  async resend(@CurrentUser() admin: AuthUser, @Param('id', UuidParamPipe) id: string) {
    await this.failed.resend(id, admin.id);
    return { queued: true };
  }
}
