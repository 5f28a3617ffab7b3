import { Module } from '@nestjs/common';
import { RevisionsModule } from '../revisions/revisions.module.js';
import { StorageModule } from '../storage/storage.module.js';
import { AttachmentsController } from './attachments.controller.js';
import { AttachmentsService } from './attachments.service.js';

@Module({
  imports: [RevisionsModule, StorageModule],
  controllers: [AttachmentsController],
  providers: [AttachmentsService],
})
export class AttachmentsModule {}
