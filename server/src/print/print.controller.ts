import { Controller, Get, Param, Query, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import { printQuerySchema, type PrintQuery } from '@holdfast/shared';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { SignedIn } from '../auth/policy.js';
import { UuidParamPipe } from '../common/pipes/uuid-param.pipe.js';
import { ZodValidationPipe } from '../common/pipes/zod-validation.pipe.js';
import { PrintService, type PrintedFile } from './print.service.js';

export const pdf = (f: PrintedFile) =>
  new StreamableFile(f.bytes, {
    type: 'application/pdf',
    // attachment: browsers save it under this name instead of opening an unnamed blob.
    disposition: `attachment; filename="${f.fileName}"; filename*=UTF-8''${encodeURIComponent(f.fileName)}`,
    length: f.bytes.length,
  });

/** GET /api/revisions/:id/pdf and /field-card. Who may read which revision is RevisionsService's rule. */
@ApiTags('revisions')
@ApiBearerAuth()
@Controller('revisions')
export class PrintController {
  constructor(private readonly print: PrintService) {}

  @Get(':id/pdf')
  @SignedIn()
  @ApiProduces('application/pdf')
  async sheet(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Query(new ZodValidationPipe(printQuerySchema)) query: PrintQuery,
  ): Promise<StreamableFile> {
    return pdf(await this.print.print(user, id, 'sheet', query));
  }

  @Get(':id/field-card')
  @SignedIn()
  @ApiProduces('application/pdf')
  async fieldCard(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Query(new ZodValidationPipe(printQuerySchema)) query: PrintQuery,
  ): Promise<StreamableFile> {
    return pdf(await this.print.print(user, id, 'field-card', query));
  }
}
