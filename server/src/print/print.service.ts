import { Injectable, NotFoundException, type OnModuleInit } from '@nestjs/common';
import { getSheetType } from '@holdfast/calc';
import type { PrintQuery } from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { AppConfig } from '../config/app-config.js';
import { CriteriaService } from '../criteria/criteria.service.js';
import { ReviewsRepository } from '../reviews/reviews.repository.js';
import type { CriterionConfirmation } from '@holdfast/shared';
import type { PrintCriteriaReview, PrintCriterion } from './printable-sheet.js';
import { RevisionsService } from '../revisions/revisions.service.js';
import { SheetsService } from '../sheets/sheets.service.js';
import { buildPrintableSheet } from './build-printable-sheet.js';
import { renderFieldCardPdf, renderSheetPdf, warmUpPdfRenderer } from './render.js';

export type PrintKind = 'sheet' | 'field-card';

export interface PrintedFile {
  bytes: Buffer;
  fileName: string;
}

const CACHE_SIZE = 32;

/**
 * Loads a revision through the sheets services (which enforce who may read it) and renders it.
 * Approved and superseded revisions never change, so their PDFs are kept in a small cache keyed
 * by everything that shows on the page; drafts are rendered every time.
 */
@Injectable()
export class PrintService implements OnModuleInit {
  private readonly cache = new Map<string, Buffer>();

  constructor(
    private readonly revisions: RevisionsService,
    private readonly sheets: SheetsService,
    private readonly criteria: CriteriaService,
    private readonly config: AppConfig,
    private readonly reviews: ReviewsRepository,
  ) {}

  onModuleInit(): void {
    // Font parsing takes a few hundred ms: do it before the first request, off the start path.
    void warmUpPdfRenderer().catch(() => undefined);
  }

  async print(
    user: AuthUser,
    id: string,
    kind: PrintKind,
    query: PrintQuery,
  ): Promise<PrintedFile> {
    const revision = await this.revisions.get(user, id);
    const frozen = revision.state === 'approved' || revision.state === 'superseded';
    const criteriaReviews = frozen ? await this.criteriaReviews(id, revision.state) : [];
    const confirmations = await this.criteria.confirmations(
      revision.criteriaSetId,
      revision.criteriaSetVersion,
    );
    // A new flag or disposition changes the print of a frozen revision: it is part of the key.
    const key = [
      kind,
      id,
      revision.state,
      revision.supersededBy?.label ?? '',
      query.paper,
      JSON.stringify(criteriaReviews),
      JSON.stringify(confirmations),
    ].join('|');
    const fileName = `${revision.documentNumber}-rev-${revision.label}${kind === 'field-card' ? '-field-card' : ''}.pdf`;
    const hit = frozen ? this.cache.get(key) : undefined;
    if (hit) return { bytes: hit, fileName };

    const sheetType = getSheetType(revision.sheetType);
    if (!sheetType)
      throw new NotFoundException(`Sheet type ${revision.sheetType} is not known to this server.`);
    const [sheet, criteriaSet] = await Promise.all([
      this.sheets.detail(revision.sheetId),
      this.criteria.load(revision.criteriaSetId, revision.criteriaSetVersion),
    ]);
    const printable = buildPrintableSheet({
      sheet,
      revision,
      sheetType,
      criteriaSet,
      verifyBaseUrl: this.config.settings.PUBLIC_URL,
      paper: query.paper,
    });
    printable.criteriaReviews = criteriaReviews;
    printable.criteria.values = withConfirmations(printable.criteria.values, confirmations);
    const bytes =
      kind === 'sheet' ? await renderSheetPdf(printable) : await renderFieldCardPdf(printable);
    if (frozen) {
      if (this.cache.size >= CACHE_SIZE) this.cache.delete(this.cache.keys().next().value!);
      this.cache.set(key, bytes);
    }
    return { bytes, fileName };
  }

  /** Dispositions of the revision's criteria reviews, then its open flag (while approved). */
  private async criteriaReviews(id: string, state: string): Promise<PrintCriteriaReview[]> {
    const [cleared, open] = await Promise.all([
      this.reviews.clearedFor(id),
      state === 'approved' ? this.reviews.openFor(id) : undefined,
    ]);
    const people = await this.reviews.people(cleared.map((c) => c.clearedBy));
    return [...cleared.filter((c) => c.clearedHow === 'disposition'), ...(open ? [open] : [])].map(
      (r) => {
        const by = r.clearedBy ? people.get(r.clearedBy) : undefined;
        return {
          criteriaSetName: r.criteriaSetName,
          criteriaSetVersion: r.criteriaSetVersion,
          flaggedAt: r.flaggedAt.toISOString(),
          failing: (r.failing as { label: string }[]).map((f) => f.label),
          disposition: r.disposition,
          checker: by ? `${by.displayName} (${by.initials})` : null,
          clearedAt: r.clearedAt?.toISOString() ?? null,
        };
      },
    );
  }
}

/** Each value with the document that confirms it, if any. */
function withConfirmations(
  values: PrintCriterion[],
  confirmations: CriterionConfirmation[],
): PrintCriterion[] {
  return values.map((v) => {
    const c = confirmations.find((x) => x.key === v.key);
    return c
      ? {
          ...v,
          confirmation: {
            document: c.document,
            clause: c.clause,
            by: c.confirmedBy.initials,
            at: c.confirmedAt,
          },
        }
      : v;
  });
}
