import { Module } from '@nestjs/common';
import { RevisionsModule } from '../revisions/revisions.module.js';
import { StorageModule } from '../storage/storage.module.js';
import { AttachmentsController } from './attachments.controller.js';
import { AttachmentsRepository } from './attachments.repository.js';
import { AttachmentsService } from './attachments.service.js';
import { DemoAttachments } from './demo-attachments.js';

@Module({
  imports: [RevisionsModule, StorageModule],
  controllers: [AttachmentsController],
  providers: [AttachmentsRepository, AttachmentsService, DemoAttachments],
})
export class AttachmentsModule {}
