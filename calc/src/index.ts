export type * from './core/types.js';
export type * from './field/tolerance-types.js';
export {
  CalcInputError,
  isCalcInputError,
  FieldErrorCollector,
  requireField,
} from './core/errors.js';
export {
  defineFormula,
  Derivation,
  CalcDomainError,
  type Formula,
  type FormulaSpec,
  type SymbolSpec,
  type StepOptions,
} from './core/step.js';
export { CORE_VERSION } from './version.js';
export * from './units/quantities.js';
export { parseQuantity, parseQuantityText, requireRange } from './units/parse.js';
export {
  resolveUnit,
  toSI,
  fromSI,
  unitsFor,
  normaliseUnitText,
  type UnitConversion,
} from './units/conversion.js';
export {
  toDisplay,
  displayUnitFor,
  withUnit,
  type UnitSystem,
  type DisplayValue,
} from './units/display.js';
export { checkFigures } from './units/check-figures.js';
export { formatNumber, formatForDerivation, powerOfTen } from './units/format.js';
export {
  PRECISION,
  SETTING_PRECISION,
  settingPrecision,
  readingPrecision,
  formatWithPrecision,
  type Precision,
} from './units/precision.js';
export { DIMENSIONS, type UnitOption, type DimensionInfo } from './units/unit-table.js';
export * as discSprings from './disc-springs/index.js';
export { discSpringStackSheet, evaluateDiscSpringStack } from './sheets/disc-spring-stack.js';
export { compute } from './core/step.js';
export { REF } from './core/references.js';
export * from './duty/motor-torque.js';
export * from './duty/referral.js';
export * from './duty/hoist-load.js';
export * from './duty/inertia-sum.js';
export * from './duty/required-torque.js';
export * from './duty/drive-train-overload.js';
export * from './duty/load-consistency.js';
export * from './duty/redundancy.js';
export * from './levers/lever-strength.js';
export * from './shoe-brake/shoe-force.js';
export * from './shoe-brake/short-shoe.js';
export * from './shoe-brake/pivoted-shoe.js';
export * from './shoe-brake/general-shoe.js';
export * from './shoe-brake/worn-lining.js';
export * from './shoe-brake/lining-duty.js';
export * from './shoe-brake/travel-ratio.js';
export * from './disc-brake/caliper.js';
export * from './disc-brake/pad-duty.js';
export * from './band-brake/band.js';
export * from './energy/stop-energy.js';
export * from './energy/heat.js';
export * from './stopping/stopping.js';
export * from './stopping/limits.js';
export * from './stopping/speed-at-set.js';
export * from './stopping/overspeed.js';
export { limitCheck, type LimitCheck } from './core/limit-check.js';
export { checkDrivers, rankDrivers, type CheckDriver } from './sensitivity/check-drivers.js';
export * from './release/release.js';
export * from './release/stroke-wear.js';
export * from './shoe-brake/wear-limits.js';
export * from './spring-setting/setting-table.js';
export * from './helical-spring/formulas.js';
export * from './helical-spring/compression-spring.js';
export { LININGS, getLining, type LiningMaterial } from './criteria/linings.js';
export { CRITERIA_SETS, GENERAL_INDUSTRY, CRANE_HOIST, TRAVEL_DRIVE } from './criteria/sets.js';
export { getCriteriaSet, criterion, criterionIfSet } from './criteria/lookup.js';
export { criterionText } from './criteria/criterion-text.js';
export {
  CRITERION_SPECS,
  REQUIRED_CRITERIA,
  criterionSpec,
  criterionValueProblem,
  criteriaValueProblems,
  type CriterionSpec,
} from './criteria/catalogue.js';
export { sheetTypes, getSheetType, demoInputs, fieldStart } from './sheets/registry.js';
export { settingBands } from './sheets/setting-band.js';
export {
  bandOf,
  bandSentence,
  rowVerdict,
  settingTableTitle,
} from './sheets/setting-band-words.js';
export {
  settingTableRows,
  marksText,
  rowVerdictText,
  type SettingTableRow,
  type BandMark,
} from './sheets/setting-band-rows.js';
export { bandedTolerance, toleranceBeyondBand } from './sheets/setting-band-tolerance.js';
export { failAdvice } from './sheets/checks.js';
export { SHEET_TYPE_IDS, DIMENSION_IDS, type SheetTypeId } from './ids.js';
export {
  closestKey,
  isRequired,
  missingInputs,
  MISSING_MESSAGE,
  readInputs,
  resolveInputs,
  unknownInputKeys,
} from './sheets/sheet-inputs.js';
export type { InputsOf } from './sheets/field-builders.js';
export { hoistShoeBrakeSheet, evaluateHoistShoeBrake } from './sheets/hoist-shoe-brake.js';
export { travelShoeBrakeSheet, evaluateTravelShoeBrake } from './sheets/travel-shoe-brake.js';
export { driveShoeBrakeSheet, evaluateDriveShoeBrake } from './sheets/drive-shoe-brake.js';
export { caliperDiscBrakeSheet, evaluateCaliperDiscBrake } from './sheets/caliper-disc-brake.js';
export { makeCheck, type CheckSpec } from './sheets/checks.js';
export { isSafetyCaution, securingCaution } from './sheets/sheet-output.js';
export { rotorOf } from './sheets/brake-rotor.js';
export * from './field/wear-trend.js';
export * from './field/wear-series.js';
export { studentTQuantile, studentTCdf } from './field/student-t.js';
export {
  evaluateTolerance,
  toleranceBounds,
  settingsWithTolerance,
  settingTolerance,
  type ToleratedSetting,
} from './field/evaluate-tolerance.js';
export { toleranceText } from './field/tolerance-text.js';
export { acceptedRange, type AcceptedRange } from './field/accepted-range.js';
export * as fieldTolerances from './field/tolerances.js';
