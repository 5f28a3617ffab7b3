import { readdirSync, readFileSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import { renderFieldCardPdf, renderSheetPdf } from './render.js';
import { RENDER_NICE, RenderPool } from './render-pool.js';
import { hoistPrintable } from './testing/hoist-fixture.js';

/** pdfkit stamps the creation time and a document id from the clock: the rest must match. */
const stable = (pdf: Uint8Array) =>
  Buffer.from(pdf)
    .toString('latin1')
    .replace(/\(D:\d{14}Z\)/g, '(D:)')
    .replace(/\/ID \[<[0-9a-f]+> <[0-9a-f]+>\]/gi, '/ID []');

// The worker thread loads the built render-worker.js from dist/: run `npx tsc -b` first.
describe('render pool', () => {
  const pool = new RenderPool(1, 4);
  afterAll(() => pool.close());

  it('renders on a worker thread exactly what the request thread renders', async () => {
    const sheet = hoistPrintable({ state: 'draft', failing: true });
    const [worker, local] = [
      await pool.render({ kind: 'sheet', sheet }),
      await renderSheetPdf(sheet),
    ];
    expect(worker.subarray(0, 5).toString()).toBe('%PDF-');
    expect(worker.length).toBe(local.length);
    expect(stable(worker)).toBe(stable(local));

    const card = hoistPrintable({ state: 'approved' });
    expect(stable(await pool.render({ kind: 'field-card', sheet: card }))).toBe(
      stable(await renderFieldCardPdf(card)),
    );
  }, 180_000);

  it.runIf(process.platform === 'linux')(
    'runs its threads at a lower priority than the request thread',
    () => {
      // Field 19 of /proc/<pid>/task/<tid>/stat is the thread's nice value.
      const nice = readdirSync('/proc/self/task').map((tid) => {
        const stat = readFileSync(`/proc/self/task/${tid}/stat`, 'utf8');
        return Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[16]);
      });
      expect(nice).toContain(0);
      expect(nice).toContain(RENDER_NICE);
    },
  );

  it('renders on the calling thread with no workers', async () => {
    const local = new RenderPool(0, 4);
    const sheet = hoistPrintable({ state: 'approved' });
    expect(stable(await local.render({ kind: 'sheet', sheet }))).toBe(
      stable(await renderSheetPdf(sheet)),
    );
    expect(local.retryAfterSeconds(4)).toBeGreaterThanOrEqual(1);
  }, 180_000);
});
