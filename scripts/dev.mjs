// `npm run dev`: PostgreSQL, tsc in watch mode, the server restarting on change, and Vite with its /api proxy.
import path from 'node:path';
import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { ensureNpmDependencies } from './lib/deps.mjs';
import { startCluster } from './lib/postgres.mjs';
import { buildAll } from './lib/build.mjs';
import { SERVER_NODE_FLAGS, migrateAndSeed } from './lib/app-server.mjs';
import { step } from './lib/log.mjs';

const projectDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
await ensureNpmDependencies(projectDir);
const cluster = await startCluster({
  projectDir,
  name: 'pg',
  port: Number(process.env.PGPORT ?? 54320),
  durable: true,
});
await cluster.ensureDatabase('holdfast');
await buildAll(projectDir);
// Migrations and seeds run as the owner role; the server signs in as the app role.
await migrateAndSeed(projectDir, cluster.url('holdfast', 'owner'));
const env = {
  ...process.env,
  DATABASE_URL: cluster.url('holdfast', 'app'),
  PORT: '3000',
  S3_EMBEDDED: '1',
  MAIL_EMBEDDED: '1',
};
const children = [
  spawn('npx', ['tsc', '-b', '-w', '--preserveWatchOutput'], { cwd: projectDir, stdio: 'inherit' }),
  spawn('node', [...SERVER_NODE_FLAGS, '--watch', 'server/dist/main.js'], {
    cwd: projectDir,
    stdio: 'inherit',
    env,
  }),
  spawn('npx', ['vite', '--host', '127.0.0.1'], {
    cwd: path.join(projectDir, 'ui'),
    stdio: 'inherit',
  }),
];
step('dev: UI on http://127.0.0.1:5173 (proxying /api to :3000); Ctrl-C stops everything');
process.on('SIGINT', async () => {
  for (const c of children) c.kill('SIGTERM');
  await cluster.stop();
  process.exit(0);
});
