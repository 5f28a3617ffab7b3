import type { EvalFunction } from 'mathjs';
import type { Dimension, DerivationStep } from './types.js';
import { math } from '../units/math.js';
import type { Q } from '../units/quantities.js';
import { formatInUnit, pickPrintUnit, printUnitsOf, type PrintUnits } from '../units/format.js';
import { DIMENSIONS } from '../units/unit-table.js';
import { renderPieces, symbolNames, type TextPiece } from './formula-text.js';
import { compileToClosure } from './closure-compiler.js';

/** A symbol of a formula: how it prints and what dimension its values have. */
export interface SymbolSpec {
  text: string;
  dimension: Dimension;
}

export interface FormulaSpec<S extends string, D extends Dimension> {
  /** Default step id, e.g. 'motor-torque'. */
  id: string;
  label: string;
  /** Printed result symbol, e.g. 'M_b'. */
  symbol: string;
  /** mathjs expression in SI values, e.g. 'mu * N * D'. */
  expression: string;
  symbols: Record<S, SymbolSpec>;
  dimension: D;
  reference: string;
}

/**
 * One formula defined once: the same parsed expression computes the value and prints the formula
 * text and the substitution, so they cannot drift apart. Expressions compile once when defined
 * (at module load), not per evaluation.
 */
export interface Formula<S extends string, D extends Dimension> {
  readonly spec: FormulaSpec<S, D>;
  /** e.g. 'M_b = μ · N · D'. */
  readonly text: string;
  /** The formula text with symbols printed by other names, e.g. F_s as F_s,w for the worn case. */
  textWith(symbol: string, names: Readonly<Partial<Record<S, string>>>): string;
  evaluate(values: Record<S, number>): Q<D>;
  /** e.g. 'M_b = 0.35 · 12.40 kN · 400.0 mm'; `symbol` replaces the result symbol. */
  substitute(values: Record<S, number>, symbol?: string): string;
}

const ALLOWED_FREE = new Set(['pi', 'e']);

/** A value placeholder of a formula's text, prepared for substitute(). */
interface ValueSlot {
  symbol: string;
  units: PrintUnits;
  /** Followed by a power (², ³, ^): a value with a unit is then wrapped in parentheses. */
  powered: boolean;
  /** Where substitute() keeps the printed value of a symbol used more than once, else −1. */
  memo: number;
}

/** Defines a formula; throws at load time if the expression uses an undeclared symbol. */
export function defineFormula<S extends string, D extends Dimension>(
  spec: FormulaSpec<S, D>,
): Formula<S, D> {
  const node = math.parse(spec.expression);
  const declared = new Set(Object.keys(spec.symbols));
  for (const name of symbolNames(node)) {
    if (!declared.has(name) && !ALLOWED_FREE.has(name)) {
      throw new Error(`formula ${spec.id}: symbol "${name}" is not declared`);
    }
  }
  const closure = compileToClosure(node, declared);
  const compiled: EvalFunction | undefined = closure ? undefined : node.compile();
  const pieces: TextPiece[] = renderPieces(node, declared);
  const symbols = spec.symbols as Record<string, SymbolSpec>;
  // What substitute() needs per value, worked out once here rather than per printed value.
  // A symbol used more than once gets a memo slot: substitute() prints its value once per call.
  const uses = new Map<string, number>();
  for (const p of pieces) {
    if (typeof p !== 'string') uses.set(p.symbol, (uses.get(p.symbol) ?? 0) + 1);
  }
  const memoIndex = new Map<string, number>();
  for (const [name, count] of uses) if (count > 1) memoIndex.set(name, memoIndex.size);
  const slots: (string | ValueSlot)[] = pieces.map((p, k) => {
    if (typeof p === 'string') return p;
    const next = pieces[k + 1];
    const symbolSpec = symbols[p.symbol];
    if (!symbolSpec) throw new Error(`formula ${spec.id}: symbol "${p.symbol}" has no spec`);
    return {
      symbol: p.symbol,
      units: printUnitsOf(symbolSpec.dimension),
      powered: typeof next === 'string' && /^[²³^]/.test(next),
      memo: memoIndex.get(p.symbol) ?? -1,
    };
  });
  const multiUnit = slots.some((p) => typeof p !== 'string' && p.units.length > 1);
  const prefix = `${spec.symbol} = `;
  const body = (names: Readonly<Record<string, string | undefined>>) =>
    pieces
      // Every piece's symbol has a spec: building the slots above checked it.
      .map((p) => (typeof p === 'string' ? p : (names[p.symbol] ?? symbols[p.symbol]!.text)))
      .join('');
  const text = prefix + body({});
  return {
    spec,
    text,
    textWith(symbol, names) {
      return `${symbol} = ${body(names)}`;
    },
    evaluate(values) {
      const scope = values as Record<string, number>;
      return (closure ? closure(scope) : compiled!.evaluate({ ...scope })) as Q<D>;
    },
    substitute(values, symbol) {
      let out = symbol === undefined ? prefix : `${symbol} = `;
      // A symbol used more than once (t five times in the disc-force formula) is printed once.
      const memo = memoIndex.size > 0 ? new Array<string>(memoIndex.size) : undefined;
      // One unit per dimension within a step (never 10.80 kN·m − 5999 N·m): the unit the
      // largest value of that dimension needs. Only dimensions with more than one print unit.
      // values[symbol]! below: Record<S, number> carries every declared symbol, and the slots
      // hold only declared ones (checked when the formula was defined).
      let largest: Map<PrintUnits, number> | undefined;
      if (multiUnit) {
        largest = new Map();
        for (const p of slots) {
          if (typeof p === 'string' || p.units.length < 2) continue;
          const v = Math.abs((values as Record<string, number>)[p.symbol]!);
          if (v > (largest.get(p.units) ?? -1)) largest.set(p.units, v);
        }
      }
      for (let k = 0; k < slots.length; k++) {
        const p = slots[k]!; // k < slots.length
        if (typeof p === 'string') {
          out += p;
          continue;
        }
        const v = (values as Record<string, number>)[p.symbol]!;
        const unit = pickPrintUnit(p.units, largest?.get(p.units) ?? v);
        const printed =
          p.memo < 0 ? formatInUnit(v, unit) : (memo![p.memo] ??= formatInUnit(v, unit));
        // (152.4 mm)², not 152.4 mm²: a power binds to the whole quantity, unit included.
        const wrap = v < 0 || (p.powered && printed.includes(' '));
        out += wrap ? `(${printed})` : printed;
      }
      return out;
    },
  };
}

