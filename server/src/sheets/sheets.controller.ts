import { Body, Controller, Get, Header, HttpCode, Param, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  compareQuerySchema,
  createSheetSchema,
  newRevisionSchema,
  sheetListQuerySchema,
  type AuditList,
  type Compare,
  type CompareQuery,
  type CreateSheetInput,
  type NewRevisionInput,
  type Revision,
  type SheetDetail,
  type SheetList,
  type SheetListQuery,
  apiRoutes,
} from '@holdfast/shared';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { Roles, SignedIn } from '../auth/policy.js';
import { ApiBodySchema } from '../common/openapi.js';
import { UuidParamPipe } from '../common/pipes/uuid-param.pipe.js';
import { ZodValidationPipe } from '../common/pipes/zod-validation.pipe.js';
import { JSON_CONTENT_TYPE, type JsonText } from '../http/json-text.js';
import { sheetDetailFor } from '../revisions/read-rules.js';
import { SheetsService } from './sheets.service.js';

@ApiTags('sheets')
@ApiBearerAuth()
@Controller()
export class SheetsController {
  constructor(private readonly sheets: SheetsService) {}

  @Get(apiRoutes.sheets.list.path)
  @SignedIn()
  @Header('Content-Type', JSON_CONTENT_TYPE)
  list(
    @Query(new ZodValidationPipe(sheetListQuerySchema, 'query')) query: SheetListQuery,
  ): Promise<JsonText<SheetList>> {
    return this.sheets.list(query);
  }

  @Post(apiRoutes.sheets.create.path)
  @HttpCode(201)
  @Roles('engineer')
  @ApiBodySchema(createSheetSchema)
  create(
    @CurrentUser() user: AuthUser,
    @Body(new ZodValidationPipe(createSheetSchema)) input: CreateSheetInput,
  ): Promise<SheetDetail> {
    return this.sheets.create(user, input);
  }

  @Get(apiRoutes.sheets.detail.path)
  @SignedIn()
  async detail(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
  ): Promise<SheetDetail> {
    return sheetDetailFor(user, await this.sheets.detail(id));
  }

  @Post(apiRoutes.sheets.createRevision.path)
  @HttpCode(201)
  @Roles('engineer')
  @ApiBodySchema(newRevisionSchema)
  newRevision(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(newRevisionSchema)) input: NewRevisionInput,
  ): Promise<Revision> {
    return this.sheets.newRevision(user, id, input);
  }

  @Get(apiRoutes.sheets.compare.path)
  @SignedIn()
  compare(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Query(new ZodValidationPipe(compareQuerySchema, 'query')) query: CompareQuery,
  ): Promise<Compare> {
    return this.sheets.compare(user, id, query);
  }

  @Get(apiRoutes.sheets.audit.path)
  @SignedIn()
  audit(@CurrentUser() user: AuthUser, @Param('id', UuidParamPipe) id: string): Promise<AuditList> {
    return this.sheets.auditTrail(user, id);
  }
}
