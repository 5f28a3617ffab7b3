import { Body, Controller, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  createUserSchema,
  updateUserSchema,
  type CreateUserInput,
  type UpdateUserInput,
  type User,
  type UserList,
  apiRoutes,
} from '@holdfast/shared';
import { ApiBodySchema } from '../common/openapi.js';
import { UuidParamPipe } from '../common/pipes/uuid-param.pipe.js';
import { ZodValidationPipe } from '../common/pipes/zod-validation.pipe.js';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { Roles } from '../auth/policy.js';
import { UsersService } from './users.service.js';

@ApiTags('users')
@ApiBearerAuth()
@Roles('admin')
@Controller()
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get(apiRoutes.users.list.path)
  async list(): Promise<UserList> {
    return { items: await this.users.list() };
  }

  @Post(apiRoutes.users.create.path)
  @HttpCode(201)
  @ApiBodySchema(createUserSchema)
  create(@Body(new ZodValidationPipe(createUserSchema)) input: CreateUserInput): Promise<User> {
    return this.users.create(input);
  }

  @Patch(apiRoutes.users.update.path)
  @ApiBodySchema(updateUserSchema)
  update(
    @CurrentUser() actor: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(updateUserSchema)) input: UpdateUserInput,
  ): Promise<User> {
    return this.users.update(actor.id, id, input);
  }
}
