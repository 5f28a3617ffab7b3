import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import type { PrintableSheet } from './printable-sheet.js';

/** Scheduling priority of the render threads relative to the process (higher yields more). */
export const RENDER_NICE = 10;

export type PrintKind = 'sheet' | 'field-card';

export interface RenderTask {
  kind: PrintKind;
  sheet: PrintableSheet;
}

/** Thrown when every thread is busy and the shared queue is full. */
export class RenderQueueFullError extends Error {
  constructor() {
    super('PDF render queue is full');
  }
}

/**
 * The compiled worker entry. Under vitest this module runs from src/ as TypeScript, which a
 * worker thread cannot load, so the built copy in dist/ is used (`tsc -b` first).
 */
function workerFile(): string {
  const here = fileURLToPath(new URL('./render-worker.js', import.meta.url));
  if (existsSync(here)) return here;
  const built = here.replace(/([\\/])src([\\/])render-worker\.js$/, '$1dist$2render-worker.js');
  if (!existsSync(built)) throw new Error(`PDF render worker not built: ${built} (run npx tsc -b)`);
  return built;
}

/**
 * Renders PDFs on worker threads so that a render (0.2–1 s of CPU) never holds up other
 * requests. `threads: 0` renders on the calling thread.
 */
export class RenderPool {
  private pool: Piscina | null = null;
  /** Recent render time in ms (moving average), for Retry-After estimates. */
  private averageMs = 500;

  constructor(
    readonly threads: number,
    private readonly queueLimit: number,
  ) {}

  /**
   * Starts the threads, each of which loads the fonts once (about a second of CPU). Called at
   * start-up by the server and by the first render otherwise, so test apps that never print
   * start none.
   */
  start(): Piscina | null {
    if (this.threads === 0 || this.pool) return this.pool;
    // minThreads = maxThreads: a thread is never retired, so its fonts stay loaded.
    this.pool = new Piscina({
      filename: workerFile(),
      minThreads: this.threads,
      maxThreads: this.threads,
      maxQueue: this.queueLimit,
      // Render threads yield the CPU to the request thread when both want it, so answers stay
      // quick on a busy machine (Linux, through piscina's optional @napi-rs/nice).
      niceIncrement: RENDER_NICE,
    });
    return this.pool;
  }

  async render(task: RenderTask): Promise<Buffer> {
    const started = performance.now();
    let bytes: Uint8Array;
    const pool = this.start();
    if (!pool) {
      // Loaded only here: with threads, the request thread never loads the renderer or its fonts.
      const { renderFieldCardPdf, renderSheetPdf } = await import('./render.js');
      bytes =
        task.kind === 'sheet'
          ? await renderSheetPdf(task.sheet)
          : await renderFieldCardPdf(task.sheet);
    } else {
      if (pool.queueSize >= this.queueLimit) throw new RenderQueueFullError();
      bytes = (await pool.run(task)) as Uint8Array;
    }
    this.averageMs = 0.8 * this.averageMs + 0.2 * (performance.now() - started);
    return Buffer.isBuffer(bytes)
      ? bytes
      : Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  }

  /** Seconds until `waiting` more renders would have gone through the pool, at least 1. */
  retryAfterSeconds(waiting: number): number {
    return Math.max(1, Math.ceil((this.averageMs * waiting) / Math.max(1, this.threads) / 1000));
  }

  async close(): Promise<void> {
    const pool = this.pool;
    this.pool = null;
    await pool?.destroy();
  }
}
