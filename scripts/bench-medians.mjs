// Medians for the targets stated as medians (vitest bench prints mean and p75, not the median):
// full evaluation of each sheet type and the PDF of an approved hoist sheet. Run by
// `npm run bench` after the vitest benchmarks, on the built workspaces.
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

process.env.NODE_ENV = 'production';
const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const load = (rel) => import(pathToFileURL(path.join(root, rel)).href);

function summary(times) {
  const t = [...times].sort((a, b) => a - b);
  const at = (q) => t[Math.min(t.length - 1, Math.floor(q * t.length))];
  return { median: at(0.5), p10: at(0.1), p90: at(0.9), n: t.length };
}

const fmt = (ms) =>
  ms < 0.01
    ? `${(ms * 1000).toFixed(2)} µs`
    : ms < 10
      ? `${ms.toFixed(3)} ms`
      : `${ms.toFixed(0)} ms`;
const rows = [];

const calc = await load('calc/dist/index.js');
const criteria = calc.getCriteriaSet('general-industry');
for (const sheet of calc.sheetTypes) {
  const inputs = calc.demoInputs(sheet);
  for (let i = 0; i < 500; i++) sheet.evaluate(inputs, criteria);
  const times = [];
  for (let i = 0; i < 3000; i++) {
    const a = performance.now();
    sheet.evaluate(inputs, criteria);
    times.push(performance.now() - a);
  }
  rows.push([`full evaluation, ${sheet.id}`, summary(times), '≤ 0.5 ms']);
}

// Substituted lines and check messages are written when first read; this row reads every one, as
// saving a revision (JSON) or printing does.
{
  const sheet = calc.getSheetType('hoist-shoe-brake');
  const inputs = calc.demoInputs(sheet);
  const readAll = () => {
    const r = sheet.evaluate(inputs, criteria);
    let n = 0;
    for (const s of r.derivation) n += s.substituted.length;
    for (const c of r.checks) n += c.message.length;
    return n;
  };
  for (let i = 0; i < 500; i++) readAll();
  const times = [];
  for (let i = 0; i < 3000; i++) {
    const a = performance.now();
    readAll();
    times.push(performance.now() - a);
  }
  rows.push(['hoist evaluation, every line and message read', summary(times), '(no target)']);
}

// Values first against plain arithmetic (issue 14): the hoist sheet as the live editor and the
// sweeps use it (values, verdicts, margins; no line or message read), the same with every line
// and message read, and the same formulas in plain arithmetic (calc/src/bench/plain-hoist.ts).
// Each sample times a batch and divides, so the microsecond plain call is above the timer's grain.
{
  const { plainHoist, PLAIN_DEMO_HOIST } = await load('calc/dist/bench/plain-hoist.js');
  const sheet = calc.getSheetType('hoist-shoe-brake');
  const inputs = calc.demoInputs(sheet);
  let sink = 0;
  const batched = (batch, once) => {
    for (let i = 0; i < 2000; i++) once();
    const times = [];
    for (let i = 0; i < 4000; i++) {
      const a = performance.now();
      for (let k = 0; k < batch; k++) once();
      times.push((performance.now() - a) / batch);
    }
    return summary(times);
  };
  const plain = batched(200, () => {
    sink += plainHoist(PLAIN_DEMO_HOIST).stoppingDistance;
  });
  const valuesFirst = batched(4, () => {
    const r = sheet.evaluate(inputs, criteria);
    for (const c of r.checks) sink += c.utilisation;
    for (const v of r.results) sink += v.value;
  });
  const full = batched(4, () => {
    const r = sheet.evaluate(inputs, criteria);
    for (const s of r.derivation) sink += s.substituted.length;
    for (const c of r.checks) sink += c.message.length;
  });
  if (!Number.isFinite(sink)) throw new Error('benchmark sink is not finite');
  rows.push(['hoist, plain arithmetic (benchmark only)', plain, '(reference)']);
  rows.push(['hoist, values first (live editing, sweeps)', valuesFirst, '≤ 20 × plain']);
  rows.push(['hoist, full (every line and message read)', full, '(no target)']);
  rows.push([
    `hoist, values first ÷ plain = ${(valuesFirst.median / plain.median).toFixed(0)} ×`,
    null,
    '≤ 20 ×',
  ]);
}

const render = await load('print/dist/render.js');
const { hoistRevisionVariants } = await load('print/dist/testing/real-sheet.js');
await render.warmUpPdfRenderer();
// A different revision each time (load and spring force vary), so every render shapes new numbers.
const sheets = hoistRevisionVariants(12);
for (let i = 0; i < 2; i++) await render.renderSheetPdf(sheets[i]);
const pdfTimes = [];
let pages = 0;
for (let i = 0; i < 15; i++) {
  const a = performance.now();
  const r = await render.renderSheet(sheets[i % sheets.length]);
  pdfTimes.push(performance.now() - a);
  if (r.mode !== 'planned')
    throw new Error(`PDF fell back to ${r.mode} (pages ${r.overflowPages})`);
  pages = Number(/\/Type \/Pages[^>]*\/Count (\d+)/.exec(r.pdf.toString('latin1'))?.[1] ?? 0);
}
rows.push([`PDF, approved hoist sheet (${pages || '?'} pages), A4`, summary(pdfTimes), '≤ 1 s']);

console.log('\nMedians (p10 … p90, n runs)');
for (const [name, s, target] of rows) {
  if (s === null) {
    console.log(`  ${name.padEnd(52)} target ${target}`);
    continue;
  }
  console.log(
    `  ${name.padEnd(52)} median ${fmt(s.median).padStart(9)}  (${fmt(s.p10)} … ${fmt(s.p90)}, n=${s.n})  target ${target}`,
  );
}
