import { Module } from '@nestjs/common';
import { ReviewsController } from './reviews.controller.js';
import { ReviewsRepository } from './reviews.repository.js';
import { ReviewsService } from './reviews.service.js';

/** "Under review" flags beside approved revisions when criteria change (no criteria import: no cycle). */
@Module({
  controllers: [ReviewsController],
  providers: [ReviewsRepository, ReviewsService],
  exports: [ReviewsService, ReviewsRepository],
})
export class ReviewsModule {}
