import { Body, Controller, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  createCommentSchema,
  updateCommentSchema,
  type Comment,
  type CommentList,
  type CreateCommentInput,
  type UpdateCommentInput,
  apiRoutes,
} from '@holdfast/shared';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { Roles, SignedIn } from '../auth/policy.js';
import { ApiBodySchema } from '../common/openapi.js';
import { UuidParamPipe } from '../common/pipes/uuid-param.pipe.js';
import { ZodValidationPipe } from '../common/pipes/zod-validation.pipe.js';
import { CommentsService } from './comments.service.js';

@ApiTags('comments')
@ApiBearerAuth()
@Controller()
export class CommentsController {
  constructor(private readonly comments: CommentsService) {}

  @Get(apiRoutes.comments.list.path)
  @SignedIn()
  async list(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
  ): Promise<CommentList> {
    return { items: await this.comments.list(user, id) };
  }

  @Post(apiRoutes.comments.create.path)
  @HttpCode(201)
  @Roles('engineer')
  @ApiBodySchema(createCommentSchema)
  create(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(createCommentSchema)) input: CreateCommentInput,
  ): Promise<Comment> {
    return this.comments.create(user, id, input);
  }

  @Patch(apiRoutes.comments.update.path)
  @Roles('engineer')
  @ApiBodySchema(updateCommentSchema)
  update(
    @CurrentUser() user: AuthUser,
    @Param('id', UuidParamPipe) id: string,
    @Body(new ZodValidationPipe(updateCommentSchema)) input: UpdateCommentInput,
  ): Promise<Comment> {
    return this.comments.update(user, id, input);
  }
}
