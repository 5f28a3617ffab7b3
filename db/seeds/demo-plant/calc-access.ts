import { createHash, randomBytes } from 'node:crypto';
import * as calc from '@holdfast/calc';
import type {
  CriteriaSet,
  SheetEvaluation,
  SheetInputs,
  SheetTypeDefinition,
} from '@holdfast/calc';
import { canonicalJson } from '@holdfast/shared';

// The demo evaluates every revision with the calc core, never with hard-coded numbers.
export function sheetType(id: string): SheetTypeDefinition | undefined {
  return calc.getSheetType(id);
}

export function shippedCriteriaSets(): CriteriaSet[] {
  return [...calc.CRITERIA_SETS];
}

/** The demo duty of the sheet type, from its one definition in calc. */
export function defaults(def: SheetTypeDefinition): SheetInputs {
  return calc.demoInputs(def);
}

/**
 * Scale the n-th positive quantity input (within its bounds) so the demo sheets differ from one
 * another while staying valid.
 */
export function vary(
  def: SheetTypeDefinition,
  inputs: SheetInputs,
  n: number,
  factor: number,
): SheetInputs {
  const fields = def.fields.filter((f) => f.kind === 'quantity');
  if (fields.length === 0) return inputs;
  const f = fields[n % fields.length];
  const q = inputs[f.key];
  if (typeof q !== 'object' || q === null) return inputs;
  const out = structuredClone(inputs);
  out[f.key] = { ...q, value: Math.round(q.value * factor * 1000) / 1000 };
  try {
    def.evaluate(structuredClone(out), shippedCriteriaSets()[0]);
    return out;
  } catch {
    return inputs;
  }
}

export function evaluate(
  def: SheetTypeDefinition,
  inputs: SheetInputs,
  criteria: CriteriaSet,
): SheetEvaluation {
  return def.evaluate(structuredClone(inputs), criteria);
}

/** The inputs as the core used them (entered and SI), stored with a frozen revision. */
export function resolvedInputs(def: SheetTypeDefinition, inputs: SheetInputs) {
  return calc.resolveInputs(def.fields, inputs);
}

/** Same rule as the server: SHA-256 over canonical JSON of inputs and evaluation. */
export function contentHash(inputs: unknown, evaluation: unknown): string {
  return createHash('sha256').update(canonicalJson({ inputs, evaluation })).digest('hex');
}

const BASE32 = 'ABCDEFGHIJKLMNOPQRSTUVWXYZ234567';

/** 10 base32 characters of SHA-256(hash + 16 random bytes), as the server makes them. */
export function verificationCode(hash: string): string {
  const digest = createHash('sha256').update(hash).update(randomBytes(16)).digest();
  let bits = 0;
  let value = 0;
  let out = '';
  for (const byte of digest) {
    value = ((value << 8) | byte) & 0xffff;
    bits += 8;
    while (bits >= 5 && out.length < 10) {
      out += BASE32[(value >>> (bits - 5)) & 31];
      bits -= 5;
    }
  }
  return out;
}

export const coreVersion = (): string => calc.CORE_VERSION;
