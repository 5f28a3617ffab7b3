// `npm run bench:load`: the app under HTTP load on loopback, with its own database and server,
// stopped at the end. Part 1: autocannon on the sheet list, a revision read, a verification
// look-up and a cached PDF. Part 2: four users printing drafts at once (no cache) while
// /api/health is probed, with 0 (request thread), 1 and 2 render threads.
// Options (environment): BENCH_SECONDS (per autocannon run, default 10), BENCH_PRINT_SECONDS
// (per print run, default 20), BENCH_CONNECTIONS (default 10), PGBENCHPORT (default 54339),
// BENCH_ONLY=http or BENCH_ONLY=print for one part.
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureNpmDependencies } from './lib/deps.mjs';
import { run } from './lib/run.mjs';
import { startCluster, freePortFrom } from './lib/postgres.mjs';
import { migrateAndSeed, startAppServer, stopChild } from './lib/app-server.mjs';
import { step } from './lib/log.mjs';
import { cannon, getJson, printUnderLoad, signIn } from './lib/load-probes.mjs';

const projectDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const seconds = Number(process.env.BENCH_SECONDS ?? 10);
const printSeconds = Number(process.env.BENCH_PRINT_SECONDS ?? 20);
const connections = Number(process.env.BENCH_CONNECTIONS ?? 10);
const only = process.env.BENCH_ONLY;
const PASSWORD = 'holdfast-demo'; // the demo seed's, see db/src/demo-users.ts
const email = (who) => `${who}@holdfast.test`;

await ensureNpmDependencies(projectDir);
step('compiling TypeScript (tsc -b)…');
await run('npx', ['tsc', '-b'], { cwd: projectDir });
const cluster = await startCluster({
  projectDir,
  name: 'pg-bench',
  port: Number(process.env.PGBENCHPORT ?? 54339),
  durable: false,
});
await cluster.ensureDatabase('holdfast_bench', { fresh: true });
await migrateAndSeed(projectDir, cluster.url('holdfast_bench'));

let app = null;
const startApp = async (extra) => {
  const port = await freePortFrom(3950);
  app = await startAppServer(
    projectDir,
    {
      DATABASE_URL: cluster.url('holdfast_bench'),
      PORT: String(port),
      HOST: '127.0.0.1',
      PUBLIC_URL: `http://127.0.0.1:${port}`,
      S3_EMBEDDED: '1',
      S3_PORT: String(await freePortFrom(4650)),
      MAIL_EMBEDDED: '0',
      LOG_LEVEL: process.env.LOG_LEVEL ?? 'info',
      VERIFY_RATE_LIMIT: '100000000',
      NODE_ENV: 'production',
      ...extra,
    },
    { inherit: false },
  );
  return app.url;
};
const stopApp = async () => {
  await stopChild(app?.child);
  app = null;
};
// Whatever happens, the server and the cluster stop with the bench.
const cleanUp = async () => {
  await stopApp();
  await cluster.stop();
};
process.on('SIGINT', () => void cleanUp().then(() => process.exit(130)));

const results = { http: [], print: [] };
const get = (url, p, token) =>
  fetch(url + p, { headers: { authorization: `Bearer ${token}` } }).then(async (r) => {
    await r.arrayBuffer();
    if (!r.ok) throw new Error(`GET ${p}: ${r.status}`);
  });

/** The demo seed plus 40 drafts made here: a register page of realistic length. */
async function prepare(url) {
  const engineer = await signIn(url, email('engineer'), PASSWORD);
  const seeded = await getJson(url, '/api/sheets?pageSize=200', engineer);
  const positionId = seeded.items[0].position.id;
  const drafts = [];
  for (let i = 0; i < 40; i++) {
    const res = await fetch(`${url}/api/sheets`, {
      method: 'POST',
      headers: { authorization: `Bearer ${engineer}`, 'content-type': 'application/json' },
      body: JSON.stringify({
        title: `Load bench hoist ${i + 1}`,
        positionId,
        sheetType: 'hoist-shoe-brake',
      }),
    });
    if (res.status !== 201) throw new Error(`create sheet: ${res.status} ${await res.text()}`);
    drafts.push((await res.json()).latest.id);
  }
  const approved = seeded.items.find((s) => s.approved)?.approved;
  if (!approved) throw new Error('the demo seed has no approved sheet');
  const code = (await getJson(url, `/api/revisions/${approved.id}`, engineer)).verificationCode;
  return { engineer, drafts, approvedId: approved.id, code };
}

async function httpLoad(url, { engineer, drafts, approvedId, code }) {
  await get(url, `/api/revisions/${approvedId}/pdf`, engineer); // into the cache
  step(`load: ${connections} connections, ${seconds} s each, ${os.availableParallelism()} cores`);
  for (const [name, p, token] of [
    ['sheet list (page of 25)', '/api/sheets', engineer],
    ['revision read', `/api/revisions/${drafts[0]}`, engineer],
    ['verify (public)', `/api/verify/${code}`, null],
    ['cached PDF (approved)', `/api/revisions/${approvedId}/pdf`, engineer],
  ]) {
    const r = await cannon({ name, url: url + p, token, connections, seconds });
    results.http.push(r);
    step(`${name}: ${r.reqPerSec.toFixed(0)} req/s, p50 ${r.p50} ms, p99 ${r.p99} ms`);
  }
}

async function printLoad(drafts) {
  const printers = ['engineer', 'engineer2', 'checker', 'checker2'];
  for (const workers of [0, 1, 2]) {
    const url = await startApp({ PRINT_WORKERS: String(workers), PRINT_CACHE_MB: '0' });
    const prints = await Promise.all(
      printers.map(async (who, i) => ({
        path: `/api/revisions/${drafts[i]}/pdf`,
        token: await signIn(url, email(who), PASSWORD),
      })),
    );
    // Warm-up: the first renders of each thread pay for font loading.
    await Promise.all(prints.map((p) => get(url, p.path, p.token)));
    const r = {
      workers,
      ...(await printUnderLoad({ baseUrl: url, prints, seconds: printSeconds })),
    };
    results.print.push(r);
    if (r.failed > 0) {
      const errors = app
        .output()
        .split('\n')
        .filter((l) => /"level":50|Error/.test(l));
      step(`${r.failed} prints failed; the server said:\n${errors.slice(-5).join('\n')}`);
    }
    step(
      `4 users printing drafts, ${workers || 'no'} render thread(s): ` +
        `${r.printsPerSec.toFixed(2)} prints/s (p50 ${r.printP50.toFixed(0)} ms), ` +
        `/api/health p50 ${r.healthP50.toFixed(1)} ms, p99 ${r.healthP99.toFixed(1)} ms, ` +
        `max ${r.healthMax.toFixed(1)} ms`,
    );
    await stopApp();
  }
}

try {
  const url = await startApp({});
  const data = await prepare(url);
  if (only !== 'print') await httpLoad(url, data);
  await stopApp();
  if (only !== 'http') await printLoad(data.drafts);
} finally {
  await cleanUp();
}
const load = os
  .loadavg()
  .map((l) => l.toFixed(2))
  .join(' ');
step(`load average at the end (1, 5, 15 min): ${load}`);
process.stdout.write(`${JSON.stringify(results, null, 2)}\n`);
