import { Module, type DynamicModule } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module.js';
import { CommentsModule } from '../comments/comments.module.js';
import { ConfigModule } from '../config/config.module.js';
import type { AppSettings } from '../config/env.js';
import { CriteriaModule } from '../criteria/criteria.module.js';
import { DatabaseModule } from '../database/database.module.js';
import { FieldRecordsModule } from '../field-records/field-records.module.js';
import { OutboxModule } from '../outbox/outbox.module.js';
import { RegisterModule } from '../register/register.module.js';
import { RevisionsModule } from '../revisions/revisions.module.js';
import { ReviewsModule } from '../reviews/reviews.module.js';
import { SheetsModule } from '../sheets/sheets.module.js';
import { UsersModule } from '../users/users.module.js';

/**
 * What the demo seed needs of the server, without HTTP, printing or attachments: the services
 * that make the register, sheets, revisions, comments and field records.
 */
@Module({})
export class DemoSeedModule {
  static forRoot(settings: AppSettings): DynamicModule {
    return {
      module: DemoSeedModule,
      imports: [
        ConfigModule.forRoot(settings),
        DatabaseModule,
        AuditModule,
        OutboxModule,
        UsersModule,
        ReviewsModule,
        CriteriaModule,
        RegisterModule,
        RevisionsModule,
        SheetsModule,
        CommentsModule,
        FieldRecordsModule,
      ],
    };
  }
}
