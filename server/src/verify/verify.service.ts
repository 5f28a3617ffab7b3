import { Injectable } from '@nestjs/common';
import type { VerifyResult } from '@holdfast/shared';
import { notFound } from '../common/errors/api-exception.js';
import { VerifyRepository } from './verify.repository.js';

/** Answers "is this printout the approved revision in force?" and reveals nothing else. */
@Injectable()
export class VerifyService {
  constructor(private readonly repo: VerifyRepository) {}

  async verify(code: string): Promise<VerifyResult> {
    const rev = await this.repo.byCode(code);
    if (!rev) throw notFound('No revision carries this verification code.');
    const newer =
      rev.approvedRevisionId && rev.approvedRevisionId !== rev.id
        ? await this.repo.approval(rev.approvedRevisionId)
        : undefined;
    const review = rev.state === 'approved' ? await this.repo.openReview(rev.id) : undefined;
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
