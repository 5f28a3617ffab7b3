import { Injectable } from '@nestjs/common';
import type { AttachmentRow } from '@holdfast/db';
import { Database } from '../database/database.js';
import { on, type Tx } from '../database/unit-of-work.js';

export interface NewAttachment {
  revisionId: string;
  fileName: string;
  contentType: string;
  size: number;
  sha256: string;
  storageKey: string;
  uploadedBy: string;
}

/** The files attached to revisions (their bytes are in object storage). */
@Injectable()
export class AttachmentsRepository {
  constructor(private readonly db: Database) {}

  /** The revision's own files, oldest first; photos of field records belong to their record. */
  listForRevision(revisionId: string): Promise<AttachmentRow[]> {
    return this.db
      .selectFrom('attachments')
      .selectAll()
      .where('revisionId', '=', revisionId)
      .where('fieldRecordId', 'is', null)
      .orderBy('createdAt', 'asc')
      .execute();
  }

  find(id: string): Promise<AttachmentRow | undefined> {
    return this.db.selectFrom('attachments').selectAll().where('id', '=', id).executeTakeFirst();
  }

  /**
   * Takes the revision's row lock inside the caller's transaction: uploads to one revision
   * then run one after another, so its quota holds under races.
   */
  async lockRevision(revisionId: string, tx: Tx): Promise<void> {
    await on(this.db, tx)
      .selectFrom('revisions')
      .select('id')
      .where('id', '=', revisionId)
      .forUpdate()
      .execute();
  }

  /** How many files and bytes the revision holds (field-record photos included). */
  async usage(revisionId: string, tx?: Tx): Promise<{ files: number; bytes: number }> {
    const used = await on(this.db, tx)
      .selectFrom('attachments')
      .select((eb) => [eb.fn.countAll<string>().as('files'), eb.fn.sum<string>('size').as('bytes')])
      .where('revisionId', '=', revisionId)
      .executeTakeFirstOrThrow();
    return { files: Number(used.files), bytes: Number(used.bytes ?? 0) };
  }

  insert(row: NewAttachment, tx?: Tx): Promise<AttachmentRow> {
    return on(this.db, tx)
      .insertInto('attachments')
      .values(row)
      .returningAll()
      .executeTakeFirstOrThrow();
  }

  /** The latest revision of each named document, when it has no file yet (the demo's data sheet). */
  withoutFiles(documentNumbers: string[]) {
    return this.db
      .selectFrom('sheets as s')
      .innerJoin('revisions as r', 'r.id', 's.latestRevisionId')
      .select(['s.documentNumber', 'r.id as revisionId', 'r.authorId'])
      .where('s.documentNumber', 'in', documentNumbers)
      .where(({ not, exists, selectFrom }) =>
        not(
          exists(
            selectFrom('attachments as a').select('a.id').whereRef('a.revisionId', '=', 'r.id'),
          ),
        ),
      )
      .execute();
  }
}
