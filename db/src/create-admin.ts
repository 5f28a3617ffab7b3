import type { Kysely } from 'kysely';
import type { DB } from './database.js';
import { hashPassword } from './passwords.js';
import { checkPasswordStrength } from './password-strength.js';

export interface NewAdmin {
  email: string;
  displayName: string;
  initials: string;
  password: string;
}

/**
 * The first administrator of an installation without the demo (`npm run create-admin`).
 * Refuses an e-mail in use, malformed initials and a weak password; returns the new user's id.
 */
export async function createAdmin(db: Kysely<DB>, admin: NewAdmin): Promise<string> {
  const email = admin.email.trim().toLowerCase();
  if (!/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(email))
    throw new Error('--email is not an e-mail address');
  const displayName = admin.displayName.trim();
  if (displayName.length < 2) throw new Error('--name needs at least 2 characters');
  if (!/^[A-Z]{2,4}$/.test(admin.initials)) throw new Error('--initials must be 2 to 4 capitals');
  const verdict = checkPasswordStrength(admin.password, [email, displayName]);
  if (!verdict.ok) throw new Error(`the password is refused: ${verdict.message}`);
  const taken = await db
    .selectFrom('users')
    .select('id')
    .where('email', '=', email)
    .executeTakeFirst();
  if (taken) throw new Error(`a user with the e-mail ${email} already exists`);
  const row = await db
    .insertInto('users')
    .values({
      email,
      displayName,
      initials: admin.initials,
      role: 'admin',
      passwordHash: await hashPassword(admin.password),
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}
