import { Injectable } from '@nestjs/common';
import { Database } from '../database/database.js';

/** What the public verification page may read: a revision by its code, and little else. */
@Injectable()
export class VerifyRepository {
  constructor(private readonly db: Database) {}

  /** The revision carrying a verification code, with its sheet's number, title and approval. */
  byCode(code: string) {
    return this.db
      .selectFrom('revisions as r')
      .innerJoin('sheets as s', 's.id', 'r.sheetId')
      .select([
        'r.id',
        'r.label',
        'r.state',
        'r.approvedAt',
        's.documentNumber',
        's.title',
        's.approvedRevisionId',
      ])
      .where('r.verificationCode', '=', code)
      .executeTakeFirst();
  }

  /** Label and approval date of a revision. */
  approval(revisionId: string) {
    return this.db
      .selectFrom('revisions')
      .select(['label', 'approvedAt'])
      .where('id', '=', revisionId)
      .executeTakeFirst();
  }

  /** The open criteria review of an approved revision, if any: set name, version and date. */
  openReview(revisionId: string) {
    return this.db
      .selectFrom('criteriaReviews as c')
      .innerJoin('criteriaSets as cs', 'cs.id', 'c.criteriaSetId')
      .select(['c.flaggedAt', 'c.criteriaSetVersion', 'cs.name'])
      .where('c.revisionId', '=', revisionId)
      .where('c.clearedAt', 'is', null)
      .executeTakeFirst();
  }
}
