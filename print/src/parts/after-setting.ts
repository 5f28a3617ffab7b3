import { toSI, type CheckResult, type SheetEvaluation } from '@holdfast/calc';
import { qty } from '../format.js';
import type { PrintableSheet } from '../printable-sheet.js';
import { rotorOf } from './caution.js';

/** 1.25 × rated load: the static test load of a crane hoist (common practice, from memory). */
const STATIC_TEST_FACTOR = 1.25;

/** An input of the sheet in SI, or null where the sheet has none (or it does not read). */
function inputSI(sheet: PrintableSheet, key: string, dimension: 'length' | 'mass'): number | null {
  const v = sheet.inputs.find((i) => i.field.key === key)?.value;
  if (!v || typeof v !== 'object') return null;
  try {
    return toSI(v.value, v.unit, dimension);
  } catch {
    return null;
  }
}

/**
 * The wear limits a fitter checks on later visits, from the sheet's own inputs: the lining's
 * minimum thickness and the drum's smallest diameter (as drawn less the wear allowance).
 */
function wearLimitsLine(sheet: PrintableSheet): string | null {
  const lining = inputSI(sheet, 'liningMinThickness', 'length');
  const drum = inputSI(sheet, 'drumDiameter', 'length');
  const allowance = inputSI(sheet, 'drumWearAllowance', 'length');
  const parts: string[] = [];
  if (lining !== null)
    parts.push(
      `linings at least ${qty(lining, 'length', sheet.unitSystem)} thick (replace both shoes below it)`,
    );
  if (drum !== null && allowance !== null)
    parts.push(`drum diameter at least ${qty(drum - allowance, 'length', sheet.unitSystem)}`);
  return parts.length ? `Wear limits for later visits: ${parts.join('; ')}.` : null;
}

/** The hoist's static test load from the rated load on the sheet, or null for other drives. */
export function staticTestLoad(sheet: PrintableSheet): string | null {
  if (sheet.sheetType.id !== 'hoist-shoe-brake') return null;
  const rated = inputSI(sheet, 'load', 'mass');
  return rated === null ? null : qty(rated * STATIC_TEST_FACTOR, 'mass', sheet.unitSystem);
}

/**
 * What the fitter measures again after the set-and-release cycles and after running in: the
 * settings this card carries, and nothing it does not (a caliper has no spring length or reserve
 * stroke; a stack is measured by its length, its preload follows from it).
 */
function remeasured(ev: SheetEvaluation | null): string[] {
  const keys = (ev?.fieldSettings ?? []).map((f) => f.key);
  const has = (pattern: RegExp) => keys.some((k) => pattern.test(k));
  const items: [boolean, string][] = [
    [has(/^springLength$/), 'the spring length'],
    [has(/^reserveStroke$/), 'the reserve stroke'],
    [has(/^shoeClearance$/), 'the shoe clearance'],
    [has(/^airGap$/), 'the air gap'],
    // holderSetLength, equaliserSetLength on a shoe sheet; a.setLength on a stack sheet.
    [has(/setLength$/i), 'the disc-spring stack lengths'],
  ];
  return items.filter(([has]) => has).map(([, words]) => words);
}

/** 'a, b and c'. */
function listed(items: readonly string[]): string {
  return items.length < 2
    ? (items[0] ?? '')
    : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/** A figure a fitter compares a test with: three significant figures. */
const FIELD = { digits: 3 };

function checkOf(ev: SheetEvaluation | null, id: string): CheckResult | undefined {
  return ev?.checks.find((c) => c.id === id);
}

/**
 * The checks after setting, in the words of the brake at hand (drum or disc, hoist or not), with
 * the sheet's own figures where the fitter is asked to compare: the lining's temperature limit and
 * the allowed stopping distance.
 */
export function afterSettingLines(sheet: PrintableSheet): string[] {
  const rotor = rotorOf(sheet.sheetType.id);
  const ev = sheet.evaluation;
  const system = sheet.unitSystem;
  const rubbing =
    rotor === 'disc'
      ? 'no pad drags on the disc — check the air gap at both pads'
      : 'no shoe drags on the drum — check the clearance on both sides';
  const friction = rotor === 'disc' ? 'pad' : 'lining';
  const temperature = checkOf(ev, 'temperature-steady');
  // A stack sheet works out no stop and no heat; a brake sheet without the check (an older
  // evaluation) still asks for the reading, without figures.
  const measureHeat = ` After a few minutes running, stop the drive and measure the ${rotor} surface temperature with a surface thermometer; never touch it.`;
  const heat = temperature
    ? `${measureHeat} Stop and report a reading above the ${friction}'s limit of ${qty(temperature.limit, 'temperature', system)} (the sheet expects about ${qty(temperature.value, 'temperature', system)} in steady service).`
    : sheet.sheetType.id === 'disc-spring-stack'
      ? ''
      : measureHeat;
  const again = remeasured(ev);
  const stop = checkOf(ev, 'stopping-distance');
  const test = staticTestLoad(sheet);
  const lines = [`Released: ${rubbing}.${heat}`];
  if (again.length > 0)
    lines.push(
      `Set and release the brake at least five times, then measure ${listed(again)} again.`,
    );
  if (test) {
    lines.push(
      `Static test: each brake on its own holds the test load of ${test} (1.25 × rated load, common practice from memory; the governing standard names the value) lifted just clear of the ground.`,
    );
  } else if (stop) {
    lines.push(
      `Dynamic test: the brake stops the drive from rated speed with the rated load within ${qty(stop.limit, 'length', system, FIELD)} (the sheet works out ${qty(stop.value, 'length', system, FIELD)}), or the test the governing standard names.`,
    );
  }
  lines.push('Guards refitted, tools removed, limit switches and brake monitoring working.');
  const wear = wearLimitsLine(sheet);
  if (wear) lines.push(wear);
  if (again.length > 0)
    lines.push(
      `After running in (first shift, or the first few hundred operations): re-check ${listed(again)}.`,
    );
  return lines;
}
