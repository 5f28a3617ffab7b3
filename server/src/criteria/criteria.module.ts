import { Module } from '@nestjs/common';
import { CriteriaRepository } from './criteria.repository.js';
import { CriteriaService } from './criteria.service.js';

@Module({
  providers: [CriteriaRepository, CriteriaService],
  exports: [CriteriaService, CriteriaRepository],
})
export class CriteriaModule {}
