import { z } from 'zod';
import { multiLineText } from '../text/plain-text.js';
import { isoDateSchema, personRefSchema } from '../sheets/person-ref.schema.js';

export const commentAnchorSchema = z
  .object({ kind: z.enum(['input', 'step', 'check']), key: z.string().min(1).max(120) })
  .strict();
export type CommentAnchor = z.infer<typeof commentAnchorSchema>;

const commentBase = z.object({
  id: z.string().uuid(),
  revisionId: z.string().uuid(),
  author: personRefSchema,
  body: z.string(),
  anchor: commentAnchorSchema.nullable(),
  resolved: z.boolean(),
  createdAt: isoDateSchema,
  /** The comment this one answers, if it is a reply. */
  parentId: z.string().uuid().nullable(),
});

export type Comment = z.infer<typeof commentBase> & { replies?: Comment[] };
/** A comment with its replies (one level; replies carry no replies of their own). */
export const commentSchema: z.ZodType<Comment> = commentBase.extend({
  replies: z.array(commentBase).optional(),
}) as z.ZodType<Comment>;

export const commentListSchema = z.object({ items: z.array(commentSchema) });
export type CommentList = z.infer<typeof commentListSchema>;

/** POST /api/revisions/:id/comments */
export const createCommentSchema = z
  .object({
    body: multiLineText({ min: 1, max: 4000, minMessage: 'required' }),
    anchor: commentAnchorSchema.nullable().optional(),
    parentId: z.string().uuid().optional(),
  })
  .strict();
export type CreateCommentInput = z.infer<typeof createCommentSchema>;

/** PATCH /api/comments/:id */
export const updateCommentSchema = z.object({ resolved: z.boolean() }).strict();
export type UpdateCommentInput = z.infer<typeof updateCommentSchema>;
