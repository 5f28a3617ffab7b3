import { Injectable, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import { createHash } from 'node:crypto';
import type { PrintQuery } from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { ApiException } from '../common/errors/api-exception.js';
import { CriteriaService } from '../criteria/criteria.service.js';
import { ReviewsRepository } from '../reviews/reviews.repository.js';
import type { CriterionConfirmation } from '@holdfast/shared';
import { RevisionsService } from '../revisions/revisions.service.js';
import { PdfCache } from './pdf-cache.js';
import { RevisionPrintable } from './revision-printable.js';
import { loadPrintSettings } from './print-settings.js';
import type { PrintableSheet, PrintCriteriaReview, PrintCriterion } from '@holdfast/print';
import { RenderPool, RenderQueueFullError, type PrintKind } from '@holdfast/print/pool';
import { PerUserLimit } from './user-limit.js';
import { UsersRepository } from '../users/users.repository.js';

export type { PrintKind } from '@holdfast/print/pool';

export interface PrintedFile {
  bytes: Buffer;
  fileName: string;
}

/** A print refused for now; the controller answers it with a Retry-After header. */
export class PrintBusyException extends ApiException {
  constructor(
    status: 429 | 503,
    message: string,
    readonly retryAfterSeconds: number,
  ) {
    super(status, status === 429 ? 'too_many_requests' : 'service_unavailable', message);
  }
}

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
 * Loads a revision through the sheets services (which enforce who may read it) and renders it on
 * the worker pool. Rendered PDFs are cached under the revision and its row version (drafts too,
 * with a digest of everything printed). Each user may have a few renders running or waiting; past that, 429.
 */
@Injectable()
export class PrintService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly settings = loadPrintSettings();
  private readonly pool = new RenderPool(
    this.settings.PRINT_WORKERS,
    this.settings.PRINT_QUEUE_LIMIT,
  );
  private readonly cache = new PdfCache(this.settings.PRINT_CACHE_MB * 1024 * 1024);
  private readonly perUser = new PerUserLimit(this.settings.PRINT_USER_LIMIT);
  /** Renders in progress by cache key: a second request for the same PDF waits for the first. */
  private readonly rendering = new Map<string, Promise<Buffer>>();

  constructor(
    private readonly revisions: RevisionsService,
    private readonly printable: RevisionPrintable,
    private readonly criteria: CriteriaService,
    private readonly reviews: ReviewsRepository,
    private readonly users: UsersRepository,
  ) {}

  onApplicationBootstrap(): void {
    // Threads load their fonts at start-up rather than on the first print; test apps, which
    // mostly never print, start them on demand.
    if (process.env.NODE_ENV !== 'test') this.pool.start();
  }

  async onModuleDestroy(): Promise<void> {
    await this.pool.close();
  }

  async print(
    user: AuthUser,
    id: string,
    kind: PrintKind,
    query: PrintQuery,
  ): Promise<PrintedFile> {
    const revision = await this.revisions.load(user, id);
    const frozen = revision.state === 'approved' || revision.state === 'superseded';
    const criteriaReviews = frozen ? await this.criteriaReviews(id, revision.state) : [];
    const confirmations = await this.criteria.confirmations(
      revision.criteriaSetId,
      revision.criteriaSetVersion,
    );
    const fileName = printFileName(revision.documentNumber, revision.label, revision.state, kind);

    // Approved and superseded revisions never change, nor do the earlier ones their history
    // lists: their PDFs are found by revision and row version before loading the rest. What can
    // still change their print (a criteria flag or its disposition, a confirmed value) is part of
    // the key.
    const frozenKey = frozen
      ? `${kind}|${id}|${revision.rowVersion}|${query.paper}|${digestOf([criteriaReviews, confirmations])}`
      : null;
    const hit = frozenKey ? this.cache.get(frozenKey) : undefined;
    if (hit) return { bytes: hit, fileName };

    const printable = await this.printable.build(revision, query.paper);
    printable.criteriaReviews = criteriaReviews;
    printable.criteria.values = withConfirmations(printable.criteria.values, confirmations);
    const key = frozenKey ?? cacheKey(kind, id, revision.rowVersion, printable);
    const bytes = this.cache.get(key) ?? (await this.render(user, key, kind, printable));
    return { bytes, fileName };
  }

  /** Dispositions of the revision's criteria reviews, then its open flag (while approved). */
  private async criteriaReviews(id: string, state: string): Promise<PrintCriteriaReview[]> {
    const [cleared, open] = await Promise.all([
      this.reviews.clearedFor(id),
      state === 'approved' ? this.reviews.openFor(id) : undefined,
    ]);
    const people = await this.users.people(cleared.map((c) => c.clearedBy));
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

  private async render(
    user: AuthUser,
    key: string,
    kind: PrintKind,
    sheet: PrintableSheet,
  ): Promise<Buffer> {
    const release = this.perUser.acquire(user.id);
    if (!release) {
      throw new PrintBusyException(
        429,
        `You have ${this.perUser.limit} PDFs being prepared already. Wait for them, then try again.`,
        this.pool.retryAfterSeconds(this.perUser.limit),
      );
    }
    try {
      let job = this.rendering.get(key);
      if (!job) {
        job = this.pool.render({ kind, sheet }).finally(() => this.rendering.delete(key));
        this.rendering.set(key, job);
      }
      const bytes = await job;
      this.cache.set(key, bytes);
      return bytes;
    } catch (e) {
      if (e instanceof RenderQueueFullError) {
        throw new PrintBusyException(
          503,
          'The server is preparing many PDFs at the moment. Try again shortly.',
          this.pool.retryAfterSeconds(this.settings.PRINT_QUEUE_LIMIT),
        );
      }
      throw e;
    } finally {
      release();
    }
  }
}

/**
 * A draft's key: everything printed except the generation time, which a cached copy keeps (the
 * row version moves on every save; the digest also catches renamed people).
 */
function cacheKey(kind: PrintKind, id: string, rowVersion: number, sheet: PrintableSheet): string {
  const digest = digestOf({ ...sheet, generatedAt: '' });
  return `${kind}|${id}|${rowVersion}|${digest}`;
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

function digestOf(value: unknown): string {
  return createHash('sha256').update(JSON.stringify(value)).digest('base64url');
}
