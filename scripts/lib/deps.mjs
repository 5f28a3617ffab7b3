import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { createHash } from 'node:crypto';
import path from 'node:path';
import { run } from './run.mjs';
import { step, fail } from './log.mjs';

/** `npm ci` when node_modules is missing or was installed from another package-lock.json. */
export async function ensureNpmDependencies(projectDir) {
  const lock = path.join(projectDir, 'package-lock.json');
  if (!existsSync(lock))
    fail('package-lock.json is missing; run this from a clone of the repository');
  const want = createHash('sha256').update(readFileSync(lock)).digest('hex');
  const stamp = path.join(projectDir, 'node_modules', '.holdfast-lock-sha256');
  if (existsSync(stamp) && readFileSync(stamp, 'utf8').trim() === want) return;
  step('installing npm dependencies (npm ci)…');
  const ci = () =>
    run('npm', ['ci', '--no-audit', '--no-fund', '--loglevel=error'], { cwd: projectDir });
  try {
    await ci();
  } catch {
    // A cache folder still being written (ENOTEMPTY) or a registry hiccup: one more try.
    step('npm ci failed once; trying again…');
    try {
      await ci();
    } catch (e) {
      fail(`npm ci failed: ${e.message}`);
    }
  }
  writeFileSync(stamp, want);
}
