import { createHash, randomBytes } from 'node:crypto';
import { canonicalJson } from '@holdfast/shared';

/** SHA-256 (hex) over the canonical JSON of a revision's inputs and its evaluation. */
export function contentHash(inputs: unknown, evaluation: unknown): string {
  return createHash('sha256').update(canonicalJson({ inputs, evaluation })).digest('hex');
}

const BASE32 = 'ABCDEFGHIJKLMNOPQRSTUVWXYZ234567';

/** RFC 4648 base32 without padding. */
export function base32(bytes: Uint8Array): string {
  let bits = 0;
  let value = 0;
  let out = '';
  for (const byte of bytes) {
    value = (value << 8) | byte;
    bits += 8;
    while (bits >= 5) {
      out += BASE32[(value >>> (bits - 5)) & 31];
      bits -= 5;
    }
  }
  if (bits > 0) out += BASE32[(value << (5 - bits)) & 31];
  return out;
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
