import { Body, Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  confirmCriterionSchema,
  createCriteriaSetSchema,
  criteriaVersionQuerySchema,
  publishCriteriaVersionSchema,
  type ConfirmCriterionInput,
  type CreateCriteriaSetInput,
  type CriteriaSetDetail,
  type CriteriaSetList,
  type ImpactReport,
  type PublishCriteriaVersionInput,
  apiRoutes,
} from '@holdfast/shared';
import { z } from 'zod';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { Roles, SignedIn } from '../auth/policy.js';
import { ApiBodySchema } from '../common/openapi.js';
import { ZodValidationPipe } from '../common/pipes/zod-validation.pipe.js';
import { CriteriaAdminService } from './criteria-admin.service.js';
import { CriteriaService } from './criteria.service.js';
import { ImpactService } from './impact.service.js';

const versionParam = z.coerce.number().int().positive().max(1_000_000);
const setId = z.string().regex(/^[a-z0-9][a-z0-9._-]{0,79}$/i, 'not a criteria-set id');

@ApiTags('criteria-sets')
@ApiBearerAuth()
@Controller()
export class CriteriaController {
  constructor(
    private readonly criteria: CriteriaService,
    private readonly impactService: ImpactService,
    private readonly admin: CriteriaAdminService,
  ) {}

  @Get(apiRoutes.criteria.list.path)
  @SignedIn()
  async list(): Promise<CriteriaSetList> {
    return { items: await this.criteria.list() };
  }

  @Post(apiRoutes.criteria.create.path)
  @HttpCode(201)
  @Roles('admin')
  @ApiBodySchema(createCriteriaSetSchema)
  create(
    @CurrentUser() user: AuthUser,
    @Body(new ZodValidationPipe(createCriteriaSetSchema)) input: CreateCriteriaSetInput,
  ): Promise<CriteriaSetDetail> {
    return this.admin.create(user.id, input);
  }

  @Post(apiRoutes.criteria.confirm.path)
  @HttpCode(201)
  @Roles('admin', 'checker')
  @ApiBodySchema(confirmCriterionSchema)
  confirm(
    @CurrentUser() user: AuthUser,
    @Param('id', new ZodValidationPipe(setId, 'id')) id: string,
    @Param('version', new ZodValidationPipe(versionParam, 'version')) version: number,
    @Body(new ZodValidationPipe(confirmCriterionSchema)) input: ConfirmCriterionInput,
  ): Promise<CriteriaSetDetail> {
    return this.admin.confirm(user.id, id, version, input);
  }

  @Get(apiRoutes.criteria.detail.path)
  @SignedIn()
  detail(
    @Param('id', new ZodValidationPipe(setId, 'id')) id: string,
    @Query(new ZodValidationPipe(criteriaVersionQuerySchema, 'query')) query: { version?: number },
  ): Promise<CriteriaSetDetail> {
    return this.criteria.detail(id, query.version);
  }

  @Post(apiRoutes.criteria.publish.path)
  @HttpCode(201)
  @Roles('admin')
  @ApiBodySchema(publishCriteriaVersionSchema)
  publish(
    @CurrentUser() user: AuthUser,
    @Param('id', new ZodValidationPipe(setId, 'id')) id: string,
    @Body(new ZodValidationPipe(publishCriteriaVersionSchema)) input: PublishCriteriaVersionInput,
  ): Promise<CriteriaSetDetail> {
    return this.criteria.publish(user.id, id, input);
  }

  @Get(apiRoutes.criteria.impact.path)
  @Roles('admin', 'checker')
  impact(
    @Param('id', new ZodValidationPipe(setId, 'id')) id: string,
    @Query(new ZodValidationPipe(criteriaVersionQuerySchema, 'query')) query: { version?: number },
  ): Promise<ImpactReport> {
    return this.impactService.impact(id, query.version);
  }
}
