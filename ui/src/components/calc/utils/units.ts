import {
  displayUnitFor,
  formatNumber,
  fromSI,
  settingPrecision,
  toDisplay,
  toSI,
  unitsFor,
  type Dimension,
  type InputValue,
  type Quantity,
} from '@holdfast/calc';

export type UnitSystem = 'SI' | 'US';

/** One choice in a unit picker: parser text as value, printed form as label. */
export interface UnitChoice {
  value: string;
  label: string;
}

const choiceCache = new Map<Dimension, UnitChoice[]>();

/** Every unit offered for a dimension (both systems), SI first, as the calc core lists them. */
export function unitChoices(dimension: Dimension): UnitChoice[] {
  const hit = choiceCache.get(dimension);
  if (hit) return hit;
  const choices = unitsFor(dimension).map((o) => ({ value: o.unit, label: o.label || '—' }));
  choiceCache.set(dimension, choices);
  return choices;
}

/** Printed label of a unit's parser text, falling back to the text itself. */
export function unitLabel(dimension: Dimension, unit: string): string {
  return unitChoices(dimension).find((c) => c.value === unit)?.label ?? unit;
}

/** Default unit of a dimension in a unit system. */
export function defaultUnit(dimension: Dimension, system: UnitSystem): string {
  return displayUnitFor(dimension, system);
}

/** Rounds to significant figures so a converted value does not show float noise. */
export function roundSig(value: number, digits = 6): number {
  if (value === 0 || !Number.isFinite(value)) return value;
  return Number(value.toPrecision(digits));
}

/** Converts a quantity into another unit of the same dimension; undefined when it cannot. */
export function convertQuantity(
  q: Quantity,
  unit: string,
  dimension: Dimension,
): Quantity | undefined {
  try {
    return { value: roundSig(fromSI(toSI(q.value, q.unit, dimension), unit, dimension)), unit };
  } catch {
    return undefined;
  }
}

/** Presents an SI value in a unit system: number text and unit label separately. */
export function presentSI(
  valueSI: number,
  dimension: Dimension,
  system: UnitSystem,
  digits = 4,
): { number: string; unit: string; text: string } {
  try {
    const d = toDisplay(valueSI, dimension, system, undefined, digits);
    return { number: formatNumber(d.value, digits), unit: d.label, text: d.text };
  } catch {
    const number = formatNumber(valueSI, digits);
    return { number, unit: '', text: number };
  }
}

/**
 * An SI value as the printed sheet shows it: to the dimension's printing precision (calc's
 * PRECISION table), so a result or a step on screen reads as it does on paper (2730 N, 0.0794 MPa).
 */
export function presentPrinted(
  valueSI: number,
  dimension: Dimension,
  system: UnitSystem,
): { number: string; unit: string; text: string } {
  if (!Number.isFinite(valueSI)) return { number: '—', unit: '', text: '—' };
  const d = toDisplay(valueSI, dimension, system);
  return { number: d.number, unit: d.label, text: d.text };
}

/**
 * A field setting as the printed field card shows it: in the unit system, to the step a fitter
 * sets it by (calc's `settingPrecision`, the same function the card prints with), so the screen
 * and the card never disagree (a spring length of 0.2227 m reads 222.5 mm on both).
 */
export function presentSetting(
  valueSI: number,
  key: string,
  dimension: Dimension,
  system: UnitSystem,
): { number: string; unit: string; text: string } {
  if (!Number.isFinite(valueSI)) return { number: '—', unit: '', text: '—' };
  try {
    const d = toDisplay(valueSI, dimension, system, undefined, settingPrecision(key, dimension));
    return { number: d.number, unit: d.label, text: d.text };
  } catch {
    return presentSI(valueSI, dimension, system);
  }
}

export function isQuantity(v: InputValue | undefined): v is Quantity {
  return typeof v === 'object' && v !== null && 'value' in v && 'unit' in v;
}
