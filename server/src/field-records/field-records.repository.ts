import { Injectable } from '@nestjs/common';
import type { Kysely } from 'kysely';
import type {
  DB,
  FieldRecordCheckRow,
  FieldRecordMeasurementRow,
  FieldRecordRow,
  FieldRecordSignatureRow,
} from '@holdfast/db';
import type { FieldCheckInput, FieldMeasurement, PositionPlace } from '@holdfast/shared';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';

const json = (v: unknown) => (v === null ? null : JSON.stringify(v));

/** A record with everything it owns, as stored. */
export interface StoredFieldRecord {
  record: FieldRecordRow;
  measurements: FieldRecordMeasurementRow[];
  checks: FieldRecordCheckRow[];
  signatures: FieldRecordSignatureRow[];
}

/** The revision a record is made against, with its sheet and what the server needs of both. */
export interface RecordRevision {
  revisionId: string;
  label: string;
  state: string;
  evaluation: unknown;
  /** The revision's inputs as typed (the field form reads the sheet's minimums from them). */
  inputs: unknown;
  sheetId: string;
  documentNumber: string;
  title: string;
  sheetType: string;
  ownerId: string;
  positionId: string;
  approvedRevisionId: string | null;
  underReview: boolean;
}

/** All Kysely of the field-records feature. Returns rows or undefined; throws no HTTP errors. */
@Injectable()
export class FieldRecordsRepository {
  constructor(readonly db: Database) {}

  async revision(revisionId: string, tx?: Tx): Promise<RecordRevision | undefined> {
    const db = on(this.db, tx);
    const row = await db
      .selectFrom('revisions as r')
      .innerJoin('sheets as s', 's.id', 'r.sheetId')
      .select((eb) => [
        'r.id as revisionId',
        'r.label',
        'r.state',
        'r.evaluation',
        'r.inputs',
        's.id as sheetId',
        's.documentNumber',
        's.title',
        's.sheetType',
        's.ownerId',
        's.positionId',
        's.approvedRevisionId',
        eb
          .exists(
            eb
              .selectFrom('criteriaReviews as c')
              .select('c.id')
              .whereRef('c.revisionId', '=', 'r.id')
              .where('c.clearedAt', 'is', null),
          )
          .as('underReview'),
      ])
      .where('r.id', '=', revisionId)
      .executeTakeFirst();
    return row ? { ...row, underReview: Boolean(row.underReview) } : undefined;
  }

  /** The position's tag with its machine's and site's: tags repeat across machines. */
  async positionPlace(positionId: string, tx?: Tx): Promise<PositionPlace | undefined> {
    const db = on(this.db, tx);
    return db
      .selectFrom('brakePositions as p')
      .innerJoin('machines as m', 'm.id', 'p.machineId')
      .innerJoin('sites as s', 's.id', 'm.siteId')
      .select(['p.tag as positionTag', 'm.tag as machineTag', 's.code as siteCode'])
      .where('p.id', '=', positionId)
      .executeTakeFirst();
  }

  async load(id: string, tx?: Tx): Promise<StoredFieldRecord | undefined> {
    const db = on(this.db, tx);
    const record = await db
      .selectFrom('fieldRecords')
      .selectAll()
      .where('id', '=', id)
      .executeTakeFirst();
    if (!record) return undefined;
    return { record, ...(await this.parts([id], db)).get(id)! };
  }

  /** Records by position (oldest first) or status; parts loaded in one query each. */
  async list(
    filter: { positionId?: string; status?: string; ids?: string[] },
    tx?: Tx,
  ): Promise<StoredFieldRecord[]> {
    const db = on(this.db, tx);
    let q = db.selectFrom('fieldRecords').selectAll();
    if (filter.positionId) q = q.where('positionId', '=', filter.positionId);
    if (filter.status) q = q.where('status', '=', filter.status as 'draft');
    if (filter.ids) q = q.where('id', 'in', filter.ids.length ? filter.ids : ['']);
    const records = await q.orderBy('performedAt', 'asc').orderBy('id').limit(1000).execute();
    const parts = await this.parts(
      records.map((r) => r.id),
      db,
    );
    return records.map((record) => ({ record, ...parts.get(record.id)! }));
  }

