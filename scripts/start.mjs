// `npm start`: install what is missing, start PostgreSQL, migrate, seed, build, serve on 127.0.0.1:3000.
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureNpmDependencies } from './lib/deps.mjs';
import { ensureDejaVu } from './lib/apt.mjs';
import { startCluster, portFree, freePortFrom } from './lib/postgres.mjs';
import { buildAll } from './lib/build.mjs';
import { migrateAndSeed, startAppServer, tryStartAppServer, stopChild } from './lib/app-server.mjs';
import { supervise } from './lib/supervise.mjs';
import { step, fail } from './lib/log.mjs';

const projectDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const port = Number(process.env.PORT ?? 3000);
const pgPort = Number(process.env.PGPORT ?? 54320);
const started = Date.now();

if (!Number.isInteger(port) || port < 1 || port > 65535)
  fail(`PORT=${process.env.PORT} is not a port number`);
if (!(await portFree(port))) {
  fail(
    `port ${port} on 127.0.0.1 is already in use (is Holdfast already running?). ` +
      `Stop that program or start on another port: PORT=3100 npm start`,
  );
}

await ensureNpmDependencies(projectDir);
await ensureDejaVu();
const cluster = await startCluster({ projectDir, name: 'pg', port: pgPort, durable: true });
let supervisor = null;
let stopping = false;
const shutdown = async (signal) => {
  if (stopping) return;
  stopping = true;
  step(`${signal}: stopping the server and PostgreSQL…`);
  await stopChild(supervisor?.stop()?.child);
  await cluster.stop();
  step('stopped cleanly');
  process.exit(0);
};
process.on('SIGINT', () => shutdown('SIGINT'));
process.on('SIGTERM', () => shutdown('SIGTERM'));

// `npm start` is the demo: it seeds the demo users and plant unless HOLDFAST_DEMO=0.
process.env.HOLDFAST_DEMO ??= '1';
const demo = !['0', 'false', 'no'].includes(process.env.HOLDFAST_DEMO.trim().toLowerCase());

await cluster.ensureDatabase('holdfast');
await buildAll(projectDir);
// Migrations and seeds run as the owner role; the server signs in as the app role.
await migrateAndSeed(projectDir, cluster.url('holdfast', 'owner'));

step(`starting Holdfast on http://127.0.0.1:${port} …`);
const serverEnv = {
  DATABASE_URL: cluster.url('holdfast', 'app'),
  PORT: String(port),
  HOST: '127.0.0.1',
  PUBLIC_URL: process.env.PUBLIC_URL ?? `http://127.0.0.1:${port}`,
  S3_EMBEDDED: process.env.S3_EMBEDDED ?? '1',
  MAIL_EMBEDDED: process.env.MAIL_EMBEDDED ?? '1',
  // The local fakes take their usual ports, or the next free ones when something else holds them.
  S3_PORT: process.env.S3_PORT ?? String(await freePortFrom(4569)),
  SMTP_PORT: process.env.SMTP_PORT ?? String(await freePortFrom(1025)),
  MAILDEV_WEB_PORT: process.env.MAILDEV_WEB_PORT ?? String(await freePortFrom(1080)),
  NODE_ENV: 'production',
};
const server = await startAppServer(projectDir, serverEnv);
// From here on a dying server is restarted with back-off; PostgreSQL stays up throughout.
supervisor = supervise(() => tryStartAppServer(projectDir, serverEnv));
supervisor.adopt(server);
step(
  `ready in ${((Date.now() - started) / 1000).toFixed(1)} s: http://127.0.0.1:${port}  (API under /api, docs at /api/docs)`,
);
if (demo) {
  step(
    'demo sign-ins (demo only): engineer@holdfast.test, checker@holdfast.test, viewer@holdfast.test, admin@holdfast.test, technician@holdfast.test — password holdfast-demo',
  );
} else {
  step('no demo (HOLDFAST_DEMO=0): create the first admin with `npm run create-admin`');
}
step('press Ctrl-C to stop');
