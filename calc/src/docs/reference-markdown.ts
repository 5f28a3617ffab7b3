import type {
  CriteriaSet,
  Dimension,
  FieldDefinition,
  SheetTypeDefinition,
} from '../core/types.js';
import { fromSI } from '../units/conversion.js';
import { formatNumber } from '../units/format.js';
import { DIMENSIONS } from '../units/unit-table.js';
import { LININGS } from '../criteria/linings.js';

const esc = (s: string) => s.replace(/\|/g, '\\|');

function unitLabel(unit: string | undefined, f: FieldDefinition): string {
  if (!unit || !f.dimension) return '';
  return DIMENSIONS[f.dimension].units.find((u) => u.unit === unit)?.label ?? unit;
}

/** A bound as written in a table: up to 6 significant figures, no trailing zeros (0.1 kg, 3600). */
function boundNumber(v: number): string {
  return formatNumber(v, 6)
    .replace(/(\.\d*?)0+(?=$|×)/, '$1')
    .replace(/\.(?=$|×)/, '');
}

function bound(f: FieldDefinition, v: number | undefined): string {
  if (v === undefined) return '';
  if (f.kind !== 'quantity' || !f.dimension || !f.unitSI) return boundNumber(v);
  return `${boundNumber(fromSI(v, f.unitSI, f.dimension))} ${unitLabel(f.unitSI, f)}`;
}

function demoText(f: FieldDefinition): string {
  const d = f.demo;
  if (typeof d === 'object' && d !== null) return `${d.value} ${unitLabel(d.unit, f)}`;
  return String(d);
}

function requiredText(f: FieldDefinition): string {
  if (!f.required) return 'no';
  return f.requiredIf ? `when \`${f.requiredIf}\`` : 'yes';
}

function range(f: FieldDefinition): string {
  if (f.kind === 'choice') return (f.choices ?? []).map((c) => `\`${c.value}\``).join(', ');
  if (f.kind === 'boolean') return 'true / false';
  const lo = bound(f, f.min);
  const hi = bound(f, f.max);
  if (lo && hi) return `${f.exclusiveMin ? '>' : '≥'} ${lo}, ≤ ${hi}`;
  if (lo) return `${f.exclusiveMin ? '>' : '≥'} ${lo}`;
  if (hi) return `≤ ${hi}`;
  return '';
}

/** Markdown input table of one sheet type, generated from its field definitions. */
export function sheetInputsMarkdown(sheet: SheetTypeDefinition): string {
  const lines = [`### Inputs of \`${sheet.id}\` — ${sheet.title}`, '', sheet.description, ''];
  for (const section of sheet.sections) {
    const fields = sheet.fields.filter((f) => f.section === section.id);
    if (fields.length === 0) continue;
    lines.push(
      `**${section.title}** (\`${section.id}\`)`,
      '',
      '| key | label | symbol | SI unit | US unit | demo value | required | valid range |',
      '|---|---|---|---|---|---|---|---|',
    );
    for (const f of fields) {
      const label = f.help ? `${f.label} — ${f.help}` : f.label;
      lines.push(
        `| \`${f.key}\` | ${esc(label)} | ${esc(f.symbol)} | ${unitLabel(f.unitSI, f)} | ${unitLabel(f.unitUS, f)} | ${esc(demoText(f))} | ${requiredText(f)} | ${esc(range(f))} |`,
      );
    }
    lines.push('');
  }
  return lines.join('\n');
}

/** Markdown list of formula definitions: id, printed formula, result unit and reference. */
export function formulasMarkdown(
  formulas: readonly {
    spec: { id: string; dimension: Dimension; reference: string };
    text: string;
  }[],
): string {
  const lines = ['| id | formula | result unit | reference |', '|---|---|---|---|'];
  for (const f of formulas) {
    lines.push(
      `| \`${f.spec.id}\` | ${esc(f.text)} | ${DIMENSIONS[f.spec.dimension].siLabel || '—'} | ${esc(f.spec.reference)} |`,
    );
  }
  return lines.join('\n');
}

/** Markdown of the shipped criteria sets and the lining table. */
export function criteriaMarkdown(sets: readonly CriteriaSet[]): string {
  const lines: string[] = [];
  for (const s of sets) {
    lines.push(
      `### \`${s.id}\` — ${s.name} (version ${s.version})`,
      '',
      s.description,
      '',
      '| key | value | unit | source | confidence |',
      '|---|---|---|---|---|',
    );
    for (const v of s.values)
      lines.push(
        `| \`${v.key}\` | ${v.value} | ${v.unit || '—'} | ${esc(v.source)} | ${v.confidence} |`,
      );
    lines.push('');
  }
  lines.push(
    '### Lining table',
    '',
    '| id | material | μ typ. | max temp °C | max operating temp °C | working pressure kPa | max pressure MPa |',
    '|---|---|---|---|---|---|---|',
  );
  for (const l of LININGS) {
    lines.push(
      `| \`${l.id}\` | ${l.label} | ${l.muTypical} | ${(l.maxTemperature - 273.15).toFixed(0)} | ${(l.maxOperatingTemperature - 273.15).toFixed(0)} | ${l.workingPressureMin / 1e3}–${l.workingPressureMax / 1e3} | ${l.maxPressure / 1e6} |`,
    );
  }
  const source = LININGS[0]?.source;
  if (!source) throw new Error('the lining table is empty');
  lines.push('', `Source: ${source}.`);
  return lines.join('\n');
}
