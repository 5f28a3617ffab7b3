import {
  Controller,
  Get,
  HttpCode,
  Param,
  Post,
  Res,
  StreamableFile,
  UploadedFile,
} from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type Attachment, type AttachmentList, apiRoutes } from '@holdfast/shared';
import type { Response } from 'express';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { Roles, SignedIn } from '../auth/policy.js';
import { UuidParamPipe } from '../common/pipes/uuid-param.pipe.js';
import { AttachmentsService } from './attachments.service.js';
import { contentDisposition } from './sniff.js';
import { FileUpload } from './stored-file.js';

@ApiTags('attachments')
@ApiBearerAuth()
@Controller()
export class AttachmentsController {
  constructor(private readonly attachments: AttachmentsService) {}

  @Get(apiRoutes.attachments.list.path)
  @SignedIn()
  async list(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
  ): Promise<AttachmentList> {
    return { items: await this.attachments.list(user, id) };
  }

  @Post(apiRoutes.attachments.upload.path)
  @HttpCode(201)
  @Roles('engineer')
  @FileUpload()
  upload(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @UploadedFile() file: Express.Multer.File | undefined,
  ): Promise<Attachment> {
    return this.attachments.upload(user, id, file);
  }

  @Get(apiRoutes.attachments.download.path)
  @SignedIn()
  async download(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Res({ passthrough: true }) res: Response,
  ): Promise<StreamableFile> {
    const { attachment, bytes } = await this.attachments.download(user, id);
    res.setHeader('X-Content-Type-Options', 'nosniff');
    res.setHeader('X-Checksum-SHA256', attachment.sha256);
    return new StreamableFile(bytes, {
      type: attachment.contentType,
      disposition: contentDisposition(attachment.fileName),
      length: bytes.length,
    });
  }
}
