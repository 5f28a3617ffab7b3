import { Module } from '@nestjs/common';
import { RevisionsModule } from '../revisions/revisions.module.js';
import { CommentsController } from './comments.controller.js';
import { CommentsRepository } from './comments.repository.js';
import { CommentsService } from './comments.service.js';

@Module({
  imports: [RevisionsModule],
  controllers: [CommentsController],
  providers: [CommentsRepository, CommentsService],
})
export class CommentsModule {}
