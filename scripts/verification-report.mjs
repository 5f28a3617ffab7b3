#!/usr/bin/env node
// Regenerates docs/verification-report.md: runs every verification case through the calculation
// core (verification/report.test.ts renders and writes the report). Usage: node scripts/verification-report.mjs
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const run = (args) => {
  const r = spawnSync('npx', args, {
    cwd: root,
    stdio: 'inherit',
    shell: process.platform === 'win32',
  });
  if (r.status !== 0) process.exit(r.status ?? 1);
};
run(['tsc', '-b']);
run(['vitest', 'run', '--project', 'verification', 'verification/report.test.ts']);
console.log('docs/verification-report.md written');
