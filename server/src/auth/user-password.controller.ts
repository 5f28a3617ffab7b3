import { apiRoutes } from '@holdfast/shared';
import { Controller, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { PasswordResetIssued } from '@holdfast/shared';
import { UuidParamPipe } from '../common/pipes/uuid-param.pipe.js';
import { CurrentUser, type AuthUser } from './auth-user.js';
import { PasswordResetService } from './password-reset.service.js';
import { Roles } from './policy.js';

@ApiTags('users')
@ApiBearerAuth()
@Roles('admin')
@Controller()
export class UserPasswordController {
  constructor(private readonly resets: PasswordResetService) {}

  /** Admin reset: the password stops working now and the user is mailed a one-time link. */
  @Post(apiRoutes.users.sendPasswordReset.path)
  @HttpCode(202)
  reset(
    @CurrentUser() admin: AuthUser,
    @Param('id', UuidParamPipe) id: string,
  ): Promise<PasswordResetIssued> {
    return this.resets.issue(admin.id, id);
  }
}
