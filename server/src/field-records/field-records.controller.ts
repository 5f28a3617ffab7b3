import { Body, Controller, Get, HttpCode, Param, Patch, Post, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import {
  countersignFieldRecordSchema,
  createFieldRecordSchema,
  fieldRecordListQuerySchema,
  signFieldRecordSchema,
  updateFieldRecordSchema,
  type CreateFieldRecordInput,
  type DueInspections,
  type FieldRecord,
  type FieldRecordList,
  type UpdateFieldRecordInput,
} from '@holdfast/shared';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { Roles, SignedIn } from '../auth/policy.js';
import { ApiBodySchema } from '../common/openapi.js';
import { UuidParamPipe } from '../common/pipes/uuid-param.pipe.js';
import { ZodValidationPipe } from '../common/pipes/zod-validation.pipe.js';
import { FieldRecordsService } from './field-records.service.js';
import { InspectionScheduleService } from './inspection-schedule.service.js';

/** Who records field work: technicians (fitters) and engineers (checkers inherit). */
const RECORDERS = ['technician', 'engineer'] as const;

@ApiTags('field-records')
@ApiBearerAuth()
@Controller('field-records')
export class FieldRecordsController {
  constructor(
    private readonly records: FieldRecordsService,
    private readonly schedule: InspectionScheduleService,
  ) {}

  @Get()
  @SignedIn()
  async list(
    @Query(new ZodValidationPipe(fieldRecordListQuerySchema, 'query'))
    query: {
      positionId?: string;
      status?: string;
    },
  ): Promise<FieldRecordList> {
    return { items: await this.records.list(query) };
  }

  /** Declared before ':id' so that 'due' is not read as a record id. */
  @Get('due')
  @SignedIn()
  due(@CurrentUser() user: AuthUser): Promise<DueInspections> {
    return this.schedule.due(user);
  }

  @Post()
  @Roles(...RECORDERS)
  @ApiBodySchema(createFieldRecordSchema)
  async create(
    @CurrentUser() user: AuthUser,
    @Body(new ZodValidationPipe(createFieldRecordSchema)) input: CreateFieldRecordInput,
    @Res({ passthrough: true }) res: Response,
  ): Promise<FieldRecord> {
    const { record, created } = await this.records.create(user, input);
    res.status(created ? 201 : 200);
    return record;
  }

  @Get(':id')
  @SignedIn()
  get(@Param('id', UuidParamPipe) id: string): Promise<FieldRecord> {
    return this.records.get(id);
  }

  @Patch(':id')
  @Roles(...RECORDERS)
  @ApiBodySchema(updateFieldRecordSchema)
  update(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(updateFieldRecordSchema)) input: UpdateFieldRecordInput,
  ): Promise<FieldRecord> {
    return this.records.update(user, id, input);
  }

  @Post(':id/sign')
  @HttpCode(200)
  @Roles(...RECORDERS)
  sign(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(signFieldRecordSchema)) _input: object,
  ): Promise<FieldRecord> {
    return this.records.sign(user, id);
  }

  @Post(':id/countersign')
  @HttpCode(200)
  @Roles('engineer')
  countersign(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(countersignFieldRecordSchema)) input: { note: string },
  ): Promise<FieldRecord> {
    return this.records.countersign(user, id, input.note);
  }
}
