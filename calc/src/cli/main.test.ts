import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { CORE_VERSION } from '../version.js';

// Runs the built CLI (dist): build with `npx tsc -b` before the tests.
const CLI = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../dist/cli/main.js');
const run = (args: string[], input?: string) =>
  spawnSync(process.execPath, [CLI, ...args], { input, encoding: 'utf8' });

// Each spawn loads mathjs; on a busy machine that takes seconds, hence the long timeouts.
describe('holdfast-calc CLI', { timeout: 120_000 }, () => {
  it('evaluates a sheet from stdin and prints the evaluation with the core version', () => {
    const r = run(['hoist-shoe-brake', '-'], JSON.stringify({ load: '8 t' }));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.coreVersion).toBe(CORE_VERSION);
    expect(out.sheetType).toBe('hoist-shoe-brake');
    expect(out.criteriaSetId).toBe('crane-hoist');
    expect(out.derivation.length).toBeGreaterThan(50);
    expect(out.checks.length).toBeGreaterThan(10);
  });

  it('takes --criteria', () => {
    const r = run(['hoist-shoe-brake', '-', '--criteria', 'general-industry'], '{}');
    expect(r.status).toBe(0);
    expect(JSON.parse(r.stdout).criteriaSetId).toBe('general-industry');
  });

  it('prints field errors to stderr and exits 2 on bad input', () => {
    const r = run(['travel-shoe-brake', '-'], JSON.stringify({ travelSpeed: '40 kg', muMin: 2 }));
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/travelSpeed/);
    expect(r.stderr).toMatch(/muMin/);
  });

  it('exits 2 on an unknown sheet type or bad JSON', () => {
    expect(run(['no-such-sheet', '-'], '{}').status).toBe(2);
    expect(run(['caliper-disc-brake', '-'], '{not json').status).toBe(2);
  });
});
