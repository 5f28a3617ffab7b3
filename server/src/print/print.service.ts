import { Injectable, NotFoundException, type OnModuleInit } from '@nestjs/common';
import { getSheetType } from '@holdfast/calc';
import type { PrintQuery } from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { AppConfig } from '../config/app-config.js';
import { CriteriaService } from '../criteria/criteria.service.js';
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
 * What the saved file is called: document number, revision, kind, and a marking for a revision
 * that is not approved, e.g. HF-MH-0003-rev-B-calculation-sheet.pdf,
 * HF-MH-0003-rev-C-draft-field-card.pdf.
 */
export function printFileName(
  documentNumber: string,
  label: string,
  state: string,
  kind: PrintKind,
): string {
  const frozen = state === 'approved' || state === 'superseded';
  const marking = frozen
    ? state === 'superseded'
      ? '-superseded'
      : ''
    : `-${state.replace('_', '-')}`;
  const what = kind === 'field-card' ? 'field-card' : 'calculation-sheet';
  return `${documentNumber}-rev-${label}${marking}-${what}.pdf`.replace(/[^\w.-]/g, '_');
}

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
    const key = [kind, id, revision.state, revision.supersededBy?.label ?? '', query.paper].join(
      '|',
    );
    const fileName = printFileName(revision.documentNumber, revision.label, revision.state, kind);
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
    const bytes =
      kind === 'sheet' ? await renderSheetPdf(printable) : await renderFieldCardPdf(printable);
    if (frozen) {
      if (this.cache.size >= CACHE_SIZE) this.cache.delete(this.cache.keys().next().value!);
      this.cache.set(key, bytes);
    }
    return { bytes, fileName };
  }
}
