// Prints a connection URL to a database in the throwaway test cluster (started if needed).
// Usage: node scripts/db-url.mjs <database> [--fresh] [--role owner|app]
// Without --role the URL signs in as the cluster's superuser (the test suites create databases
// and reset tables with it); `owner` migrates and seeds, `app` is what the server signs in as.
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { startCluster } from './lib/postgres.mjs';

const projectDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const args = process.argv.slice(2);
const roleAt = args.indexOf('--role');
const role = roleAt >= 0 ? args.splice(roleAt, 2)[1] : undefined;
if (role !== undefined && role !== 'owner' && role !== 'app') {
  process.stderr.write('--role must be owner or app\n');
  process.exit(2);
}
const [db = 'holdfast_test', flag] = args;
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
log(cluster.url(db, role));
