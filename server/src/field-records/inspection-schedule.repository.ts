import { Injectable } from '@nestjs/common';
import { sql } from 'kysely';
import type { InspectionInterval } from '@holdfast/shared';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';

/** Kysely of the inspection schedule: intervals, the last record per position, reminders sent. */
@Injectable()
export class InspectionScheduleRepository {
  constructor(private readonly db: Database) {}

  positionExists(id: string) {
    return this.db
      .selectFrom('brakePositions')
      .select('id')
      .where('id', '=', id)
      .executeTakeFirst();
  }

  interval(positionId: string) {
    return this.db
      .selectFrom('inspectionIntervals')
      .select(['basis', 'every', 'remindDaysAhead'])
      .where('positionId', '=', positionId)
      .executeTakeFirst();
  }

  async setInterval(positionId: string, userId: string, i: InspectionInterval): Promise<void> {
    const values = {
      positionId,
      basis: i.basis,
      every: i.every,
      remindDaysAhead: i.remindDaysAhead,
      updatedBy: userId,
    };
    await this.db
      .insertInto('inspectionIntervals')
      .values(values)
      .onConflict((oc) =>
        oc.column('positionId').doUpdateSet({
          basis: i.basis,
          every: i.every,
          remindDaysAhead: i.remindDaysAhead,
          updatedBy: userId,
          updatedAt: sql`now()`,
        }),
      )
      .execute();
  }

  /**
   * Every position with an interval, with its tags and its last signed or countersigned record
   * (the inspection that counts; a draft is not done yet).
   */
  scheduled(positionId?: string) {
    let q = this.db
      .selectFrom('inspectionIntervals as i')
      .innerJoin('brakePositions as p', 'p.id', 'i.positionId')
      .innerJoin('machines as m', 'm.id', 'p.machineId')
      .innerJoin('sites as s', 's.id', 'm.siteId')
      .leftJoinLateral(
        (eb) =>
          eb
            .selectFrom('fieldRecords as f')
            .select(['f.performedAt', 'f.meterHours'])
            .whereRef('f.positionId', '=', 'p.id')
            .where('f.status', 'in', ['signed', 'countersigned'])
            .orderBy('f.performedAt', 'desc')
            .limit(1)
            .as('last'),
        (join) => join.onTrue(),
      )
      .select([
        'p.id as positionId',
        'p.tag as positionTag',
        'm.tag as machineTag',
        's.code as siteCode',
        'i.basis',
        'i.every',
        'i.remindDaysAhead',
        'i.updatedAt as intervalSince',
        'last.performedAt as lastPerformedAt',
        'last.meterHours as lastMeterHours',
      ]);
    if (positionId) q = q.where('p.id', '=', positionId);
    return q.orderBy('s.code').orderBy('m.tag').orderBy('p.tag').execute();
  }

  /** Records a reminder; false when one for this due date was sent already. */
  async claimReminder(tx: Tx, positionId: string, dueOn: string): Promise<boolean> {
    const row = await on(this.db, tx)
      .insertInto('inspectionReminders')
      .values({ positionId, dueOn })
      .onConflict((oc) => oc.columns(['positionId', 'dueOn']).doNothing())
      .returning('positionId')
      .executeTakeFirst();
    return row !== undefined;
  }

  /** Addresses reminders go to: active technicians, the plant engineers and the engineers. */
  async reminderEmails(): Promise<string[]> {
    const rows = await this.db
      .selectFrom('users')
      .select('email')
      .where('active', '=', true)
      .where('role', 'in', ['technician', 'viewer', 'engineer', 'checker'])
      .orderBy('email')
      .execute();
    return rows.map((r) => r.email);
  }

  /** Signed records waiting for a countersignature by someone other than their signer. */
  awaitingCountersign(userId: string) {
    return this.db
      .selectFrom('fieldRecords as f')
      .innerJoin('brakePositions as p', 'p.id', 'f.positionId')
      .innerJoin('machines as m', 'm.id', 'p.machineId')
      .innerJoin('sites as s', 's.id', 'm.siteId')
      .innerJoin('fieldRecordSignatures as g', (j) =>
        j.onRef('g.recordId', '=', 'f.id').on('g.kind', '=', 'technician'),
      )
      .select([
        'f.id as recordId',
        'f.positionId',
        'p.tag as positionTag',
        'm.tag as machineTag',
        's.code as siteCode',
        'f.performedAt',
        'f.outOfTolerance',
      ])
      .where('f.status', '=', 'signed')
      .where('g.userId', '<>', userId)
      .orderBy('f.performedAt')
      .execute();
  }

  /** Open findings of a position: signed, not yet countersigned, or left out of tolerance. */
  openFindings(positionId: string) {
    return this.db
      .selectFrom('fieldRecords as f')
      .leftJoin('fieldRecordSignatures as g', (j) =>
        j.onRef('g.recordId', '=', 'f.id').on('g.kind', '=', 'technician'),
      )
      .select([
        'f.id',
        'f.performedAt',
        'f.findings',
        'f.status',
        'f.outOfTolerance',
        'g.userId',
        'g.displayName',
        'g.initials',
        'g.signedAt',
      ])
      .where('f.positionId', '=', positionId)
      .where((eb) =>
        eb.or([
          eb('f.status', '=', 'signed'),
          eb.and([eb('f.status', '=', 'countersigned'), eb('f.outOfTolerance', '=', true)]),
        ]),
      )
      .orderBy('f.performedAt', 'desc')
      .execute();
  }

  /** The last signed record of each kind that sets the brake (anything but a pure inspection counts). */
  lastRecord(positionId: string) {
    return this.db
      .selectFrom('fieldRecords as f')
      .innerJoin('revisions as r', 'r.id', 'f.revisionId')
      .innerJoin('sheets as s', 's.id', 'r.sheetId')
      .select([
        'f.id',
        'f.kind',
        'f.performedAt',
        'f.revisionId',
        'r.label',
        'r.state',
        's.documentNumber',
        's.approvedRevisionId',
      ])
      .where('f.positionId', '=', positionId)
      .where('f.status', 'in', ['signed', 'countersigned'])
      .orderBy('f.performedAt', 'desc')
      .limit(1)
      .executeTakeFirst();
  }
}
