import { Global, Module } from '@nestjs/common';
import { Mailer } from '../mail/mailer.js';
import { JobQueue } from './job-queue.js';
import { OutboxService } from './outbox.service.js';

/** Global: any feature can queue a notification inside its own transaction. */
@Global()
@Module({ providers: [Mailer, JobQueue, OutboxService], exports: [OutboxService] })
export class OutboxModule {}
