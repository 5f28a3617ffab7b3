import {
  Body,
  Controller,
  Get,
  HttpCode,
  Param,
  Patch,
  Post,
  Query,
  Res,
  UploadedFile,
} from '@nestjs/common';
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
  type Attachment,
  type AttachmentList,
  apiRoutes,
  fieldRecordCountersigners,
  fieldRecorders,
} from '@holdfast/shared';
import { FileUpload } from '../attachments/stored-file.js';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { Roles, SignedIn } from '../auth/policy.js';
import { ApiBodySchema } from '../common/openapi.js';
import { UuidParamPipe } from '../common/pipes/uuid-param.pipe.js';
import { ZodValidationPipe } from '../common/pipes/zod-validation.pipe.js';
import { FieldRecordPhotosService } from './field-record-photos.service.js';
import { FieldRecordsService } from './field-records.service.js';
import { FieldRecordSigningService } from './field-record-signing.service.js';
import { InspectionScheduleService } from './inspection-schedule.service.js';

@ApiTags('field-records')
@ApiBearerAuth()
@Controller()
export class FieldRecordsController {
  constructor(
    private readonly records: FieldRecordsService,
    private readonly signatures: FieldRecordSigningService,
    private readonly schedule: InspectionScheduleService,
    private readonly photos: FieldRecordPhotosService,
  ) {}

  @Get(apiRoutes.fieldRecords.list.path)
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
  @Get(apiRoutes.fieldRecords.due.path)
  @SignedIn()
  due(@CurrentUser() user: AuthUser): Promise<DueInspections> {
    return this.schedule.due(user);
  }

  @Post(apiRoutes.fieldRecords.create.path)
  @Roles(...fieldRecorders)
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

  @Get(apiRoutes.fieldRecords.detail.path)
  @SignedIn()
  get(@Param('id', UuidParamPipe) id: string): Promise<FieldRecord> {
    return this.records.get(id);
  }

  @Patch(apiRoutes.fieldRecords.update.path)
  @Roles(...fieldRecorders)
  @ApiBodySchema(updateFieldRecordSchema)
  update(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(updateFieldRecordSchema)) input: UpdateFieldRecordInput,
  ): Promise<FieldRecord> {
    return this.records.update(user, id, input);
  }

  @Post(apiRoutes.fieldRecords.sign.path)
  @HttpCode(200)
  @Roles(...fieldRecorders)
  sign(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(signFieldRecordSchema)) _input: object,
  ): Promise<FieldRecord> {
    return this.signatures.sign(user, id);
  }

  @Post(apiRoutes.fieldRecords.countersign.path)
  @HttpCode(200)
  @Roles(...fieldRecordCountersigners)
  countersign(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(countersignFieldRecordSchema)) input: { note: string },
  ): Promise<FieldRecord> {
    return this.signatures.countersign(user, id, input.note);
  }

  @Get(apiRoutes.fieldRecords.attachments.path)
  @SignedIn()
  async listPhotos(@Param('id', UuidParamPipe) id: string): Promise<AttachmentList> {
    return { items: await this.photos.list(id) };
  }

  @Post(apiRoutes.fieldRecords.upload.path)
  @HttpCode(201)
  @Roles(...fieldRecorders)
  @FileUpload()
  uploadPhoto(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @UploadedFile() file: Express.Multer.File | undefined,
  ): Promise<Attachment> {
    return this.photos.upload(user, id, file);
  }
}
