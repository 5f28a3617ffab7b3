import { z } from 'zod';
import { revisionStateSchema } from '../revisions/evaluation.schema.js';
import { isoDateSchema, personRefSchema } from '../sheets/person-ref.schema.js';

export const queueItemSchema = z.object({
  sheetId: z.string().uuid(),
  documentNumber: z.string(),
  title: z.string(),
  revisionId: z.string().uuid(),
  revisionLabel: z.string(),
  state: revisionStateSchema,
  author: personRefSchema,
  updatedAt: isoDateSchema,
});
export type QueueItem = z.infer<typeof queueItemSchema>;

/** GET /api/work-queue — the signed-in user's work. */
export const workQueueSchema = z.object({
  myDrafts: z.array(queueItemSchema),
  returnedToMe: z.array(queueItemSchema),
  /** In check, authored by someone else; empty for users who cannot check. */
  awaitingMyCheck: z.array(queueItemSchema),
  recentlyApproved: z.array(queueItemSchema),
});
export type WorkQueue = z.infer<typeof workQueueSchema>;
