import { spawn } from 'node:child_process';
import path from 'node:path';
import { run } from './run.mjs';
import { step, fail } from './log.mjs';

/**
 * Migrate, install the job queues and seed (db's seeds, then the server's demo scenario, each
 * idempotent and skipped when HOLDFAST_DEMO says no demo), signed in as the owner role (`cluster.url(db,
 * 'owner')`); the server itself then runs as the app role (see db-roles.mjs).
 */
export async function migrateAndSeed(projectDir, databaseUrl) {
  const cli = path.join(projectDir, 'db', 'dist', 'src', 'cli.js');
  const queues = path.join(projectDir, 'server', 'dist', 'outbox', 'queue-install.js');
  const demo = path.join(projectDir, 'server', 'dist', 'demo', 'seed-demo.cli.js');
  const env = { ...process.env, DATABASE_URL: databaseUrl };
  try {
    step('migrating the database…');
    await run('node', [cli, 'migrate'], { cwd: projectDir, env });
    await run('node', [queues], { cwd: projectDir, env });
    step('seeding the demo users and scenario…');
    await run('node', [cli, 'seed'], { cwd: projectDir, env });
    // The scenario is made through the server's services (server/src/demo/), after the users.
    await run('node', [demo], { cwd: projectDir, env });
  } catch (e) {
    fail(`database set-up failed: ${e.message}`);
  }
}

/**
 * Node flags for the server process. PDF rendering allocates heavily; a 64 MB young generation
 * cuts its garbage-collection time (about 10 % of a calculation-sheet render, measured in
 * docs/performance.md).
 */
export const SERVER_NODE_FLAGS = ['--max-semi-space-size=64'];

/** Start the built server as a child and wait until /api/health answers 200; exits on failure. */
export async function startAppServer(projectDir, env, options = {}) {
  try {
    return await tryStartAppServer(projectDir, env, options);
  } catch (e) {
    fail(e.message);
  }
}

/** The same, but a failed start rejects (the supervisor retries it) instead of exiting. */
export async function tryStartAppServer(
  projectDir,
  env,
  { timeoutMs = 60000, inherit = true } = {},
) {
  const main = path.join(projectDir, 'server', 'dist', 'main.js');
  // HOLDFAST_SERVER_NODE_FLAGS adds flags for one run, e.g. `--cpu-prof` to profile under load.
  const extra = (process.env.HOLDFAST_SERVER_NODE_FLAGS ?? '').split(' ').filter(Boolean);
  const child = spawn('node', [...SERVER_NODE_FLAGS, ...extra, main], {
    cwd: projectDir,
    env: { ...process.env, ...env },
    stdio: inherit ? 'inherit' : ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout?.on('data', (d) => (output = (output + d).slice(-8000)));
  child.stderr?.on('data', (d) => (output = (output + d).slice(-8000)));
  let exited = null;
  child.on('exit', (code, signal) => (exited = code ?? signal));
  const url = `http://127.0.0.1:${env.PORT}`;
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (exited !== null)
      throw new Error(`the server stopped during start-up (exit ${exited})\n${output}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) return { child, url, output: () => output };
    } catch {
      /* not listening yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  child.kill('SIGTERM');
  throw new Error(
    `the server did not answer ${url}/api/health within ${timeoutMs / 1000} s\n${output}`,
  );
}

export function stopChild(child) {
  return new Promise((resolve) => {
    if (!child || child.exitCode !== null) return resolve();
    const t = setTimeout(() => child.kill('SIGKILL'), 8000);
    child.once('exit', () => {
      clearTimeout(t);
      resolve();
    });
    child.kill('SIGTERM');
  });
}
