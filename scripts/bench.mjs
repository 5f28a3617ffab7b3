// `npm run bench`: build, then every vitest benchmark (calc sheets and sweeps, PDF rendering).
import path from 'node:path';
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { ensureNpmDependencies } from './lib/deps.mjs';
import { buildAll } from './lib/build.mjs';

const projectDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
await ensureNpmDependencies(projectDir);
await buildAll(projectDir);
const r = spawnSync('npx', ['vitest', 'bench', '--run', ...process.argv.slice(2)], {
  cwd: projectDir,
  stdio: 'inherit',
});
process.exit(r.status ?? 1);