  private async parts(ids: string[], db: Kysely<DB>) {
    const out = new Map<string, Omit<StoredFieldRecord, 'record'>>(
      ids.map((id) => [id, { measurements: [], checks: [], signatures: [] }]),
    );
    if (ids.length === 0) return out;
    const [m, c, s] = await Promise.all([
      db
        .selectFrom('fieldRecordMeasurements')
        .selectAll()
        .where('recordId', 'in', ids)
        .orderBy('ordinal')
        .execute(),
      db.selectFrom('fieldRecordChecks').selectAll().where('recordId', 'in', ids).execute(),
      db.selectFrom('fieldRecordSignatures').selectAll().where('recordId', 'in', ids).execute(),
    ]);
    for (const r of m) out.get(r.recordId)!.measurements.push(r);
    for (const r of c) out.get(r.recordId)!.checks.push(r);
    for (const r of s) out.get(r.recordId)!.signatures.push(r);
    return out;
  }

  /** Inserts the record unless its id exists; true when this call created it. */
  async insert(
    tx: Tx,
    row: {
      id: string;
      positionId: string;
      revisionId: string;
      kind: string;
      performedAt: string;
      meterHours: number | null;
      findings: string;
      outOfTolerance: boolean;
      createdBy: string;
    },
  ): Promise<boolean> {
    const db = on(this.db, tx);
    const inserted = await db
      .insertInto('fieldRecords')
      .values(row)
      .onConflict((oc) => oc.column('id').doNothing())
      .returning('id')
      .executeTakeFirst();
    return inserted !== undefined;
  }

  async lockForUpdate(tx: Tx, id: string): Promise<FieldRecordRow | undefined> {
    const db = on(this.db, tx);
    return db
      .selectFrom('fieldRecords')
      .selectAll()
      .where('id', '=', id)
      .forUpdate()
      .executeTakeFirst();
  }

  async update(
    tx: Tx,
    id: string,
    set: Partial<{
      kind: string;
      performedAt: string;
      meterHours: number | null;
      findings: string;
      outOfTolerance: boolean;
      status: 'signed' | 'countersigned';
      verificationCode: string;
    }>,
  ): Promise<void> {
    const db = on(this.db, tx);
    await db.updateTable('fieldRecords').set(set).where('id', '=', id).execute();
  }

  /** The measurements of a draft with what each is judged against and its verdicts. */
  async replaceMeasurements(tx: Tx, id: string, items: FieldMeasurement[]): Promise<void> {
    const db = on(this.db, tx);
    await db.deleteFrom('fieldRecordMeasurements').where('recordId', '=', id).execute();
    if (items.length === 0) return;
    await db
      .insertInto('fieldRecordMeasurements')
      .values(
        items.map((m, ordinal) => ({
          recordId: id,
          settingKey: m.settingKey,
          ordinal,
          asFound: m.asFound,
          asLeft: m.asLeft,
          reason: m.reason,
          // Whole or not at all (field_record_measurements_judged_check): no target, no judgement.
          ...(m.target === null
            ? {}
            : {
                target: m.target,
                unit: m.unit,
                dimension: m.dimension,
                tolerance: json(m.tolerance),
                asFoundVerdict: json(m.asFoundVerdict),
                asLeftVerdict: json(m.asLeftVerdict),
              }),
        })),
      )
      .execute();
  }

  async replaceChecks(tx: Tx, id: string, items: FieldCheckInput[]): Promise<void> {
    const db = on(this.db, tx);
    await db.deleteFrom('fieldRecordChecks').where('recordId', '=', id).execute();
    if (items.length === 0) return;
    await db
      .insertInto('fieldRecordChecks')
      .values(items.map((c) => ({ recordId: id, ...c })))
      .execute();
  }

  photos(recordId: string) {
    return this.db
      .selectFrom('attachments')
      .selectAll()
      .where('fieldRecordId', '=', recordId)
      .orderBy('createdAt')
      .execute();
  }

  /** The photo of this record with these bytes (by SHA-256), if it has one. */
  photoWithContent(recordId: string, sha256: string, tx?: Tx) {
    return on(this.db, tx)
      .selectFrom('attachments')
      .selectAll()
      .where('fieldRecordId', '=', recordId)
      .where('sha256', '=', sha256)
      .orderBy('createdAt')
      .executeTakeFirst();
  }

  async countPhotos(tx: Tx, recordId: string): Promise<number> {
    const db = on(this.db, tx);
    const row = await db
      .selectFrom('attachments')
      .select((eb) => eb.fn.countAll<string>().as('n'))
      .where('fieldRecordId', '=', recordId)
      .executeTakeFirstOrThrow();
    return Number(row.n);
  }

  insertPhoto(
    tx: Tx,
    row: {
      revisionId: string;
      fieldRecordId: string;
      fileName: string;
      contentType: string;
      size: number;
      sha256: string;
      storageKey: string;
      uploadedBy: string;
    },
  ) {
    return on(this.db, tx)
      .insertInto('attachments')
      .values(row)
      .returningAll()
      .executeTakeFirstOrThrow();
  }
}
