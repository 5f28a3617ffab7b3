import { Injectable, Logger } from '@nestjs/common';
import type {
  DueInspection,
  DueInspections,
  InspectionInterval,
  PositionFieldState,
  PositionInterval,
} from '@holdfast/shared';
import { mayCountersign } from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { AuditService } from '../audit/audit.service.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { notFound } from '../common/errors/api-exception.js';
import { AppConfig } from '../config/app-config.js';
import { OutboxService } from '../outbox/outbox.service.js';
import { inspectionDueMail } from './field-notifications.js';
import { InspectionScheduleRepository } from './inspection-schedule.repository.js';
import { inReminderWindow, nextDue, type ScheduleFacts } from './next-due.js';

type ScheduledRow = Awaited<ReturnType<InspectionScheduleRepository['scheduled']>>[number];

const facts = (r: ScheduledRow): ScheduleFacts => ({
  basis: r.basis,
  every: r.every,
  remindDaysAhead: r.remindDaysAhead,
  intervalSince: r.intervalSince,
  lastPerformedAt: r.lastPerformedAt ?? null,
  lastMeterHours: r.lastMeterHours ?? null,
});

/**
 * The inspection schedule: an interval per position, the due and overdue lists (a provider of
 * its own beside the work queue), the state of each brake at a glance, and the reminder job.
 */
@Injectable()
export class InspectionScheduleService {
  private readonly logger = new Logger('InspectionSchedule');

  constructor(
    private readonly repo: InspectionScheduleRepository,
    private readonly outbox: OutboxService,
    private readonly audit: AuditService,
    private readonly config: AppConfig,
    private readonly units: UnitOfWork,
  ) {}

  private async assertPosition(positionId: string) {
    if (!(await this.repo.positionExists(positionId))) throw notFound('Brake position not found.');
  }

  async getInterval(positionId: string): Promise<PositionInterval> {
    await this.assertPosition(positionId);
    const i = await this.repo.interval(positionId);
    return { positionId, interval: i ?? null };
  }

  async setInterval(
    user: AuthUser,
    positionId: string,
    input: InspectionInterval,
  ): Promise<PositionInterval> {
    await this.assertPosition(positionId);
    await this.repo.setInterval(positionId, user.id, input);
    await this.units.run((trx) =>
      this.audit.record(trx, {
        actorId: user.id,
        action: 'position.inspection-interval-set',
        entity: 'register',
        entityId: positionId,
        after: input,
      }),
    );
    return this.getInterval(positionId);
  }

  async due(user: AuthUser, now = new Date()): Promise<DueInspections> {
    const rows = await this.repo.scheduled();
    const due: DueInspection[] = [];
    const overdue: DueInspection[] = [];
    for (const r of rows) {
      const f = facts(r);
      const next = nextDue(f, now);
      const item: DueInspection = {
        positionId: r.positionId,
        positionTag: r.positionTag,
        machineTag: r.machineTag,
        siteCode: r.siteCode,
        lastInspectedAt: r.lastPerformedAt?.toISOString() ?? null,
        nextDue: next,
      };
      if (next.overdue) overdue.push(item);
      else if (inReminderWindow(f, next, now)) due.push(item);
    }
    const countersigns = mayCountersign(user.role)
      ? await this.repo.awaitingCountersign(user.id)
      : [];
    return {
      due,
      overdue,
      awaitingCountersign: countersigns.map((c) => ({
        recordId: c.recordId,
        positionId: c.positionId,
        positionTag: c.positionTag,
        machineTag: c.machineTag,
        siteCode: c.siteCode,
        performedAt: c.performedAt.toISOString(),
        outOfTolerance: c.outOfTolerance,
      })),
    };
  }

  async state(positionId: string, now = new Date()): Promise<PositionFieldState> {
    await this.assertPosition(positionId);
    const [last, scheduled, findings] = await Promise.all([
      this.repo.lastRecord(positionId),
      this.repo.scheduled(positionId),
      this.repo.openFindings(positionId),
    ]);
    const s = scheduled[0];
    return {
      positionId,
      setTo: last
        ? {
            revisionId: last.revisionId,
            documentNumber: last.documentNumber,
            revisionLabel: last.label,
            recordId: last.id,
            performedAt: last.performedAt.toISOString(),
            superseded: last.state === 'superseded' || last.approvedRevisionId !== last.revisionId,
          }
        : null,
      lastInspected: last
        ? {
            recordId: last.id,
            performedAt: last.performedAt.toISOString(),
            kind: last.kind as NonNullable<PositionFieldState['lastInspected']>['kind'],
          }
        : null,
      interval: s ? { basis: s.basis, every: s.every, remindDaysAhead: s.remindDaysAhead } : null,
      nextDue: s ? nextDue(facts(s), now) : null,
      openFindings: findings.map((f) => ({
        recordId: f.id,
        performedAt: f.performedAt.toISOString(),
        summary:
          f.status === 'signed'
            ? `Waiting for countersignature${f.outOfTolerance ? '; values left out of tolerance' : ''}`
            : `Values left out of tolerance${f.findings ? `: ${f.findings.slice(0, 120)}` : ''}`,
        signed:
          f.userId && f.signedAt
            ? {
                by: { id: f.userId, displayName: f.displayName ?? '', initials: f.initials ?? '' },
                at: f.signedAt.toISOString(),
              }
            : null,
      })),
    };
  }

  /**
   * The scheduled job: one e-mail per position and due date, sent when the due date enters its
   * reminder window. The reminder row and the mail are written in one transaction, so a job run
   * twice (or by two instances) sends it once. Returns how many reminders were queued.
   */
  async sendReminders(now = new Date()): Promise<number> {
    const rows = await this.repo.scheduled();
    const to = await this.repo.reminderEmails();
    let sent = 0;
    for (const r of rows) {
      const f = facts(r);
      const next = nextDue(f, now);
      if (!next.date || !inReminderWindow(f, next, now)) continue;
      const dueOn = next.date.slice(0, 10);
      const queued = await this.units.run(async (trx) => {
        if (!(await this.repo.claimReminder(trx, r.positionId, dueOn))) return false;
        await this.outbox.enqueueMail(
          trx,
          inspectionDueMail(
            this.config.settings.PUBLIC_URL,
            {
              positionId: r.positionId,
              place: { siteCode: r.siteCode, machineTag: r.machineTag, positionTag: r.positionTag },
              dueOn,
            },
            to,
          ),
        );
        return true;
      });
      if (queued) sent++;
    }
    if (sent > 0) this.logger.log(`queued ${sent} inspection reminder(s)`);
    return sent;
  }
}
