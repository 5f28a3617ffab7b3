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
await cluster.ensureDatabase('holdfast_e2e', { fresh: true });
await buildAll(projectDir);
// As in `npm start`: migrate and seed as the owner role, serve as the app role. The suites get
// the superuser (DATABASE_URL), since they create a database per worker and reset tables.
await migrateAndSeed(projectDir, cluster.url('holdfast_e2e', 'owner'));

const e2ePort = await freePortFrom(3900);
const app = await startAppServer(
  projectDir,
  {
    DATABASE_URL: cluster.url('holdfast_e2e', 'app'),
    PORT: String(e2ePort),
    HOST: '127.0.0.1',
    PUBLIC_URL: `http://127.0.0.1:${e2ePort}`,
    S3_EMBEDDED: '1',
    S3_PORT: String(await freePortFrom(4600)),
    MAIL_EMBEDDED: '0',
    LOGIN_THROTTLE_LIMIT: '1000',
    // Every browser test signs in from 127.0.0.1: the per-address limit would stop the suite.
    LOGIN_THROTTLE_IP_LIMIT: '10000',
    NODE_ENV: 'test',
  },
  { inherit: false },
);
step(`app under test on ${app.url}`);

const checks = [];
async function check(name, cmd, args) {
  const code = await new Promise((resolve) => {
    const child = spawn(cmd, args, { cwd: projectDir, stdio: 'inherit' });
    child.on('close', resolve);
  });
  checks.push({ name, ok: code === 0 });
}

await check('type tests (calc/test-types)', 'npx', ['tsc', '-p', 'calc/test-types', '--noEmit']);
await check('type tests (shared/test-types)', 'npx', [
  'tsc',
  '-p',
  'shared/test-types',
  '--noEmit',
]);
await check('UI type check', 'npx', ['tsc', '-p', 'ui', '--noEmit']);
await check('verification type check', 'npx', ['tsc', '-p', 'verification', '--noEmit']);
await check('server test type check', 'npx', ['tsc', '-p', 'server/test', '--noEmit']);
await check('print test type check', 'npx', ['tsc', '-p', 'print/tsconfig.test.json']);
await check('lint (eslint)', 'npx', ['eslint', '.', '--max-warnings=0']);
await check('formatting (prettier --check)', 'npx', [
  'prettier',
  '--check',
  '.',
  '--log-level=warn',
]);

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
        HOLDFAST_E2E_URL: app.url,
        HOLDFAST_TEST_OUTPUT: outDir,
        NODE_ENV: 'test',
      },
    },
  );
  child.on('close', resolve);
});

await stopChild(app.child);
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
