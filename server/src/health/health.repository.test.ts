import {
  Kysely,
  PostgresAdapter,
  PostgresIntrospector,
  PostgresQueryCompiler,
  type DatabaseConnection,
  type Driver,
} from 'kysely';
import { describe, expect, it } from 'vitest';
import type { Database } from '../database/database.js';
import { HealthRepository } from './health.repository.js';

/** A driver whose queries fail with the given errors in turn, then answer. */
function failingDb(errors: Error[]) {
  let calls = 0;
  const connection: DatabaseConnection = {
    executeQuery: () => {
      calls++;
      const e = errors.shift();
      return e ? Promise.reject(e) : Promise.resolve({ rows: [] });
    },
    streamQuery: () => {
      throw new Error('not used');
    },
  };
  const driver: Driver = {
    init: async () => {},
    acquireConnection: async () => connection,
    beginTransaction: async () => {},
    commitTransaction: async () => {},
    rollbackTransaction: async () => {},
    releaseConnection: async () => {},
    destroy: async () => {},
  };
  const db = new Kysely<object>({
    dialect: {
      createAdapter: () => new PostgresAdapter(),
      createDriver: () => driver,
      createIntrospector: (k) => new PostgresIntrospector(k),
      createQueryCompiler: () => new PostgresQueryCompiler(),
    },
  });
  return { repo: new HealthRepository(db as unknown as Database), calls: () => calls };
}

// What pg raises on a pooled socket the server closed (restart, pg_terminate_backend).
const terminated = () =>
  Object.assign(new Error('terminating connection due to administrator command'), {
    code: '57P01',
  });

describe('HealthRepository.ping', () => {
  it('takes another connection when a pooled one was closed by the server', async () => {
    const { repo, calls } = failingDb([terminated(), terminated()]);
    await expect(repo.ping()).resolves.toBeUndefined();
    expect(calls()).toBe(3);
  });

  it('reports the database down when every try fails on the connection', async () => {
    const { repo, calls } = failingDb([terminated(), terminated(), terminated(), terminated()]);
    await expect(repo.ping()).rejects.toThrow(/administrator command/);
    expect(calls()).toBe(3);
  });

  it('does not repeat a query that failed for another reason', async () => {
    const { repo, calls } = failingDb([new Error('permission denied')]);
    await expect(repo.ping()).rejects.toThrow(/permission denied/);
    expect(calls()).toBe(1);
  });
});
