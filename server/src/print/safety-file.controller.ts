import { Body, Controller, HttpCode, Post, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import { safetyFileSchema, type SafetyFileInput, apiRoutes } from '@holdfast/shared';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { SignedIn } from '../auth/policy.js';
import { ApiBodySchema } from '../common/openapi.js';
import { ZodValidationPipe } from '../common/pipes/zod-validation.pipe.js';
import { pdf } from './print.controller.js';
import { SafetyFileService } from './safety-file.service.js';

/** POST /api/print/safety-file: approved sheets as one PDF. Read rules are RevisionsService's. */
@ApiTags('print')
@ApiBearerAuth()
@Controller()
export class SafetyFileController {
  constructor(private readonly safetyFile: SafetyFileService) {}

  @Post(apiRoutes.print.safetyFile.path)
  @HttpCode(200)
  @SignedIn()
  @ApiProduces('application/pdf')
  @ApiBodySchema(safetyFileSchema)
  async build(
    @CurrentUser() user: AuthUser,
    @Body(new ZodValidationPipe(safetyFileSchema)) input: SafetyFileInput,
  ): Promise<StreamableFile> {
    return pdf(await this.safetyFile.build(user, input));
  }
}
