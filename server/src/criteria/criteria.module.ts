import { Module } from '@nestjs/common';
import { CriteriaAdminService } from './criteria-admin.service.js';
import { CriteriaController } from './criteria.controller.js';
import { CriteriaRepository } from './criteria.repository.js';
import { CriteriaService } from './criteria.service.js';
import { ImpactService } from './impact.service.js';
import { ReviewsModule } from '../reviews/reviews.module.js';

@Module({
  imports: [ReviewsModule],
  controllers: [CriteriaController],
  providers: [CriteriaRepository, CriteriaService, CriteriaAdminService, ImpactService],
  exports: [CriteriaService, CriteriaRepository],
})
export class CriteriaModule {}
