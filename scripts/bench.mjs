// `npm run bench`: build, then every vitest benchmark (calc sheets and sweeps, PDF rendering),
// then the medians the targets are stated in (scripts/bench-medians.mjs).
import path from 'node:path';
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { ensureNpmDependencies } from './lib/deps.mjs';
import { buildAll } from './lib/build.mjs';
import { SERVER_NODE_FLAGS } from './lib/app-server.mjs';

const projectDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
await ensureNpmDependencies(projectDir);
await buildAll(projectDir);
const r = spawnSync('npx', ['vitest', 'bench', '--run', ...process.argv.slice(2)], {
  cwd: projectDir,
  stdio: 'inherit',
});
if (r.status !== 0) process.exit(r.status ?? 1);
// The targets are medians, which vitest bench does not print: measure them separately.
// Same Node flags as the server, so the PDF figure is what a print request costs there.
const m = spawnSync(
  process.execPath,
  [...SERVER_NODE_FLAGS, path.join(projectDir, 'scripts/bench-medians.mjs')],
  { cwd: projectDir, stdio: 'inherit' },
);
process.exit(m.status ?? 1);
