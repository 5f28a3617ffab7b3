import { Global, Module } from '@nestjs/common';
import { Mailer } from '../mail/mailer.js';
import { FailedMailController } from './failed-mail.controller.js';
import { FailedMailService } from './failed-mail.service.js';
import { JobQueue } from './job-queue.js';
import { OutboxRepository } from './outbox.repository.js';
import { OutboxService } from './outbox.service.js';

/** Global: any feature can queue a notification inside its own transaction. */
@Global()
@Module({
  controllers: [FailedMailController],
  providers: [Mailer, JobQueue, OutboxRepository, OutboxService, FailedMailService],
  exports: [OutboxService, JobQueue],
})
export class OutboxModule {}
