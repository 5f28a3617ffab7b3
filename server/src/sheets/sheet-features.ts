import type { Type } from '@nestjs/common';
import { AttachmentsModule } from '../attachments/attachments.module.js';
import { AuditModule } from '../audit/audit.module.js';
import { CommentsModule } from '../comments/comments.module.js';
import { CriteriaModule } from '../criteria/criteria.module.js';
import { OutboxModule } from '../outbox/outbox.module.js';
import { RegisterModule } from '../register/register.module.js';
import { RevisionsModule } from '../revisions/revisions.module.js';
import { ReviewsModule } from '../reviews/reviews.module.js';
import { VerifyModule } from '../verify/verify.module.js';
import { WorkQueueModule } from '../work-queue/work-queue.module.js';
import { SheetsModule } from './sheets.module.js';

/** The calculation-sheet feature set (issue 4), registered in features.ts. */
export const SheetFeatureModules: Type<unknown>[] = [
  AuditModule,
  OutboxModule,
  ReviewsModule,
  CriteriaModule,
  RegisterModule,
  RevisionsModule,
  SheetsModule,
  CommentsModule,
  AttachmentsModule,
  WorkQueueModule,
  VerifyModule,
];
