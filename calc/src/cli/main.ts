#!/usr/bin/env node
/**
 * holdfast-calc: evaluate one sheet from a JSON file of inputs (or stdin) and print the full
 * evaluation as JSON. Exit codes: 0 evaluated (check `pass` for the verdict), 2 bad input or usage.
 *
 *   npm run calc -- hoist-shoe-brake inputs.json [--criteria crane-hoist]
 *   cat inputs.json | npm run calc -- travel-shoe-brake -
 *   npm run calc -- hoist-shoe-brake --demo > my-hoist.json   (the demo duty, to edit)
 *
 * Every required field must be present and every key must be a field of the sheet type: a missing
 * field or a misspelt key is refused (exit 2, naming each), never replaced by a value of the core.
 * A relative inputs path is taken from the directory the command was run in (INIT_CWD under npm,
 * which starts scripts in the workspace folder).
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { isCalcInputError } from '../core/errors.js';
import { getCriteriaSet } from '../criteria/lookup.js';
import { demoInputs, getSheetType, sheetTypes } from '../sheets/registry.js';
import { unknownInputKeys } from '../sheets/sheet-inputs.js';
import { CORE_VERSION } from '../version.js';
import { DEFAULT_CRITERIA } from './default-criteria.js';

const USAGE = `usage: holdfast-calc <sheet-type> [inputs.json | -] [--criteria <id>]
       holdfast-calc <sheet-type> --demo     print the demo inputs (an invented duty) to start from
sheet types: ${sheetTypes.map((s) => s.id).join(', ')}
inputs: a JSON object with every field of the sheet type; '-' or no file reads stdin`;

function fail(message: string, fields?: readonly { field: string; message: string }[]): never {
  process.stderr.write(`${message}\n`);
  for (const f of fields ?? []) process.stderr.write(`  ${f.field}: ${f.message}\n`);
  process.stderr.write(
    `${JSON.stringify({ error: { code: fields ? 'CALC_INPUT' : 'USAGE', message, fields: fields ?? [] } })}\n`,
  );
  process.exit(2);
}

function parseArgs(argv: string[]): {
  sheet?: string;
  file?: string;
  criteria?: string;
  help: boolean;
  demo: boolean;
} {
  const out: { sheet?: string; file?: string; criteria?: string; help: boolean; demo: boolean } = {
    help: false,
    demo: false,
  };
  const rest: string[] = [];
  for (let k = 0; k < argv.length; k++) {
    const a = argv[k]!; // k < argv.length
    if (a === '--help' || a === '-h') out.help = true;
    else if (a === '--demo') out.demo = true;
    else if (a === '--criteria') {
      // A trailing --criteria would otherwise fall back to the sheet's default set unnoticed.
      out.criteria = argv[++k];
      if (out.criteria === undefined) fail(`--criteria needs a criteria set id\n${USAGE}`);
    } else if (a.startsWith('--criteria=')) out.criteria = a.slice('--criteria='.length);
    else rest.push(a);
  }
  [out.sheet, out.file] = rest;
  return out;
}

/** The inputs file against the directory the user ran the command from, not npm's workspace folder. */
function inputsPath(file: string): string {
  return path.resolve(process.env.INIT_CWD || process.cwd(), file);
}

function main(): void {
  const args = parseArgs(process.argv.slice(2));
  if (args.help) {
    process.stdout.write(`${USAGE}\n`);
    return;
  }
  if (!args.sheet) fail(`missing sheet type\n${USAGE}`);
  const sheet = getSheetType(args.sheet);
  if (!sheet) fail(`unknown sheet type "${args.sheet}"\n${USAGE}`);
  if (args.demo) {
    process.stdout.write(`${JSON.stringify(demoInputs(sheet), null, 2)}\n`);
    return;
  }
  const criteriaId = args.criteria ?? DEFAULT_CRITERIA[sheet.id] ?? 'general-industry';
  const criteria = getCriteriaSet(criteriaId);
  if (!criteria) fail(`unknown criteria set "${criteriaId}"`);
  let text: string;
  try {
    text = readFileSync(!args.file || args.file === '-' ? 0 : inputsPath(args.file), 'utf8');
  } catch (e) {
    fail(`cannot read inputs: ${(e as Error).message}`);
  }
  let inputs: unknown;
  try {
    inputs = text.trim() === '' ? {} : JSON.parse(text);
  } catch (e) {
    fail(`inputs are not valid JSON: ${(e as Error).message}`);
  }
  if (typeof inputs !== 'object' || inputs === null || Array.isArray(inputs))
    fail('inputs must be a JSON object keyed by field');
  const unknown = unknownInputKeys(sheet.fields, inputs as Record<string, never>);
  if (unknown.length) fail(`unknown input keys for ${sheet.id}`, unknown);
  try {
    const evaluation = sheet.evaluate(inputs as Record<string, never>, criteria);
    process.stdout.write(
      `${JSON.stringify({ ...evaluation, coreVersion: CORE_VERSION }, null, 2)}\n`,
    );
  } catch (e) {
    if (isCalcInputError(e)) fail(`invalid input for ${sheet.id}`, e.fields);
    throw e;
  }
}

main();
