export type * from './core/types.js';
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
export { toDisplay, displayUnitFor, type UnitSystem, type DisplayValue } from './units/display.js';
export { formatNumber, formatForDerivation } from './units/format.js';
export { DIMENSIONS, type UnitOption, type DimensionInfo } from './units/unit-table.js';
export { nearlyEqual } from './testing/expect-close.js';
export * as discSprings from './disc-springs/index.js';
export { discSpringStackSheet, evaluateDiscSpringStack } from './sheets/disc-spring-stack.js';
