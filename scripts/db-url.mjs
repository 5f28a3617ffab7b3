// Prints a connection URL to a database in the throwaway test cluster (started if needed).
// Usage: node scripts/db-url.mjs <database> [--fresh]
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { startCluster } from './lib/postgres.mjs';

const projectDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const [db = 'holdfast_test', flag] = process.argv.slice(2);
const log = console.log;
console.log = () => {};
process.stdout.write = (
  (w) =>
  (chunk, ...rest) =>
    String(chunk).startsWith('[holdfast]') ? true : w(chunk, ...rest)
)(process.stdout.write.bind(process.stdout));
const cluster = await startCluster({
  projectDir,
  name: 'pg-test',
  port: Number(process.env.PGTESTPORT ?? 54329),
  durable: false,
});
await cluster.ensureDatabase(db, { fresh: flag === '--fresh' });
log(cluster.url(db));
