import type { CriteriaSet, SheetEvaluation, SheetInputs } from '@holdfast/calc';
import { badRequest } from '../common/errors/api-exception.js';
import { evaluateSheet, isCalcInputError } from './calc-engine.js';

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
    if (isCalcInputError(e)) {
      throw badRequest(
        'Some inputs are not valid.',
        e.fields.map((f) => ({
          path: /^(inputs|criteria)\./.test(f.field) ? f.field : `inputs.${f.field}`,
          message: f.message,
        })),
      );
    }
    throw e;
  }
}
