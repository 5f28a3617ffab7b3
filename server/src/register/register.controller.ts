import { Body, Controller, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  createMachineSchema,
  createPositionSchema,
  createSiteSchema,
  type CreateMachineInput,
  type CreatePositionInput,
  type CreateSiteInput,
  type Register,
  type UpdateMachineInput,
  type UpdatePositionInput,
  type UpdateSiteInput,
  updateMachineSchema,
  updatePositionSchema,
  updateSiteSchema,
  apiRoutes,
} from '@holdfast/shared';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { Roles, SignedIn } from '../auth/policy.js';
import { ApiBodySchema } from '../common/openapi.js';
import { UuidParamPipe } from '../common/pipes/uuid-param.pipe.js';
import { ZodValidationPipe } from '../common/pipes/zod-validation.pipe.js';
import { RegisterEditsService } from './register-edits.service.js';
import { RegisterService } from './register.service.js';

@ApiTags('register')
@ApiBearerAuth()
@Controller()
export class RegisterController {
  constructor(
    private readonly register: RegisterService,
    private readonly edits: RegisterEditsService,
  ) {}

  @Get(apiRoutes.register.tree.path)
  @SignedIn()
  tree(): Promise<Register> {
    return this.register.tree();
  }

  @Post(apiRoutes.register.createSite.path)
  @HttpCode(201)
  @Roles('engineer', 'admin')
  @ApiBodySchema(createSiteSchema)
  createSite(
    @CurrentUser() user: AuthUser,
    @Body(new ZodValidationPipe(createSiteSchema)) input: CreateSiteInput,
  ) {
    return this.register.createSite(user, input);
  }

  @Post(apiRoutes.register.createMachine.path)
  @HttpCode(201)
  @Roles('engineer', 'admin')
  @ApiBodySchema(createMachineSchema)
  createMachine(
    @CurrentUser() user: AuthUser,
    @Body(new ZodValidationPipe(createMachineSchema)) input: CreateMachineInput,
  ) {
    return this.register.createMachine(user, input);
  }

  @Post(apiRoutes.register.createPosition.path)
  @HttpCode(201)
  @Roles('engineer', 'admin')
  @ApiBodySchema(createPositionSchema)
  createPosition(
    @CurrentUser() user: AuthUser,
    @Body(new ZodValidationPipe(createPositionSchema)) input: CreatePositionInput,
  ) {
    return this.register.createPosition(user, input);
  }

  @Patch(apiRoutes.register.updateSite.path)
  @Roles('engineer', 'admin')
  @ApiBodySchema(updateSiteSchema)
  updateSite(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(updateSiteSchema)) input: UpdateSiteInput,
  ) {
    return this.edits.updateSite(user, id, input);
  }

  @Patch(apiRoutes.register.updateMachine.path)
  @Roles('engineer', 'admin')
  @ApiBodySchema(updateMachineSchema)
  updateMachine(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(updateMachineSchema)) input: UpdateMachineInput,
  ) {
    return this.edits.updateMachine(user, id, input);
  }

  @Patch(apiRoutes.register.updatePosition.path)
  @Roles('engineer', 'admin')
  @ApiBodySchema(updatePositionSchema)
  updatePosition(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(updatePositionSchema)) input: UpdatePositionInput,
  ) {
    return this.edits.updatePosition(user, id, input);
  }
}
