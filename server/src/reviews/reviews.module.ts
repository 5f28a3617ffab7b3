import { Module } from '@nestjs/common';
import { UsersModule } from '../users/users.module.js';
import { ReviewsController } from './reviews.controller.js';
import { ReviewsRepository } from './reviews.repository.js';
import { ReviewsService } from './reviews.service.js';

/** "Under review" flags beside approved revisions when criteria change (no criteria import: no cycle). */
@Module({
  imports: [UsersModule],
  controllers: [ReviewsController],
  providers: [ReviewsRepository, ReviewsService],
  exports: [ReviewsService, ReviewsRepository, UsersModule],
})
export class ReviewsModule {}
