import type { EvalFunction } from 'mathjs';
import type { Dimension, DerivationStep } from './types.js';
import { math } from '../units/math.js';
import type { Q } from '../units/quantities.js';
import { formatInUnit, pickPrintUnit, printUnitsOf, type PrintUnits } from '../units/format.js';
import { renderPieces, symbolNames, type TextPiece } from './formula-text.js';
import { compileToClosure } from './closure-compiler.js';
import { printedStep, StepRecord } from './step-record.js';

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
      powered: typeof next === 'string' && /^[²³⁴^]/.test(next),
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

/**
 * Records derivation steps in order. `step()` computes a formula, checks the result is finite and
 * returns the value; the printed step (formula text, substitution, SI unit) is built from the
 * record when `steps` or `find()` is first read, so an evaluation whose derivation nobody reads
 * (live results, sweeps) never builds it.
 */
export class Derivation {
  private readonly records: StepRecord[] = [];
  /** Record index by id: rejects duplicate ids; value() and record() find a step without a scan. */
  private readonly byId = new Map<string, number>();
  /** Printed steps built so far, by record index. */
  private readonly printed: (DerivationStep | undefined)[] = [];
  /** The list `steps` returned, kept up to date by step() once it exists. */
  private list: DerivationStep[] | undefined;

  constructor(public section = 'general') {}

  /** Every recorded step, printed, in order: one array per derivation, extended by later steps. */
  get steps(): DerivationStep[] {
    if (this.list) return this.list;
    const list: DerivationStep[] = [];
    for (let k = 0; k < this.records.length; k++) list.push(this.printedAt(k));
    this.list = list;
    return list;
  }

  private printedAt(k: number): DerivationStep {
    // k < records.length at every call site.
    return (this.printed[k] ??= printedStep(this.records[k]!));
  }

  // `options` has no `= {}` default: most steps pass none, and a sheet records ~100 steps per
  // evaluation, so an empty object per step is avoidable garbage.
  step<S extends string, D extends Dimension>(
    formula: Formula<S, D>,
    values: Record<S, number>,
    options?: StepOptions,
  ): Q<D> {
    const id = options?.id ?? formula.spec.id;
    const value = formula.evaluate(values);
    if (!Number.isFinite(value)) throw new CalcDomainError(id, values);
    if (this.byId.has(id)) throw new Error(`derivation: duplicate step id ${id}`);
    const k = this.records.length;
    this.records.push(
      new StepRecord(
        id,
        options?.section ?? this.section,
        formula as unknown as Formula<string, Dimension>,
        values,
        options,
        value,
      ),
    );
    this.byId.set(id, k);
    if (this.list) this.list.push(this.printedAt(k));
    return value;
  }

  /** The recorded step with this id, printed, if any. */
  find(id: string): DerivationStep | undefined {
    const k = this.byId.get(id);
    return k === undefined ? undefined : this.printedAt(k);
  }

  /**
   * What a sheet needs to publish a step as a result (id, section, label, symbol, value, formula's
   * dimension), without building the printed step.
   */
  record(id: string): StepRecord | undefined {
    const k = this.byId.get(id);
    return k === undefined ? undefined : this.records[k];
  }

  /** Looks up a recorded step value by id (throws if absent: a programming error). */
  value(id: string): number {
    const k = this.byId.get(id);
    if (k === undefined) throw new Error(`derivation: no step ${id}`);
    return this.records[k]!.value; // byId holds indexes of records
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

/**
 * Step options for one case of a calculation run more than once on a sheet (a second stop): its
 * ids take `prefix` and its labels end with the case's words, so the printed steps tell the
 * cases apart.
 */
export function caseStep(
  formula: { spec: { id: string; label: string } },
  prefix: string,
  caseWords?: string,
): StepOptions {
  return caseWords
    ? { id: prefix + formula.spec.id, label: `${formula.spec.label} — ${caseWords}` }
    : { id: prefix + formula.spec.id };
}
