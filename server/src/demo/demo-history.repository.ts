import type { INestApplicationContext } from '@nestjs/common';
import { sql, type Kysely } from 'kysely';
import type { DB } from '@holdfast/db';
import { Database } from '../database/database.js';

/**
 * Used by the demo seed only. The demo is made through the services, which stamp every step
 * with the present; its story needs a past (a revision approved four months ago, inspections
 * over the months since). After each step the seed moves what that step stamped to the
 * invented date. Approved revisions, the audit trail and signatures refuse any change (database
 * triggers), so these updates switch those guards off inside their own transaction: ALTER TABLE
 * is transactional, so no other session ever sees a table unguarded, and only the tables' owner
 * (the role seeds run as) or a superuser may do it at all; the app role cannot. Not a provider:
 * the production app has no use for it (`demoHistory(app)` makes one on the app's database).
 */
export class DemoHistoryRepository {
  constructor(private readonly db: Database) {}

  async siteExists(code: string): Promise<boolean> {
    const row = await this.db
      .selectFrom('sites')
      .select('id')
      .where('code', '=', code)
      .executeTakeFirst();
    return row !== undefined;
  }

  /** The database clock to the millisecond: what a following step stamps is at or after it. */
  async mark(): Promise<Date> {
    const { rows } = await sql<{
      at: Date;
    }>`select date_trunc('milliseconds', clock_timestamp()) as at`.execute(this.db);
    return rows[0]!.at; // a select without FROM returns exactly one row
  }

  /**
   * Dates the register made since `since` (sites, machines, brake positions and their audit
   * events) at `at`, before the first sheet of the story.
   */
  async dateRegister(since: Date, at: Date): Promise<void> {
    await this.unguarded(['audit_events'], async (trx) => {
      for (const table of ['sites', 'machines', 'brake_positions']) {
        await sql`update ${sql.table(table)} set created_at = ${at}
          where created_at >= ${since}`.execute(trx);
      }
      await sql`update audit_events set at = ${at} where at >= ${since}`.execute(trx);
      await dropMail(trx, since);
    });
  }

  /**
   * Dates one revision's steps (made since `since`) at `at`: the revision's own dates, the
   * superseding of its predecessor, its comments, the sheet's audit events of those steps, the
   * sheet's last change and, for the first revision, the sheet's creation. With the triggers off
   * nothing stamps `updated_at`, so it is set here too. The mail those steps queued is dropped
   * (see dropMail).
   */
  async dateRevisionSteps(
    sheetId: string,
    revisionId: string,
    since: Date,
    at: Date,
    first: boolean,
  ): Promise<void> {
    // Raw SQL: the typed schema makes creation dates read-only, as they are for the app.
    await this.unguarded(['revisions', 'sheets', 'audit_events'], async (trx) => {
      await sql`update revisions set created_at = ${at}, updated_at = ${at},
          submitted_at = case when submitted_at is null then null else ${at}::timestamptz end,
          approved_at = case when approved_at is null then null else ${at}::timestamptz end,
          returned_at = case when returned_at is null then null else ${at}::timestamptz end
        where id = ${revisionId}`.execute(trx);
      await sql`update revisions set superseded_at = ${at}, updated_at = ${at}
        where superseded_by_id = ${revisionId}`.execute(trx);
      await sql`update comments set created_at = ${at},
          resolved_at = case when resolved_at is null then null else ${at}::timestamptz end
        where revision_id = ${revisionId} and created_at >= ${since}`.execute(trx);
      await sql`update audit_events set at = ${at}
        where sheet_id = ${sheetId} and at >= ${since}`.execute(trx);
      await sql`update sheets set updated_at = ${at} where id = ${sheetId}`.execute(trx);
      if (first) await sql`update sheets set created_at = ${at} where id = ${sheetId}`.execute(trx);
      await dropMail(trx, since);
    });
  }

  /**
   * Dates a field record's signatures (and its audit events since `since`): the technician's
   * at `signedAt`, the countersignature at `countersignedAt`.
   */
  async dateFieldRecord(
    recordId: string,
    since: Date,
    signedAt: Date,
    countersignedAt: Date | null,
  ): Promise<void> {
    const tables = ['field_records', 'field_record_signatures', 'audit_events'];
    await this.unguarded(tables, async (trx) => {
      await sql`update field_records set created_at = ${signedAt} where id = ${recordId}`.execute(
        trx,
      );
      await sql`update field_record_signatures set signed_at = ${signedAt}
        where record_id = ${recordId} and kind = 'technician'`.execute(trx);
      await sql`update field_record_signatures set signed_at = ${countersignedAt}
        where record_id = ${recordId} and kind = 'countersign'`.execute(trx);
      await sql`update audit_events
        set at = case when action = 'field-record.countersigned' then ${countersignedAt}::timestamptz
          else ${signedAt}::timestamptz end
        where entity_id = ${recordId} and at >= ${since}`.execute(trx);
      await dropMail(trx, since);
    });
  }

  /** Runs `work` in one transaction with the guard triggers of `tables` off until it ends. */
  private async unguarded(tables: string[], work: (trx: Kysely<DB>) => Promise<void>) {
    await this.db.transaction().execute(async (trx) => {
      for (const t of tables)
        await sql`alter table ${sql.table(t)} disable trigger user`.execute(trx);
      await work(trx);
      for (const t of tables)
        await sql`alter table ${sql.table(t)} enable trigger user`.execute(trx);
    });
  }
}

/**
 * The demo's notifications describe an invented past and go to invented people: they are not
 * sent. Without its outbox row a queued mail job finds nothing to send (OutboxService.deliver).
 */
async function dropMail(trx: Kysely<DB>, since: Date): Promise<void> {
  await trx.deleteFrom('outbox').where('createdAt', '>=', since).execute();
}

/** The seed's repository on the database of `app` (the demo seed context or a test's app). */
export function demoHistory(app: INestApplicationContext): DemoHistoryRepository {
  return new DemoHistoryRepository(app.get(Database));
}
