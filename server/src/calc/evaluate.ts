import type { CriteriaSet, FieldError, SheetEvaluation, SheetInputs } from '@holdfast/calc';
import { badRequest } from '../common/errors/api-exception.js';
import {
  evaluateSheet,
  isCalcInputError,
  missingInputsOf,
  unknownInputsOf,
} from './calc-engine.js';

const pathOf = (field: string) => (/^(inputs|criteria)\./.test(field) ? field : `inputs.${field}`);
const toFields = (errors: readonly FieldError[]) =>
  errors.map((f) => ({ path: pathOf(f.field), message: f.message }));

/**
 * Evaluate with the calc core; its CalcInputError becomes a 400 naming `inputs.<field>`.
 * The client never supplies results: this is the only source of an evaluation.
 */
export function evaluateOrReject(
  sheetType: string,
  inputs: SheetInputs,
  criteria: CriteriaSet,
): SheetEvaluation {
  try {
    return evaluateSheet(sheetType, inputs, criteria);
  } catch (e) {
    if (isCalcInputError(e)) throw badRequest('Some inputs are not valid.', toFields(e.fields));
    throw e;
  }
}

/** A key the sheet type does not declare is a 400 naming it ("did you mean …" when close). */
export function rejectUnknownInputs(sheetType: string, inputs: SheetInputs): void {
  const unknown = unknownInputsOf(sheetType, inputs);
  if (unknown.length) {
    throw badRequest('Some inputs are not fields of this sheet type.', toFields(unknown));
  }
}

/**
 * Submit: every required field present and every key known, else a 400 listing each; then the
 * full evaluation (a present but invalid value is a 400 as well).
 */
export function evaluateCompleteOrReject(
  sheetType: string,
  inputs: SheetInputs,
  criteria: CriteriaSet,
): SheetEvaluation {
  rejectUnknownInputs(sheetType, inputs);
  const missing = missingInputsOf(sheetType, inputs);
  if (missing.length) {
    throw badRequest(
      `${missing.length} required input(s) are missing: enter them before submitting.`,
      toFields(missing),
    );
  }
  return evaluateOrReject(sheetType, inputs, criteria);
}

/**
 * Draft save: a draft may still lack fields, so it is evaluated as a preview only when complete
 * (null otherwise); a present value that is invalid is still a 400 naming it.
 */
export function previewOrReject(
  sheetType: string,
  inputs: SheetInputs,
  criteria: CriteriaSet,
): SheetEvaluation | null {
  const missing = new Set(missingInputsOf(sheetType, inputs).map((f) => f.field));
  try {
    return evaluateSheet(sheetType, inputs, criteria);
  } catch (e) {
    if (!isCalcInputError(e)) throw e;
    const invalid = e.fields.filter((f) => !missing.has(f.field));
    if (invalid.length) throw badRequest('Some inputs are not valid.', toFields(invalid));
    return null;
  }
}
