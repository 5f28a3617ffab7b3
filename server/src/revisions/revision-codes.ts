import { createHash, randomBytes } from 'node:crypto';
import { base32nopad } from '@scure/base';
import { canonicalJson } from '@holdfast/shared';

/** SHA-256 (hex) over the canonical JSON of a revision's inputs and its evaluation. */
export function contentHash(inputs: unknown, evaluation: unknown): string {
  return createHash('sha256').update(canonicalJson({ inputs, evaluation })).digest('hex');
}

/** RFC 4648 base32 without padding (@scure/base: audited, no dependencies). */
export function base32(bytes: Uint8Array): string {
  return base32nopad.encode(bytes);
}

/**
 * A printed verification code: 10 base32 characters (50 bits) of SHA-256 over the content hash
 * and 16 random bytes, so the code cannot be derived from the content or guessed in sequence.
 */
export function newVerificationCode(hash: string): string {
  const digest = createHash('sha256').update(hash).update(randomBytes(16)).digest();
  return base32(digest).slice(0, 10);
}

/** Revision labels: 1 → A … 26 → Z, 27 → AA. */
export function revisionLabel(seq: number): string {
  let n = seq;
  let label = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    label = String.fromCharCode(65 + r) + label;
    n = Math.floor((n - 1) / 26);
  }
  return label;
}
