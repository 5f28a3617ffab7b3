import { Controller, Get, Param, Query, Res, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import { printQuerySchema, type PrintQuery, apiRoutes } from '@holdfast/shared';
import type { Response } from 'express';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { SignedIn } from '../auth/policy.js';
import { UuidParamPipe } from '../common/pipes/uuid-param.pipe.js';
import { ZodValidationPipe } from '../common/pipes/zod-validation.pipe.js';
import {
  PrintBusyException,
  PrintService,
  type PrintKind,
  type PrintedFile,
} from './print.service.js';

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
@Controller()
export class PrintController {
  constructor(private readonly print: PrintService) {}

  /** A refused print says when to come back (Retry-After, seconds). */
  private async printed(
    res: Response,
    ...args: [AuthUser, string, PrintKind, PrintQuery]
  ): Promise<PrintedFile> {
    try {
      return await this.print.print(...args);
    } catch (e) {
      if (e instanceof PrintBusyException)
        res.setHeader('Retry-After', String(e.retryAfterSeconds));
      throw e;
    }
  }

  @Get(apiRoutes.revisions.pdf.path)
  @SignedIn()
  @ApiProduces('application/pdf')
  async sheet(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Query(new ZodValidationPipe(printQuerySchema)) query: PrintQuery,
    @Res({ passthrough: true }) res: Response,
  ): Promise<StreamableFile> {
    return pdf(await this.printed(res, user, id, 'sheet', query));
  }

  @Get(apiRoutes.revisions.fieldCard.path)
  @SignedIn()
  @ApiProduces('application/pdf')
  async fieldCard(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Query(new ZodValidationPipe(printQuerySchema)) query: PrintQuery,
    @Res({ passthrough: true }) res: Response,
  ): Promise<StreamableFile> {
    return pdf(await this.printed(res, user, id, 'field-card', query));
  }
}
