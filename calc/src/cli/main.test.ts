import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { fileURLToPath } from 'node:url';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoInputs, getSheetType } from '../sheets/registry.js';
import { CORE_VERSION } from '../version.js';

const hoistDemo = demoInputs(getSheetType('hoist-shoe-brake')!);

// Runs the built CLI (dist): build with `npx tsc -b` before the tests.
const CLI = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../dist/cli/main.js');
const run = (args: string[], input?: string, env: Record<string, string> = {}) =>
  spawnSync(process.execPath, [CLI, ...args], {
    input,
    encoding: 'utf8',
    env: { ...process.env, INIT_CWD: '', ...env },
  });
const errorOf = (stderr: string) =>
  JSON.parse(stderr.trim().split('\n').at(-1)!) as {
    error: { code: string; fields: { field: string; message: string }[] };
  };

// Each spawn loads mathjs; on a busy machine that takes seconds, hence the long timeouts.
describe('holdfast-calc CLI', { timeout: 120_000 }, () => {
  it('evaluates a sheet from stdin and prints the evaluation with the core version', () => {
    const r = run(['hoist-shoe-brake', '-'], JSON.stringify({ ...hoistDemo, load: '8 t' }));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.coreVersion).toBe(CORE_VERSION);
    expect(out.sheetType).toBe('hoist-shoe-brake');
    expect(out.criteriaSetId).toBe('crane-hoist');
    expect(out.derivation.length).toBeGreaterThan(50);
    expect(out.checks.length).toBeGreaterThan(10);
  });

  it('a 10 s set delay evaluates (exit 0) with the motor overspeed check failing', () => {
    const r = run(
      ['hoist-shoe-brake', '-'],
      JSON.stringify({ ...hoistDemo, setDelay: { value: 10, unit: 's' } }),
    );
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.pass).toBe(false);
    const c = out.checks.find((x: { id: string }) => x.id === 'motor-overspeed');
    expect(c.pass).toBe(false);
  });

  it('takes --criteria', () => {
    const r = run(
      ['hoist-shoe-brake', '-', '--criteria', 'general-industry'],
      JSON.stringify(hoistDemo),
    );
    expect(r.status).toBe(0);
    expect(JSON.parse(r.stdout).criteriaSetId).toBe('general-industry');
  });

  it('refuses --criteria without a set id instead of using the default set', () => {
    const r = run(['hoist-shoe-brake', '-', '--criteria'], JSON.stringify(hoistDemo));
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(errorOf(r.stderr).error.code).toBe('USAGE');
  });

  it('prints field errors to stderr and exits 2 on bad input', () => {
    const r = run(['travel-shoe-brake', '-'], JSON.stringify({ travelSpeed: '40 kg', muMin: 2 }));
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/travelSpeed/);
    expect(r.stderr).toMatch(/muMin/);
  });

  it('refuses a left-out field and an unknown key, naming each, instead of evaluating', () => {
    const inputs: Record<string, unknown> = { ...hoistDemo, bogusField: 1, sprngRate: '40 N/mm' };
    delete inputs.load;
    delete inputs.springRate;
    const unknown = run(['hoist-shoe-brake', '-'], JSON.stringify(inputs));
    expect(unknown.status).toBe(2);
    expect(unknown.stdout).toBe('');
    const u = errorOf(unknown.stderr).error.fields;
    expect(u.map((f) => f.field).sort()).toEqual(['bogusField', 'sprngRate']);
    expect(u.find((f) => f.field === 'sprngRate')!.message).toMatch(/did you mean "springRate"/);
    expect(u.find((f) => f.field === 'bogusField')!.message).not.toMatch(/did you mean/);

    delete inputs.bogusField;
    delete inputs.sprngRate;
    const missing = run(['hoist-shoe-brake', '-'], JSON.stringify(inputs));
    expect(missing.status).toBe(2);
    expect(missing.stdout).toBe('');
    expect(errorOf(missing.stderr).error.fields).toEqual([
      { field: 'load', message: 'required: enter a value' },
      { field: 'springRate', message: 'required: enter a value' },
    ]);
  });

  it('prints the demo inputs, and reads a relative inputs path from the directory it was run in', () => {
    const demo = run(['hoist-shoe-brake', '--demo']);
    expect(demo.status).toBe(0);
    expect(JSON.parse(demo.stdout)).toEqual(hoistDemo);
    const dir = mkdtempSync(path.join(tmpdir(), 'holdfast-cli-'));
    writeFileSync(path.join(dir, 'duty.json'), demo.stdout);
    // npm starts the script in the workspace folder and says where the user was in INIT_CWD.
    const r = run(['hoist-shoe-brake', 'duty.json'], undefined, { INIT_CWD: dir });
    expect(r.status).toBe(0);
    expect(JSON.parse(r.stdout).sheetType).toBe('hoist-shoe-brake');
  });

  it('exits 2 on an unknown sheet type or bad JSON', () => {
    expect(run(['no-such-sheet', '-'], '{}').status).toBe(2);
    expect(run(['caliper-disc-brake', '-'], '{not json').status).toBe(2);
  });
});
