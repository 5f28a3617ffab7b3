import { Injectable, Logger } from '@nestjs/common';
import type { ImpactReport } from '@holdfast/shared';
import { failingChecks } from './failing-checks.js';
import { ReviewsRepository } from '../reviews/reviews.repository.js';
import { CriteriaService } from './criteria.service.js';

/**
 * Impact check: re-evaluate the stored inputs of every approved revision that uses this criteria
 * set against a given version of it, and list those that would no longer pass.
 */
@Injectable()
export class ImpactService {
  private readonly logger = new Logger('ImpactService');

  constructor(
    private readonly criteria: CriteriaService,
    private readonly reviews: ReviewsRepository,
  ) {}

  async impact(setId: string, version?: number): Promise<ImpactReport> {
    const criteria = await this.criteria.load(setId, version ?? 'latest');
    const approved = await this.reviews.approvedUsing(setId);
    const items: ImpactReport['items'] = [];
    for (const rev of approved) {
      const failing = failingChecks(rev.sheetType, rev.inputs, criteria, (e) =>
        this.logger.warn(
          `impact: ${rev.documentNumber} rev. ${rev.label} no longer evaluates: ${String(e)}`,
        ),
      );
      if (failing.length > 0) {
        items.push({
          sheetId: rev.sheetId,
          documentNumber: rev.documentNumber,
          title: rev.title,
          revisionId: rev.id,
          revisionLabel: rev.label,
          failing,
        });
      }
    }
    return { criteriaSetId: setId, version: criteria.version, checked: approved.length, items };
  }
}
