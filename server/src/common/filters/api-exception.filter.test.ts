import { BadRequestException, NotFoundException, PayloadTooLargeException } from '@nestjs/common';
import { ThrottlerException } from '@nestjs/throttler';
import { createDatabase, type DB } from '@holdfast/db';
import { apiErrorSchema } from '@holdfast/shared';
import type { Request } from 'express';
import { sql, type Kysely } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { z } from 'zod';
import { conflict } from '../errors/api-exception.js';
import { ApiExceptionFilter } from './api-exception.filter.js';

const req = { method: 'GET', path: '/api/x', originalUrl: '/api/x' } as Request;
const filter = new ApiExceptionFilter();
const answer = (e: unknown) => {
  const out = filter.toResponse(e, req);
  apiErrorSchema.parse(out.body);
  return out;
};

/** Real PostgreSQL errors, raised in a temporary schema so nothing is left behind. */
async function pgError(db: Kysely<DB>, statement: string): Promise<unknown> {
  try {
    await db.transaction().execute(async (tx) => {
      await sql`create temporary table t_parent (id int primary key) on commit drop`.execute(tx);
      await sql`create temporary table t_child (id int primary key, parent int references t_parent(id), n int check (n > 0)) on commit drop`.execute(
        tx,
      );
      await sql`insert into t_parent values (1)`.execute(tx);
      await sql.raw(statement).execute(tx);
    });
  } catch (error) {
    return error;
  }
  throw new Error('expected a database error');
}

describe('ApiExceptionFilter', () => {
  let db: Kysely<DB> | undefined;
  beforeAll(() => {
    if (process.env.DATABASE_URL)
      db = createDatabase({ connectionString: process.env.DATABASE_URL, max: 1 });
  });
  afterAll(() => db?.destroy());

  it('maps PostgreSQL 23505 to 409, 23503 and 23514 to 400, naming the constraint', async () => {
    if (!db) throw new Error('DATABASE_URL is required');
    const unique = answer(await pgError(db, 'insert into t_parent values (1)'));
    expect(unique.status).toBe(409);
    expect(unique.body.error).toMatchObject({
      code: 'conflict',
      details: { constraint: 't_parent_pkey' },
    });
    const fk = answer(await pgError(db, 'insert into t_child values (1, 99, 1)'));
    expect(fk.status).toBe(400);
    expect(fk.body.error.code).toBe('validation_failed');
    const check = answer(await pgError(db, 'insert into t_child values (1, 1, -5)'));
    expect(check.status).toBe(400);
    const other = answer(await pgError(db, 'select 1/0'));
    expect(other.status).toBe(500);
    expect(other.body.error.message).not.toMatch(/division/);
  });

  it('answers 503 when PostgreSQL cannot be reached (refused, terminated, shutting down)', async () => {
    const net = await import('node:net');
    const closed = net.createServer();
    const port = await new Promise<number>((r) =>
      closed.listen(0, '127.0.0.1', () => r((closed.address() as { port: number }).port)),
    );
    await new Promise((r) => closed.close(r));
    const dead = createDatabase({
      connectionString: `postgres://x:y@127.0.0.1:${port}/none`,
      max: 1,
    });
    const refused = await sql`select 1`.execute(dead).catch((e: unknown) => e);
    await dead.destroy();
    const shutdown = Object.assign(
      new Error('terminating connection due to administrator command'),
      {
        code: '57P01',
        severity: 'FATAL',
      },
    );
    for (const e of [refused, new Error('Connection terminated unexpectedly'), shutdown]) {
      const out = answer(e);
      expect(out.status).toBe(503);
      expect(out.body).toEqual({
        error: { code: 'service_unavailable', message: expect.stringMatching(/database/) },
      });
    }
    expect(answer(new Error('Connection settings are odd')).status).toBe(500);
  });

  it('turns a ZodError into 400 with field paths', () => {
    const result = z.object({ a: z.number() }).strict().safeParse({ a: 'x', b: 1 });
    const out = answer(result.error);
    expect(out.status).toBe(400);
    expect(out.body.error.fields).toEqual([
      { path: 'a', message: expect.any(String) },
      { path: 'b', message: 'is not a known field' },
    ]);
  });

  it('keeps ApiException codes, details and messages', () => {
    const out = answer(conflict('Changed meanwhile.', { version: 3 }));
    expect(out).toEqual({
      status: 409,
      body: { error: { code: 'conflict', message: 'Changed meanwhile.', details: { version: 3 } } },
    });
  });

  it('maps Nest exceptions, throttling and unknown routes into the one shape', () => {
    expect(answer(new ThrottlerException()).body.error.code).toBe('too_many_requests');
    expect(answer(new PayloadTooLargeException()).body.error.code).toBe('payload_too_large');
    expect(
      answer(new BadRequestException('Unexpected token } in JSON at position 3')).body.error
        .message,
    ).toBe('The request body is not valid JSON.');
    const route = answer(new NotFoundException('Cannot GET /api/x'));
    expect(route).toEqual({
      status: 404,
      body: { error: { code: 'not_found', message: 'No API route GET /api/x.' } },
    });
  });

  it('never leaks the message or stack of an unexpected error', () => {
    const out = answer(new Error('secret connection string postgres://u:p@h/db'));
    expect(out.status).toBe(500);
    expect(JSON.stringify(out.body)).not.toMatch(/secret|postgres:|at /);
  });
});
