/**
 * The public shapes of the calculation core. Everything that leaves calc (to shared, server, ui,
 * the PDF) is one of these. Values inside calc are SI; `unit` strings are mathjs unit text.
 */
import type { CONFIDENCE_LEVELS, DIMENSION_IDS, FIELD_CARD_GROUPS } from '../ids.js';
import type { FieldTolerance } from '../field/tolerance-types.js';

/** A physical quantity as a user typed it or as the core reports it, e.g. { value: 12, unit: 'kN' }. */
export interface Quantity {
  value: number;
  unit: string;
}

/** What an input field may hold: a quantity, a plain number (ratios, counts), text (choices) or a flag. */
export type InputValue = Quantity | number | string | boolean;

/** A sheet's inputs, keyed by the field keys of its sheet type. */
export type SheetInputs = Record<string, InputValue>;

/** Physical dimension of a field or result; decides which units are accepted and offered. */
export type Dimension = (typeof DIMENSION_IDS)[number];

/** One input field of a sheet type. */
export interface FieldDefinition {
  key: string;
  /** Section id the field is grouped under (e.g. 'duty', 'brake', 'lining'). */
  section: string;
  label: string;
  /** Symbol as printed in derivations, e.g. 'F_s'. */
  symbol: string;
  kind: 'quantity' | 'number' | 'integer' | 'choice' | 'boolean';
  dimension?: Dimension;
  /** Default SI and US customary display units for a quantity field. */
  unitSI?: string;
  unitUS?: string;
  /**
   * The value of the invented demo duty: shown in examples, the demo seed and a sheet started from
   * the example. Never used in place of a missing input.
   */
  demo: InputValue;
  /** A required field must be present in the inputs; a missing one is a CalcInputError for it. */
  required: boolean;
  /**
   * Key of a flag field: when set, this field is required only while that flag is true (the
   * geometry of a disc-spring stack the sheet leaves out, for example).
   */
  requiredIf?: string;
  /** Inclusive bounds in SI (for quantities) or plain (for numbers). */
  min?: number;
  max?: number;
  /** True when the lower bound itself is not allowed (strictly positive). */
  exclusiveMin?: boolean;
  choices?: { value: string; label: string }[];
  help?: string;
}

/** A section of a sheet type's inputs or results. */
export interface SectionDefinition {
  id: string;
  title: string;
}

/** One printed derivation step: the formula text and the substitution come from the same definition that computes the value. */
export interface DerivationStep {
  id: string;
  section: string;
  label: string;
  symbol: string;
  /** Formula in symbols, e.g. 'M_b = μ · N · D'. */
  formula: string;
  /** Formula with values and units substituted, e.g. 'M_b = 0.35 · 12.4 kN · 0.4 m'. */
  substituted: string;
  /** Result in SI. */
  value: number;
  /** SI unit of the result (mathjs text), '' for dimensionless. */
  unit: string;
  dimension: Dimension;
  /** Where the method comes from (book and edition, standard and clause), or 'definition'. */
  reference: string;
}

/** A result presented on the sheet (a subset of the derivation values, named). */
export interface ResultValue {
  key: string;
  section: string;
  label: string;
  symbol: string;
  value: number;
  unit: string;
  dimension: Dimension;
}

/** A pass/fail check against an acceptance criterion. */
export interface CheckResult {
  id: string;
  section: string;
  label: string;
  /** The computed value and the limit, both in SI `unit`. */
  value: number;
  limit: number;
  unit: string;
  dimension: Dimension;
  /** 'max': value must be ≤ limit; 'min': value must be ≥ limit. */
  kind: 'max' | 'min';
  /** value/limit for 'max', limit/value for 'min'; 1.0 = exactly at the limit; > 1 fails. */
  utilisation: number;
  pass: boolean;
  /** Where the limit comes from (criteria-set value source). */
  source: string;
  message: string;
}

export interface ChartSeries {
  name: string;
  points: { x: number; y: number }[];
}

/** Data for one chart, in SI; the presentation layer converts units. */
export interface ChartData {
  id: string;
  title: string;
  xLabel: string;
  xUnit: string;
  xDimension: Dimension;
  yLabel: string;
  yUnit: string;
  yDimension: Dimension;
  series: ChartSeries[];
  /** Marked points (e.g. the set point) and horizontal/vertical reference lines. */
  markers?: { label: string; x: number; y: number }[];
  referenceLines?: { label: string; axis: 'x' | 'y'; value: number }[];
}

/** Field settings handed to the field team (spring length, strokes, back-off angles…). */
export interface FieldSetting {
  key: string;
  label: string;
  value: number;
  unit: string;
  dimension: Dimension;
  note?: string;
  /**
   * The tolerance this sheet's inputs set for the setting (a declared back-off tolerance), which
   * replaces the one its field card declares; absent: the card's (see `settingTolerance`).
   */
  tolerance?: FieldTolerance;
  /**
   * How far lining wear may move the value between visits before work is due: the reserve stroke
   * down to its minimum; with no lift stop, the working stroke and the clearance up to what they
   * are at that minimum. A reading as found is judged against it; the tolerance applies as left.
   */
  inService?: { kind: 'atLeast' | 'atMost'; value: number; label: string };
}

