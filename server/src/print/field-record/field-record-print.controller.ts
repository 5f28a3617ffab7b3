import { Controller, Get, Param, Query, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import { printQuerySchema, type PrintQuery } from '@holdfast/shared';
import { CurrentUser, type AuthUser } from '../../auth/auth-user.js';
import { SignedIn } from '../../auth/policy.js';
import { UuidParamPipe } from '../../common/pipes/uuid-param.pipe.js';
import { ZodValidationPipe } from '../../common/pipes/zod-validation.pipe.js';
import { pdf } from '../print.controller.js';
import { FieldRecordPrintService } from './field-record-print.service.js';

/** GET /api/field-records/:id/pdf */
@ApiTags('field-records')
@ApiBearerAuth()
@Controller('field-records')
export class FieldRecordPrintController {
  constructor(private readonly print: FieldRecordPrintService) {}

  @Get(':id/pdf')
  @SignedIn()
  @ApiProduces('application/pdf')
  async pdf(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Query(new ZodValidationPipe(printQuerySchema, 'query')) query: PrintQuery,
  ): Promise<StreamableFile> {
    return pdf(await this.print.print(user, id, query.paper));
  }
}