/** Raised when a formula yields NaN or ±Infinity: a guard missed an input; never shown as a number. */
export class CalcDomainError extends Error {
  readonly code = 'CALC_DOMAIN' as const;
  constructor(
    readonly stepId: string,
    readonly values: Record<string, number>,
  ) {
    super(`step ${stepId} produced a non-finite value from ${JSON.stringify(values)}`);
    this.name = 'CalcDomainError';
  }
}

export interface StepOptions {
  id?: string;
  section?: string;
  label?: string;
  symbol?: string;
  /**
   * Symbols of the formula printed by another name in this step: the worn-lining step
   * substitutes the worn spring force, so it prints F_s,w where the formula says F_s.
   */
  names?: Readonly<Record<string, string>>;
  reference?: string;
}

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
 * Records derivation steps in order. `step()` computes a formula, checks the result is finite,
 * records the formula text, the substitution, the value and its SI unit, and returns the value.
 */
export class Derivation {
  readonly steps: DerivationStep[] = [];
  /**
   * The same steps by id, filled as they are recorded: it rejects duplicate ids, and lets
   * publishSteps and value() find a step without scanning or rebuilding an index per call.
   */
  private readonly byId = new Map<string, DerivationStep>();

  constructor(public section = 'general') {}

  // `options` has no `= {}` default: most steps pass none, and a sheet records ~100 steps per
  // evaluation, so an empty object per step is avoidable garbage.
  step<S extends string, D extends Dimension>(
    formula: Formula<S, D>,
    values: Record<S, number>,
    options?: StepOptions,
  ): Q<D> {
    const spec = formula.spec;
    const id = options?.id ?? spec.id;
    const value = formula.evaluate(values);
    if (!Number.isFinite(value)) throw new CalcDomainError(id, values);
    if (this.byId.has(id)) throw new Error(`derivation: duplicate step id ${id}`);
    const symbol = options?.symbol;
    const names = options?.names as Partial<Record<S, string>> | undefined;
    const formulaText = names
      ? formula.textWith(symbol ?? spec.symbol, names)
      : symbol
        ? symbol + formula.text.slice(spec.symbol.length)
        : formula.text;
    const step = {
      id,
      section: options?.section ?? this.section,
      label: options?.label ?? spec.label,
      symbol: symbol ?? spec.symbol,
      formula: formulaText,
      value,
      unit: DIMENSIONS[spec.dimension].siUnit,
      dimension: spec.dimension,
      reference: options?.reference ?? spec.reference,
      [PENDING]: { formula, values, symbol, text: undefined } as PendingText,
    } as unknown as DerivationStep;
    Object.defineProperty(step, 'substituted', SUBSTITUTED);
    this.steps.push(step);
    this.byId.set(id, step);
    return value;
  }

  /** The recorded step with this id, if any. */
  find(id: string): DerivationStep | undefined {
    return this.byId.get(id);
  }

  /** Looks up a recorded step value by id (throws if absent: a programming error). */
  value(id: string): number {
    const s = this.byId.get(id);
    if (!s) throw new Error(`derivation: no step ${id}`);
    return s.value;
  }
}

/**
 * Computes a formula, recording a step when a Derivation is given. Without one (sweeps, charts)
 * only the value is computed; a non-finite result throws CalcDomainError either way.
 */
export function compute<S extends string, D extends Dimension>(
  d: Derivation | undefined,
  formula: Formula<S, D>,
  values: Record<S, number>,
  options?: StepOptions,
): Q<D> {
  if (d) return d.step(formula, values, options);
  const value = formula.evaluate(values);
  if (!Number.isFinite(value)) throw new CalcDomainError(options?.id ?? formula.spec.id, values);
  return value;
}
