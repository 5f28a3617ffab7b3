// `npm run bench:ui`: keystroke to updated results on screen in the sheet editor, measured inside
// the page. Needs a running, seeded Holdfast (HOLDFAST_E2E_URL, e.g. http://127.0.0.1:3000 after
// `npm start`) and Debian's chromium headless shell (installed here if missing). Prints the median and the 95th percentile.
//
// Each sample: the `input` event's timeStamp (when the key reached the page) to the first DOM
// change inside the results column, seen by a MutationObserver (it runs right after the commit,
// before paint). Keys are typed one by one into the spring force of a hoist sheet, 60 ms apart, so
// one keystroke's work never overlaps the next.
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { chromiumPath, ensureChromium } from '../../scripts/lib/apt.mjs';

const base = (process.env.HOLDFAST_E2E_URL ?? '').replace(/\/+$/, '');
if (!base) {
  console.error('Set HOLDFAST_E2E_URL to a running, seeded Holdfast (npm start serves one).');
  process.exit(2);
}
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 40);
const WIDTH = Number(process.env.BENCH_WIDTH ?? 1440);

async function api(token, method, path, body) {
  const res = await fetch(`${base}/api${path}`, {
    method,
    headers: {
      ...(token ? { Authorization: `Bearer ${token}` } : {}),
      ...(body ? { 'Content-Type': 'application/json' } : {}),
    },
    body: body ? JSON.stringify(body) : undefined,
  });
  if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${await res.text()}`);
  return res.json();
}

const login = { email: 'engineer@holdfast.test', password: 'holdfast-demo' };
const { accessToken } = await api(null, 'POST', '/auth/sign-in', login);
const register = await api(accessToken, 'GET', '/register');
const position = register.sites.flatMap((s) => s.machines.flatMap((m) => m.positions))[0];
const sheet = await api(accessToken, 'POST', '/sheets', {
  title: `Keystroke benchmark ${Date.now().toString(36)}`,
  positionId: position.id,
  sheetType: 'hoist-shoe-brake',
  start: { kind: 'example' },
});

if (!process.env.HOLDFAST_CHROMIUM) await ensureChromium();
const profile = await mkdtemp(join(tmpdir(), 'holdfast-bench-'));
const context = await chromium.launchPersistentContext(profile, {
  executablePath: process.env.HOLDFAST_CHROMIUM ?? chromiumPath,
  headless: true,
  args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-sync'],
  viewport: { width: WIDTH, height: 900 },
});
try {
  const page = context.pages()[0] ?? (await context.newPage());
  await page.goto(`${base}/sign-in`);
  await page.getByRole('textbox', { name: 'E-mail' }).fill(login.email);
  await page.getByRole('textbox', { name: 'Password' }).fill(login.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByTestId('current-user-name').waitFor();
  await page.goto(`${base}/sheets/${sheet.id}/revisions/${sheet.latest.id}`);
  await page.locator('[data-check]').first().waitFor();

  await page.evaluate(() => {
    const w = /** @type {any} */ (window);
    w.__samples = [];
    let started = null;
    document.addEventListener('input', (e) => (started = e.timeStamp), true);
    const results = document.querySelector('[data-testid="workbench-results"]');
    new MutationObserver(() => {
      if (started === null) return;
      w.__samples.push(performance.now() - started);
      started = null;
    }).observe(results, { subtree: true, childList: true, characterData: true, attributes: true });
  });

  const box = page.getByRole('textbox', { name: /^Main spring force as set/ });
  for (let k = 0; k < ROUNDS; k++) {
    await box.click();
    await box.press('ControlOrMeta+a');
    await box.pressSequentially(String(1000 + ((k * 37) % 400)), { delay: 60 });
    await page.waitForTimeout(80);
  }
  const samples = await page.evaluate(() => /** @type {any} */ (window).__samples);
  const sorted = [...samples].sort((a, b) => a - b);
  const at = (q) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
  const core = await page.getByTestId('recalc-time').textContent();
  console.log(
    `keystroke → results DOM (hoist sheet, ${WIDTH} px, ${sorted.length} keys): ` +
      `median ${at(0.5).toFixed(1)} ms, p95 ${at(0.95).toFixed(1)} ms, max ${sorted.at(-1).toFixed(1)} ms` +
      ` (targets: median ≤ 16 ms, p95 ≤ 33 ms); last core evaluation ${core?.trim()}`,
  );
} finally {
  await context.close();
  await rm(profile, { recursive: true, force: true });
}
