import { mkdtemp, rm } from 'node:fs/promises';
import { existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const chromiumPath = process.env.HOLDFAST_CHROMIUM ?? '/usr/bin/chromium-headless-shell';

const chromiumArgs = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/**
 * The app under test, set by the test runner (built server on a fresh seeded database). `npm test`
 * serves one app per vitest worker (HOLDFAST_E2E_URLS, space-separated): a file takes its worker's
 * app, so two files running at once never share a database. By hand, HOLDFAST_E2E_URL names one.
 */
export function e2eBaseUrl(): string | null {
  const lanes = (process.env.HOLDFAST_E2E_URLS ?? '').split(/\s+/).filter(Boolean);
  const worker = Number(process.env.VITEST_POOL_ID ?? '1');
  const url =
    lanes.length > 0
      ? lanes[(Number.isInteger(worker) && worker > 0 ? worker - 1 : 0) % lanes.length]
      : process.env.HOLDFAST_E2E_URL?.trim();
  return url ? url.replace(/\/+$/, '') : null;
}

/**
 * Why browser tests are skipped here, or null when they can run. Only a missing app URL skips:
 * under `npm test` the URL is always set, so a missing chromium fails loudly instead of hiding.
 */
export function e2eSkipReason(): string | null {
  if (!e2eBaseUrl())
    return 'HOLDFAST_E2E_URL is not set: browser tests need a running Holdfast (npm test sets it).';
  return null;
}

/** Thrown at launch when chromium is missing, so the run fails with the fix in the message. */
function assertChromium(): void {
  if (!existsSync(chromiumPath))
    throw new Error(
      `No chromium at ${chromiumPath}: install it with apt-get install -y chromium-headless-shell.`,
    );
}

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  close: () => Promise<void>;
}

/** A fresh chromium with its own throwaway profile; `close` removes the profile. */
export async function launchBrowser(
  options: { width?: number; height?: number } = {},
): Promise<BrowserSession> {
  assertChromium();
  const profile = await mkdtemp(join(tmpdir(), 'holdfast-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: chromiumPath,
    headless: true,
    args: chromiumArgs,
    viewport: { width: options.width ?? 1280, height: options.height ?? 800 },
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    close: async () => {
      await context.close();
      await rm(profile, { recursive: true, force: true });
    },
  };
}