/** One input as the core used it: what was entered, and its value in SI. */
export interface ResolvedInput {
  key: string;
  /** The value exactly as entered (quantity with its unit, number, choice value or flag). */
  entered: InputValue;
  /** SI value for quantities and numbers, the choice value or the flag otherwise. */
  si: number | string | boolean;
  /** SI unit (mathjs text) of `si` for quantities, '' otherwise. */
  siUnit: string;
}

/** The complete outcome of evaluating one sheet. */
export interface SheetEvaluation {
  sheetType: string;
  coreVersion: string;
  criteriaSetId: string;
  criteriaSetVersion: number;
  results: ResultValue[];
  checks: CheckResult[];
  derivation: DerivationStep[];
  charts: ChartData[];
  fieldSettings: FieldSetting[];
  /** Tables for the field team, e.g. the spring setting table. */
  tables: {
    id: string;
    title: string;
    columns: { key: string; label: string; unit: string; dimension: Dimension }[];
    rows: Record<string, number>[];
  }[];
  warnings: string[];
  /** True when every check passes. */
  pass: boolean;
  /**
   * Each setting table checked row by row against the whole sheet (see sheets/setting-band.ts).
   * Not set by `evaluate` (it evaluates the sheet once per row); attached by the server to the
   * evaluation it stores. Absent on evaluations stored before it was kept.
   */
  settingBands?: SettingBand[];
  /**
   * Keys of the criteria-set values this evaluation read, in the set's order: the printed sheet
   * lists these and not the set's other values. Absent on evaluations stored before it was kept.
   */
  criteriaUsed?: string[];
  /**
   * The inputs the core used, as entered and in SI, in the sheet's field order. Not set by
   * `evaluate` (a live evaluation has the inputs beside it); attached to the frozen record when a
   * revision is submitted, so the record and its printout show exactly what was calculated.
   */
  resolvedInputs?: ResolvedInput[];
}

/** A setting table's rows checked against every check of the sheet. */
export interface SettingBand {
  /** The table, e.g. 'spring-setting'. */
  tableId: string;
  /** The setting the sheet is worked out for (SI, as the table's first column). */
  set: number;
  /** Per row of the table, in order: labels of the checks that fail with the sheet set to that row. */
  failing: string[][];
  /**
   * Around the set value, the lowest and highest setting at which no check fails that passes at
   * the set value (found to within 0.1 % of it), and the checks that end the band there; null
   * where the band runs to the end of the table (the torque and adjustable-range limits).
   */
  low: number;
  high: number;
  lowLimitedBy: string[] | null;
  highLimitedBy: string[] | null;
}

/** One value of an acceptance-criteria set, with where it comes from. */
export interface CriterionValue {
  key: string;
  label: string;
  value: number;
  unit: string;
  /** e.g. 'published: 29 CFR 1910.179(f)(2)', 'common practice', 'from memory — check the governing standard'. */
  source: string;
  confidence: (typeof CONFIDENCE_LEVELS)[number];
}

export interface CriteriaSet {
  id: string;
  version: number;
  name: string;
  description: string;
  values: CriterionValue[];
}

/** The block of the field setting card a field setting prints in. */
export type FieldCardGroup = (typeof FIELD_CARD_GROUPS)[number];

/** Where one field setting (by its key) goes on the field card, and what it is there. */
export interface FieldCardPlacement {
  group: FieldCardGroup;
  /** For a disc-spring stack: the stack's name as printed, e.g. 'Shoe holder'. */
  stack?: string;
  /** For a disc-spring stack: the back-off angle and the preload get their own places. */
  role?: 'backOff' | 'preload';
  /** The band the measured value must lie in, with its source; absent for a derived value. */
  tolerance?: FieldTolerance;
}

/** The field setting card of a sheet type, declared with the sheet (never guessed from labels). */
export interface FieldCardLayout {
  /** Placement of each field setting key the sheet produces; a key not listed prints under 'other'. */
  settings: Readonly<Record<string, FieldCardPlacement>>;
  /** Tables that print in the spring block (setting tables); the others print after it. */
  springTables: readonly string[];
}

/** A sheet type: its fields, sections and the one evaluate(). */
export interface SheetTypeDefinition<Id extends string = string> {
  id: Id;
  title: string;
  description: string;
  sections: SectionDefinition[];
  fields: readonly FieldDefinition[];
  fieldCard: FieldCardLayout;
  /** Throws CalcInputError (with field errors) on invalid input. */
  evaluate(inputs: SheetInputs, criteria: CriteriaSet): SheetEvaluation;
}

/** A field-level problem with an input. */
export interface FieldError {
  field: string;
  message: string;
}

/** What the brake acts on: a drum-brake card never speaks of discs, a caliper card of drums. */
export type BrakeRotor = 'drum' | 'disc';
