// `npm test`: the same set-up as `npm start` on a throwaway cluster, then every suite, then one summary line.
import path from 'node:path';
import { readFileSync, existsSync, mkdirSync, rmSync } from 'node:fs';
import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { ensureNpmDependencies } from './lib/deps.mjs';
import { ensureChromium, ensurePoppler, ensureDejaVu } from './lib/apt.mjs';
import { startCluster, freePortFrom } from './lib/postgres.mjs';
import { buildAll } from './lib/build.mjs';
import { migrateAndSeed, startAppServer, stopChild } from './lib/app-server.mjs';
import { step } from './lib/log.mjs';

const projectDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const outDir = path.join(projectDir, 'test-output');
const started = Date.now();
mkdirSync(outDir, { recursive: true });

await ensureNpmDependencies(projectDir);
await ensureChromium();
await ensurePoppler();
await ensureDejaVu();
const cluster = await startCluster({
  projectDir,
  name: 'pg-test',
  port: Number(process.env.PGTESTPORT ?? 54329),
  durable: false,
});
await cluster.ensureDatabase('holdfast_test', { fresh: true });
// Two apps under test, each on its own seeded database: the browser files run two at a time,
// one per app (ui/e2e/support/browser.ts picks by vitest's worker number), so neither sees the
// other's clicks. The browser files are CPU-bound (chromium), so two lanes barely shorten them;
// what they gain is that the other suites no longer queue behind one long lane.
const E2E_LANES = ['holdfast_e2e', 'holdfast_e2e_b'];
for (const db of E2E_LANES) await cluster.ensureDatabase(db, { fresh: true });
await buildAll(projectDir);
// As in `npm start`: migrate and seed as the owner role, serve as the app role. The suites get
// the superuser (DATABASE_URL), since they create a database per worker and reset tables.
for (const db of E2E_LANES) await migrateAndSeed(projectDir, cluster.url(db, 'owner'));

const apps = [];
let nextPort = 3900;
let nextS3Port = 4600;
for (const db of E2E_LANES) {
  const port = await freePortFrom(nextPort);
  const s3Port = await freePortFrom(nextS3Port);
  nextPort = port + 1;
  nextS3Port = s3Port + 1;
  const app = await startAppServer(
    projectDir,
    {
      DATABASE_URL: cluster.url(db, 'app'),
      PORT: String(port),
      HOST: '127.0.0.1',
      PUBLIC_URL: `http://127.0.0.1:${port}`,
      S3_EMBEDDED: '1',
      S3_PORT: String(s3Port),
      MAIL_EMBEDDED: '0',
      LOGIN_THROTTLE_LIMIT: '1000',
      // Every browser test signs in from 127.0.0.1: the per-address limit would stop the suite.
      LOGIN_THROTTLE_IP_LIMIT: '10000',
      NODE_ENV: 'test',
    },
    { inherit: false },
  );
  step(`app under test on ${app.url} (${db})`);
  apps.push(app);
}

// The static checks run one after another beside the suites, niced, in the CPU the suites leave
// (the db and scripts projects run alone at the end, on one core). Their output is held and
// printed when each ends, so it does not interleave with the suites' output.
const staticChecks = [
  ['type tests (calc/test-types)', ['tsc', '-p', 'calc/test-types', '--noEmit']],
  ['type tests (shared/test-types)', ['tsc', '-p', 'shared/test-types', '--noEmit']],
  ['UI type check', ['tsc', '-p', 'ui', '--noEmit']],
  ['verification type check', ['tsc', '-p', 'verification', '--noEmit']],
  ['server test type check', ['tsc', '-p', 'server/test', '--noEmit']],
  ['print test type check', ['tsc', '-p', 'print/tsconfig.test.json']],
  ['lint (eslint)', ['eslint', '.', '--max-warnings=0']],
  ['formatting (prettier --check)', ['prettier', '--check', '.', '--log-level=warn']],
];
const checks = [];
async function check(name, args) {
  const t0 = Date.now();
  const { code, output } = await new Promise((resolve) => {
    // Niced: the suites (browser lanes first) get the cores first, the checks take what is left.
    const child = spawn('nice', ['-n', '10', 'npx', ...args], {
      cwd: projectDir,
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    child.stdout.on('data', (d) => (output += d));
    child.stderr.on('data', (d) => (output += d));
    child.on('close', (code) => resolve({ code, output }));
  });
  checks.push({ name, ok: code === 0 });
  const took = ((Date.now() - t0) / 1000).toFixed(0);
  step(`${code === 0 ? 'ok' : 'FAILED'}: ${name} (${took} s)`);
  if (code !== 0) process.stdout.write(output.endsWith('\n') ? output : `${output}\n`);
}
const staticDone = (async () => {
  for (const [name, args] of staticChecks) await check(name, args);
})();

const report = path.join(outDir, 'vitest.json');
rmSync(report, { force: true });
step('running every suite (vitest)…');
const vitestCode = await new Promise((resolve) => {
  const child = spawn(
    'npx',
    ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`],
    {
      cwd: projectDir,
      stdio: 'inherit',
      env: {
        ...process.env,
        DATABASE_URL: cluster.url('holdfast_test'),
        HOLDFAST_E2E_URL: apps[0].url,
        HOLDFAST_E2E_URLS: apps.map((a) => a.url).join(' '),
        HOLDFAST_TEST_OUTPUT: outDir,
        NODE_ENV: 'test',
      },
    },
  );
  child.on('close', resolve);
});
await staticDone;

for (const a of apps) await stopChild(a.child);
await cluster.stop();

let passed = 0;
let failed = 0;
if (existsSync(report)) {
  const r = JSON.parse(readFileSync(report, 'utf8'));
  passed += r.numPassedTests;
  failed += r.numFailedTests;
  // A file that fails to load has no tests but is still a failure.
  failed += (r.testResults ?? []).filter(
    (f) => f.status === 'failed' && f.assertionResults.length === 0,
  ).length;
} else {
  failed += 1;
}
if (vitestCode !== 0 && failed === 0) failed += 1;
for (const c of checks) {
  if (c.ok) passed++;
  else {
    failed++;
    step(`FAILED: ${c.name}`);
  }
}
step(`test run took ${((Date.now() - started) / 1000).toFixed(0)} s`);
process.stdout.write(`${passed} passed, ${failed} failed\n`);
process.exit(failed === 0 ? 0 : 1);
