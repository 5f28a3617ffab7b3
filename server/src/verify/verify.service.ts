import { Injectable } from '@nestjs/common';
import type { VerifyResult } from '@holdfast/shared';
import { notFound } from '../common/errors/api-exception.js';
import { Database } from '../database/database.js';

/** Answers "is this printout the approved revision in force?" and reveals nothing else. */
@Injectable()
export class VerifyService {
  constructor(private readonly db: Database) {}

  async verify(code: string): Promise<VerifyResult> {
    const rev = await this.db
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
    if (!rev) throw notFound('No revision carries this verification code.');
    const newer =
      rev.approvedRevisionId && rev.approvedRevisionId !== rev.id
        ? await this.db
            .selectFrom('revisions')
            .select(['label', 'approvedAt'])
            .where('id', '=', rev.approvedRevisionId)
            .executeTakeFirst()
        : undefined;
    const review =
      rev.state === 'approved'
        ? await this.db
            .selectFrom('criteriaReviews as c')
            .innerJoin('criteriaSets as cs', 'cs.id', 'c.criteriaSetId')
            .select(['c.flaggedAt', 'c.criteriaSetVersion', 'cs.name'])
            .where('c.revisionId', '=', rev.id)
            .where('c.clearedAt', 'is', null)
            .executeTakeFirst()
        : undefined;
    return {
      documentNumber: rev.documentNumber,
      title: rev.title,
      revisionLabel: rev.label,
      state: rev.state as VerifyResult['state'],
      approvedAt: rev.approvedAt?.toISOString() ?? null,
      current: rev.state === 'approved',
      newerApproved: newer?.approvedAt
        ? { revisionLabel: newer.label, approvedAt: newer.approvedAt.toISOString() }
        : null,
      // Only the set's name, its version and the date: no failing values on a public page.
      underReview: review
        ? {
            since: review.flaggedAt.toISOString(),
            criteriaSetName: review.name,
            criteriaSetVersion: review.criteriaSetVersion,
          }
        : null,
    };
  }
}
