import { Body, Controller, Get, HttpCode, Param, Post, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  approveRevisionSchema,
  returnRevisionSchema,
  saveRevisionSchema,
  submitRevisionSchema,
  type ApproveRevisionInput,
  type DriftReport,
  type ReturnRevisionInput,
  type Revision,
  type RevisionChanges,
  type SaveRevisionInput,
  type SubmitRevisionInput,
  apiRoutes,
} from '@holdfast/shared';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { Roles, SignedIn } from '../auth/policy.js';
import { ApiBodySchema } from '../common/openapi.js';
import { UuidParamPipe } from '../common/pipes/uuid-param.pipe.js';
import { ZodValidationPipe } from '../common/pipes/zod-validation.pipe.js';
import { ChangesService } from './changes.service.js';
import { DriftService } from './drift.service.js';
import { RevisionsService } from './revisions.service.js';
import { WorkflowService } from './workflow.service.js';

@ApiTags('revisions')
@ApiBearerAuth()
@Controller()
export class RevisionsController {
  constructor(
    private readonly revisions: RevisionsService,
    private readonly workflow: WorkflowService,
    private readonly driftService: DriftService,
    private readonly changesService: ChangesService,
  ) {}

  @Get(apiRoutes.revisions.detail.path)
  @SignedIn()
  get(@CurrentUser() user: AuthUser, @Param('id', UuidParamPipe) id: string): Promise<Revision> {
    return this.revisions.get(user, id);
  }

  /** Inputs changed since the last submission the checker saw; same read rule as the revision. */
  @Get(apiRoutes.revisions.changes.path)
  @SignedIn()
  changes(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
  ): Promise<RevisionChanges> {
    return this.changesService.changes(user, id);
  }

  @Put(apiRoutes.revisions.save.path)
  @Roles('engineer')
  @ApiBodySchema(saveRevisionSchema)
  save(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(saveRevisionSchema)) input: SaveRevisionInput,
  ): Promise<Revision> {
    return this.revisions.save(user, id, input);
  }

  @Post(apiRoutes.revisions.submit.path)
  @HttpCode(200)
  @Roles('engineer')
  @ApiBodySchema(submitRevisionSchema)
  submit(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(submitRevisionSchema)) input: SubmitRevisionInput,
  ): Promise<Revision> {
    return this.workflow.submit(user, id, input);
  }

  @Post(apiRoutes.revisions.approve.path)
  @HttpCode(200)
  @Roles('checker')
  @ApiBodySchema(approveRevisionSchema)
  approve(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(approveRevisionSchema)) input: ApproveRevisionInput,
  ): Promise<Revision> {
    return this.workflow.approve(user, id, input);
  }

  @Post(apiRoutes.revisions.return.path)
  @HttpCode(200)
  @Roles('checker')
  @ApiBodySchema(returnRevisionSchema)
  return(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(returnRevisionSchema)) input: ReturnRevisionInput,
  ): Promise<Revision> {
    return this.workflow.return(user, id, input);
  }

  @Post(apiRoutes.revisions.drift.path)
  @HttpCode(200)
  @SignedIn()
  drift(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
  ): Promise<DriftReport> {
    return this.driftService.drift(user, id);
  }
}
