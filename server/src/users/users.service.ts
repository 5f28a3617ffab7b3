import { Injectable } from '@nestjs/common';
import { checkPasswordStrength, hashPassword, type UserRow } from '@holdfast/db';
import type { CreateUserInput, UpdateUserInput, User } from '@holdfast/shared';
import { badRequest, conflict, notFound } from '../common/errors/api-exception.js';
import { UsersRepository } from './users.repository.js';

export function toUser(row: UserRow): User {
  return {
    id: row.id,
    email: row.email,
    displayName: row.displayName,
    initials: row.initials,
    role: row.role,
    active: row.active,
    unitSystem: row.unitSystem,
    numberFormat: row.numberFormat,
  };
}

/** 400 on `field` when the password is short, common or guessable (see checkPasswordStrength). */
export function assertStrongPassword(field: string, password: string, personal: string[]): void {
  const verdict = checkPasswordStrength(password, personal);
  if (!verdict.ok) {
    throw badRequest('Some fields are not valid.', [
      { path: field, message: verdict.message ?? 'too weak' },
    ]);
  }
}

@Injectable()
export class UsersService {
  constructor(private readonly users: UsersRepository) {}

  async findActive(id: string): Promise<User | undefined> {
    const row = await this.users.findById(id);
    return row?.active ? toUser(row) : undefined;
  }

  async list(): Promise<User[]> {
    return (await this.users.list()).map(toUser);
  }

  async create(input: CreateUserInput): Promise<User> {
    if (await this.users.findByEmail(input.email)) {
      throw conflict('A user with this e-mail address already exists.', { field: 'email' });
    }
    const { password, ...rest } = input;
    assertStrongPassword('password', password, [input.email, input.displayName]);
    // A concurrent duplicate still fails on the unique index and becomes a 409 in the filter.
    return toUser(await this.users.insert({ ...rest, passwordHash: await hashPassword(password) }));
  }

  /** Admin edit. An admin may not deactivate or demote themselves (there must stay an admin). */
  async update(actorId: string, id: string, input: UpdateUserInput): Promise<User> {
    if (actorId === id && (input.active === false || (input.role && input.role !== 'admin'))) {
      throw conflict('You cannot deactivate yourself or give up your own admin role.');
    }
    // An empty patch is a no-op read (Kysely cannot build `update ... set` with no columns).
    const row =
      Object.keys(input).length === 0
        ? await this.users.findById(id)
        : await this.users.update(id, input);
    if (!row) throw notFound('No such user.');
    if (!row.active) {
      await this.users.revokeSessions(id);
      await this.users.endAccessTokens(id);
    }
    return toUser(row);
  }

  /** A user's own preferences (PATCH /api/auth/me). */
  async updatePreferences(
    id: string,
    input: { unitSystem?: User['unitSystem']; numberFormat?: User['numberFormat'] },
  ): Promise<User> {
    const patch = {
      ...(input.unitSystem ? { unitSystem: input.unitSystem } : {}),
      ...(input.numberFormat ? { numberFormat: input.numberFormat } : {}),
    };
    const row =
      Object.keys(patch).length === 0
        ? await this.users.findById(id)
        : await this.users.update(id, patch);
    if (!row) throw notFound('No such user.');
    return toUser(row);
  }
}
