import argon2 from 'argon2';

/** argon2id with the library's default cost (about 200 ms per hash on this class of machine). */
export function hashPassword(password: string): Promise<string> {
  return argon2.hash(password, { type: argon2.argon2id });
}

/** True when `password` matches; false for a malformed hash rather than throwing. */
export async function verifyPassword(hash: string, password: string): Promise<boolean> {
  try {
    return await argon2.verify(hash, password);
  } catch {
    return false;
  }
}
