#!/usr/bin/env node
/**
 * Regenerates the generated parts of docs/calc-reference.md (sheet inputs, formula list, criteria)
 * from the code, between the markers <!-- generated:start --> and <!-- generated:end -->.
 * Usage: node calc/dist/cli/gen-reference.js docs/calc-reference.md
 */
import { readFileSync, writeFileSync } from 'node:fs';
import * as core from '../index.js';
import type { Dimension } from '../core/types.js';
import { sheetTypes } from '../sheets/registry.js';
import { CRITERIA_SETS } from '../criteria/sets.js';
import {
  criteriaMarkdown,
  formulasMarkdown,
  sheetInputsMarkdown,
} from '../docs/reference-markdown.js';

type AnyFormula = {
  spec: { id: string; dimension: Dimension; reference: string };
  text: string;
  evaluate: unknown;
};
const isFormula = (x: unknown): x is AnyFormula =>
  typeof x === 'object' && x !== null && 'spec' in x && 'text' in x && 'evaluate' in x;

const formulas: AnyFormula[] = (Object.values(core) as unknown[]).filter(isFormula);
const generated = [
  '<!-- generated:start -->',
  '## Sheet types: inputs',
  '',
  ...sheetTypes.map(sheetInputsMarkdown),
  '## Formula definitions',
  '',
  'Every step printed on a sheet comes from one of these definitions (disc-spring formulas: see docs/formulas/disc-springs.md). The printed formula and the substituted line are generated from the same expression that computes the value.',
  '',
  formulasMarkdown(formulas),
  '',
  '## Criteria sets',
  '',
  criteriaMarkdown(CRITERIA_SETS),
  '<!-- generated:end -->',
].join('\n');

const file = process.argv[2] ?? 'docs/calc-reference.md';
const text = readFileSync(file, 'utf8');
const start = text.indexOf('<!-- generated:start -->');
const end = text.indexOf('<!-- generated:end -->');
if (start < 0 || end < 0) throw new Error(`${file}: generated markers not found`);
writeFileSync(
  file,
  text.slice(0, start) + generated + text.slice(end + '<!-- generated:end -->'.length),
);
process.stdout.write(
  `updated ${file}: ${sheetTypes.length} sheet types, ${formulas.length} formulas\n`,
);
