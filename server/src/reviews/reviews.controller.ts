import { Body, Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  reviewDispositionSchema,
  type ReviewDispositionInput,
  type RevisionCriteriaReview,
  type UnderReviewQueue,
  apiRoutes,
} from '@holdfast/shared';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { Roles, SignedIn } from '../auth/policy.js';
import { ApiBodySchema } from '../common/openapi.js';
import { UuidParamPipe } from '../common/pipes/uuid-param.pipe.js';
import { ZodValidationPipe } from '../common/pipes/zod-validation.pipe.js';
import { ReviewsService } from './reviews.service.js';

@ApiTags('criteria-reviews')
@ApiBearerAuth()
@Controller()
export class ReviewsController {
  constructor(private readonly reviews: ReviewsService) {}

  @Get(apiRoutes.reviews.ofRevision.path)
  @SignedIn()
  get(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
  ): Promise<RevisionCriteriaReview> {
    return this.reviews.forRevision(user, id);
  }

  @Post(apiRoutes.reviews.dispose.path)
  @HttpCode(200)
  @Roles('checker')
  @ApiBodySchema(reviewDispositionSchema)
  dispose(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(reviewDispositionSchema)) input: ReviewDispositionInput,
  ): Promise<RevisionCriteriaReview> {
    return this.reviews.dispose(user, id, input);
  }

  @Get(apiRoutes.reviews.queue.path)
  @SignedIn()
  queue(@CurrentUser() user: AuthUser): Promise<UnderReviewQueue> {
    return this.reviews.queue(user);
  }
}
