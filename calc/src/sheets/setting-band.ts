import type {
  CriteriaSet,
  SettingBand,
  SheetEvaluation,
  SheetInputs,
  SheetTypeDefinition,
} from '../core/types.js';
import { isCalcInputError } from '../core/errors.js';
import { CalcDomainError } from '../core/step.js';

/**
 * The setting tables and the input each row stands for. A table's rows are worked out from the
 * torque limits alone; the other checks (lining pressure and p·v, thruster force, wheel grip, the
 * stop, spring and lever stresses) hold at the set value only, so each row, and the band around
 * the set value, is found here by evaluating the whole sheet with the input set to that value.
 */
const SETTING_TABLES: Record<string, { input: string; column: string; unit: string }> = {
  'spring-setting': { input: 'springForce', column: 'springForce', unit: 'N' },
  'clamp-setting': { input: 'clampForce', column: 'clampForce', unit: 'N' },
};

/** How closely the band's ends are found, as a share of the set value. */
const RESOLUTION = 0.001;

/** A check's id and label, failing at some setting. */
type Failure = { id: string; label: string };

/** Every setting table of an evaluation checked row by row, and the band around the set value. */
export function settingBands(
  sheet: SheetTypeDefinition,
  inputs: SheetInputs,
  criteria: CriteriaSet,
  evaluation: SheetEvaluation,
): SettingBand[] {
  const bands: SettingBand[] = [];
  for (const table of evaluation.tables) {
    const spec = SETTING_TABLES[table.id];
    if (!spec || table.rows.length === 0) continue;
    const at = (value: number) => failingAt(sheet, inputs, criteria, spec, value);
    const settings = table.rows.map((row) => row[spec.column] ?? Number.NaN);
    const set = setValueOf(evaluation, spec.column);
    if (set === undefined) continue;
    // Checks already failing at the set value (submitted with a justification) do not end the band.
    const known = new Set(at(set).map((f) => f.id));
    const fresh = (fs: Failure[]) => fs.filter((f) => !known.has(f.id));
    const edge = (end: number) => {
      const beyond = fresh(at(end));
      if (beyond.length === 0) return { value: end, limitedBy: null };
      let inside = set;
      let outside = end;
      let limitedBy = beyond;
      while (Math.abs(outside - inside) > RESOLUTION * set) {
        const mid = (inside + outside) / 2;
        const f = fresh(at(mid));
        if (f.length === 0) inside = mid;
        else [outside, limitedBy] = [mid, f];
      }
      return { value: inside, limitedBy: limitedBy.map((f) => f.label) };
    };
    const low = edge(Math.min(set, ...settings));
    const high = edge(Math.max(set, ...settings));
    bands.push({
      tableId: table.id,
      set,
      failing: settings.map((value) => at(value).map((f) => f.label)),
      low: low.value,
      high: high.value,
      lowLimitedBy: low.limitedBy,
      highLimitedBy: high.limitedBy,
    });
  }
  return bands;
}

/** The set value of a setting table's input, from the evaluation's field settings (SI). */
function setValueOf(evaluation: SheetEvaluation, key: string): number | undefined {
  return evaluation.fieldSettings.find((f) => f.key === key)?.value;
}

function failingAt(
  sheet: SheetTypeDefinition,
  inputs: SheetInputs,
  criteria: CriteriaSet,
  spec: { input: string; unit: string },
  value: number,
): Failure[] {
  try {
    const ev = sheet.evaluate({ ...inputs, [spec.input]: { value, unit: spec.unit } }, criteria);
    return ev.checks.filter((c) => !c.pass).map((c) => ({ id: c.id, label: c.label }));
  } catch (e) {
    // A setting the sheet refuses (a cross-field rule) is not a setting to use either.
    if (isCalcInputError(e)) {
      return e.fields.map((f) => ({ id: `input:${f.field}`, label: `refused: ${f.message}` }));
    }
    if (e instanceof CalcDomainError) return [{ id: 'domain', label: 'cannot be worked out' }];
    throw e;
  }
}
