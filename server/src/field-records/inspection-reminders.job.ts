import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { JobQueue } from '../outbox/job-queue.js';
import { InspectionScheduleService } from './inspection-schedule.service.js';

export const REMINDER_QUEUE = 'inspection-reminders';

/**
 * Runs the reminder pass from the job queue every hour (pg-boss cron; one instance wins each
 * slot). Each reminder is remembered per position and due date, so repeats send nothing new.
 */
@Injectable()
export class InspectionRemindersJob implements OnApplicationBootstrap {
  private readonly logger = new Logger('InspectionReminders');

  constructor(
    private readonly queue: JobQueue,
    private readonly schedule: InspectionScheduleService,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    await this.queue.boss.createQueue(REMINDER_QUEUE);
    await this.queue.boss.schedule(REMINDER_QUEUE, '17 * * * *');
    await this.queue.work(REMINDER_QUEUE, async () => {
      const n = await this.schedule.sendReminders();
      this.logger.debug(`reminder pass: ${n} queued`);
    });
  }
}
