import { existsSync, readdirSync, statSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { run } from './run.mjs';
import { step, fail } from './log.mjs';

function newestMtime(dir) {
  if (!existsSync(dir)) return 0;
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    if (entry.name === 'node_modules' || entry.name === 'dist') continue;
    const p = path.join(dir, entry.name);
    newest = Math.max(newest, entry.isDirectory() ? newestMtime(p) : statSync(p).mtimeMs);
  }
  return newest;
}

/** Compile calc → shared → print → db → server (incremental) and bundle the UI when its sources changed. */
export async function buildAll(projectDir) {
  step('compiling TypeScript (tsc -b)…');
  try {
    await run('npx', ['tsc', '-b'], { cwd: projectDir });
  } catch (e) {
    fail(`the TypeScript build failed:\n${e.message}`);
  }
  const uiDir = path.join(projectDir, 'ui');
  const stampFile = path.join(uiDir, 'dist', '.holdfast-build-stamp');
  const stamp = String(
    Math.max(
      newestMtime(path.join(uiDir, 'src')),
      newestMtime(path.join(uiDir, 'public')),
      statSync(path.join(uiDir, 'index.html')).mtimeMs,
      statSync(path.join(uiDir, 'vite.config.ts')).mtimeMs,
      newestMtime(path.join(projectDir, 'calc', 'src')),
      newestMtime(path.join(projectDir, 'shared', 'src')),
    ),
  );
  if (existsSync(stampFile) && readFileSync(stampFile, 'utf8') === stamp) {
    step('UI bundle is up to date');
    return;
  }
  step('bundling the UI (vite build)…');
  try {
    await run('npx', ['vite', 'build', '--logLevel', 'warn'], { cwd: uiDir });
  } catch (e) {
    fail(`the UI build failed:\n${e.message}`);
  }
  writeFileSync(stampFile, stamp);
}
