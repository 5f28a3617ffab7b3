import {
  evaluateTolerance,
  getSheetType,
  parseQuantity,
  rotorOf,
  bandedTolerance,
  type Dimension,
  type FieldSetting,
  type InputValue,
  type SheetEvaluation,
} from '@holdfast/calc';
import type {
  FieldCheckKey,
  FieldMeasurement,
  FieldMeasurementInput,
  FieldTarget,
} from '@holdfast/shared';
import { fieldCheckKeys, fieldCheckKeysWithValue } from '@holdfast/shared';

const DRUM_CHECK_LABELS: Record<FieldCheckKey, string> = {
  'no-drag-shoe-a': 'No drag on shoe A when released',
  'no-drag-shoe-b': 'No drag on shoe B when released',
  'set-release-cycles': 'Set/release cycles repeated and re-measured',
  'thruster-condition': 'Thruster condition (oil, seals, stroke free)',
  'linkage-condition': 'Linkage condition (pins, bushes, wear)',
  'lining-thickness-shoe-a': 'Lining thickness, shoe A',
  'lining-thickness-shoe-b': 'Lining thickness, shoe B',
};

// A caliper's two pads take the places of shoes A and B; its release unit may be a thruster or
// a hydraulic unit, so the item names neither. The keys stay: they are stored identifiers.
const DISC_CHECK_LABELS: Record<FieldCheckKey, string> = {
  'no-drag-shoe-a': 'No drag on pad A when released',
  'no-drag-shoe-b': 'No drag on pad B when released',
  'set-release-cycles': 'Set/release cycles repeated and re-measured',
  'thruster-condition': 'Release unit condition (oil, seals, stroke free)',
  'linkage-condition': 'Caliper condition (pins, guides, levers, wear)',
  'lining-thickness-shoe-a': 'Lining thickness, pad A',
  'lining-thickness-shoe-b': 'Lining thickness, pad B',
};

/**
 * Labels of the explicit check items of a sheet type, as the record form (through the field-form
 * API, the UI's only source of them) and the printed record show them.
 */
export function checkLabels(sheetType: string): Readonly<Record<FieldCheckKey, string>> {
  return rotorOf(sheetType) === 'disc' ? DISC_CHECK_LABELS : DRUM_CHECK_LABELS;
}

/** The input that holds the minimum of each measured check, where a sheet type declares one. */
const CHECK_MINIMUM_INPUT: Partial<Record<FieldCheckKey, string>> = {
  'lining-thickness-shoe-a': 'liningMinThickness',
  'lining-thickness-shoe-b': 'liningMinThickness',
};

/** A revision's minimum for a check in SI (m), or null when its sheet type has no such input. */
function checkMinimum(sheetType: string, inputs: unknown, key: FieldCheckKey): number | null {
  const field = CHECK_MINIMUM_INPUT[key];
  if (!field) return null;
  const def = getSheetType(sheetType)?.fields.find((f) => f.key === field);
  const value = (inputs as Record<string, InputValue> | null)?.[field];
  if (!def || def.kind !== 'quantity' || !def.dimension || value === undefined) return null;
  try {
    return parseQuantity(value, def.dimension, def.key);
  } catch {
    return null; // an approved revision's inputs parse; an old one that does not shows no minimum
  }
}

/**
 * The check items of the record form of a revision: their labels, whether they take a value, and
 * the sheet's minimum for it (the wear trend on the position's page runs to it).
 */
export function formChecks(sheetType: string, inputs: unknown = null) {
  const labels = checkLabels(sheetType);
  return fieldCheckKeys.map((key) => ({
    key,
    label: labels[key],
    hasValue: fieldCheckKeysWithValue.includes(key),
    minimum: checkMinimum(sheetType, inputs, key),
  }));
}

/** The field card's targets of a frozen evaluation, each with the tolerance its sheet declares. */
export function fieldTargets(sheetType: string, evaluation: unknown): FieldTarget[] {
  const e = (evaluation ?? {}) as Partial<SheetEvaluation>;
  const settings = e.fieldSettings ?? [];
  // What bandedTolerance reads of the frozen record; a record stored before bands were kept has none.
  const frozen = {
    fieldSettings: settings,
    checks: e.checks ?? [],
    tables: e.tables ?? [],
    ...(e.settingBands ? { settingBands: e.settingBands } : {}),
  };
  const card = getSheetType(sheetType)?.fieldCard;
  return settings.map((s: FieldSetting) => {
    const p = card?.settings[s.key];
    const inService = inServiceLimit(s);
    return {
      settingKey: s.key,
      label: s.label,
      value: s.value,
      unit: s.unit,
      dimension: s.dimension,
      group: p?.group ?? 'other',
      ...(p?.stack ? { stack: p.stack } : {}),
      ...(p?.role ? { role: p.role } : {}),
      ...(s.note ? { note: s.note } : {}),
      // Held inside the band where every check of the sheet passes (calc's bandedTolerance).
      tolerance: bandedTolerance(s, card, frozen),
      ...(inService ? { inService } : {}),
    };
  });
}

/**
 * The in-service limit of a setting, where the sheet gives one (calc's `inService`): a reserve
 * stroke found at 16 mm on an inspection is wear, not a fault, while it stays above the minimum
 * (5 mm on the demo hoist); with no lift stop the clearance grows as the reserve shrinks.
 */
function inServiceLimit(s: FieldSetting): FieldTarget['inService'] {
  if (!s.inService) return undefined;
  return {
    value: s.inService.value,
    label: s.inService.label,
    tolerance: {
      band: { kind: s.inService.kind },
      source: `in service: ${s.inService.label}`,
      confidence: 'common practice',
    },
  };
}

/** A stored measurement with its target and the verdicts on as found and as left. */
export function judgeMeasurement(
  m: FieldMeasurementInput,
  targets: ReadonlyMap<string, FieldTarget>,
): FieldMeasurement {
  const t = targets.get(m.settingKey);
  const judge = (
    v: number | null,
    basis: { value: number; tolerance: FieldTarget['tolerance'] } | undefined = t,
  ) =>
    v === null || !t || !basis?.tolerance
      ? null
      : evaluateTolerance(basis.value, v, basis.tolerance, t.dimension as Dimension);
  return {
    ...m,
    label: t?.label ?? m.settingKey,
    target: t?.value ?? null,
    unit: t?.unit ?? '',
    dimension: t?.dimension ?? '',
    tolerance: t?.tolerance ?? null,
    // As found against the in-service limit where there is one: wear is not a setting error.
    asFoundVerdict: judge(m.asFound, t?.inService ?? t),
    asLeftVerdict: judge(m.asLeft),
  };
}

/** Indexes of measurements whose as-left value is outside its tolerance. */
export function outOfToleranceAsLeft(measurements: FieldMeasurement[]): number[] {
  return measurements.flatMap((m, i) => (m.asLeftVerdict?.status === 'out' ? [i] : []));
}
