import { mkdir } from 'node:fs/promises';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Page } from 'playwright-core';

/** test-output/screens at the repository root (ignored by git). */
export const screensDir = resolve(
  dirname(fileURLToPath(import.meta.url)),
  '../../../test-output/screens',
);

/**
 * Capturing a whole page costs about ten times the window (1.3 s against 0.12 s for a sheet page
 * here), and `npm test` takes about ninety: whole pages only when HOLDFAST_SCREENSHOTS=full.
 */
const fullPage = process.env.HOLDFAST_SCREENSHOTS === 'full';

/** Save a PNG of the window (or the whole page) as test-output/screens/<name>.png; returns its path. */
export async function screenshot(page: Page, name: string): Promise<string> {
  await mkdir(screensDir, { recursive: true });
  const file = join(screensDir, `${name.replace(/[^a-z0-9-]+/gi, '-')}.png`);
  // Fonts load asynchronously; wait so screenshots show Inter, not the fallback face.
  await page.evaluate(() => document.fonts.ready.then(() => undefined));
  await page.screenshot({ path: file, fullPage });
  return file;
}
