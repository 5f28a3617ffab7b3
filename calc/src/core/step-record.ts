import type { Dimension, DerivationStep } from './types.js';
import { DIMENSIONS } from '../units/unit-table.js';
import type { Formula, StepOptions } from './step.js';

/** What a step needs to write its substituted line when it is first read. */
interface PendingText {
  formula: Formula<string, Dimension>;
  values: Record<string, number>;
  symbol: string | undefined;
  text: string | undefined;
}

// Symbol-keyed, so JSON.stringify and structured clone leave it out.
const PENDING = Symbol('pending substitution');

/**
 * The substituted line is written when first read (the sheet view, the printed sheet, JSON), not
 * when the step is recorded: a sheet records ~120 steps per keystroke and writing every line was
 * most of an evaluation's time, while the editor shows a few at once. An own enumerable accessor,
 * so spreading, JSON.stringify and structured clone all still see the text; one shared descriptor,
 * so every step has the same shape. `values` is the caller's fresh literal, never changed after.
 */
const SUBSTITUTED: PropertyDescriptor = {
  enumerable: true,
  configurable: true,
  get(this: { [PENDING]: PendingText }): string {
    const p = this[PENDING];
    if (p.text !== undefined) return p.text;
    const text = p.formula.substitute(p.values, p.symbol);
    // A caller that deep-freezes an evaluation freezes this record too: then write it each time.
    if (!Object.isFrozen(p)) p.text = text;
    return text;
  },
};

/**
 * What `step()` keeps of a step: the value and what is needed to write the printed step later.
 * A sheet records ~120 steps per keystroke and the editor's live results use only their values
 * (and a few published ones' labels): building every printed step object then was a large share
 * of an evaluation. The printed steps are built from these records when `steps` is first read.
 */
export class StepRecord {
  constructor(
    readonly id: string,
    readonly section: string,
    readonly formula: Formula<string, Dimension>,
    readonly values: Record<string, number>,
    readonly options: StepOptions | undefined,
    readonly value: number,
  ) {}

  get label(): string {
    return this.options?.label ?? this.formula.spec.label;
  }

  get symbol(): string {
    return this.options?.symbol ?? this.formula.spec.symbol;
  }
}

/** The printed step of a record: the object `steps` holds, its substituted line written when read. */
export function printedStep(r: StepRecord): DerivationStep {
  const { formula, options } = r;
  const spec = formula.spec;
  const symbol = options?.symbol;
  const names = options?.names;
  const formulaText = names
    ? formula.textWith(symbol ?? spec.symbol, names)
    : symbol
      ? symbol + formula.text.slice(spec.symbol.length)
      : formula.text;
  const step = {
    id: r.id,
    section: r.section,
    label: options?.label ?? spec.label,
    symbol: symbol ?? spec.symbol,
    formula: formulaText,
    value: r.value,
    unit: DIMENSIONS[spec.dimension].siUnit,
    dimension: spec.dimension,
    reference: options?.reference ?? spec.reference,
    [PENDING]: { formula, values: r.values, symbol, text: undefined } as PendingText,
  } as unknown as DerivationStep;
  Object.defineProperty(step, 'substituted', SUBSTITUTED);
  return step;
}
