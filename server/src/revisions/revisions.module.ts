import { Module } from '@nestjs/common';
import { CriteriaModule } from '../criteria/criteria.module.js';
import { ReviewsModule } from '../reviews/reviews.module.js';
import { UsersModule } from '../users/users.module.js';
import { ChangesService } from './changes.service.js';
import { DriftService } from './drift.service.js';
import { RevisionsController } from './revisions.controller.js';
import { RevisionsRepository } from './revisions.repository.js';
import { RevisionsService } from './revisions.service.js';
import { WorkflowService } from './workflow.service.js';

@Module({
  imports: [CriteriaModule, ReviewsModule, UsersModule],
  controllers: [RevisionsController],
  providers: [RevisionsRepository, RevisionsService, WorkflowService, DriftService, ChangesService],
  exports: [RevisionsRepository, RevisionsService, UsersModule],
})
export class RevisionsModule {}
