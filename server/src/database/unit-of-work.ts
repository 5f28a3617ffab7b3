import { Injectable } from '@nestjs/common';
import type { Kysely } from 'kysely';
import type { DB } from '@holdfast/db';
import { Database } from './database.js';

declare const txBrand: unique symbol;

/**
 * An open transaction as services see it: a token they hand to repository methods, not a query
 * builder. Services decide where a unit of work begins and ends (a revision save and its audit
 * event commit together); only repositories turn the token back into Kysely, through `on()`.
 */
export interface Tx {
  readonly [txBrand]: 'holdfast-transaction';
}

/** Begins transactions for services, which may not import Kysely or the database handle. */
@Injectable()
export class UnitOfWork {
  constructor(private readonly db: Database) {}

  /** Runs `fn` in one transaction; it commits when `fn` resolves and rolls back when it throws. */
  run<T>(fn: (tx: Tx) => Promise<T>): Promise<T> {
    return this.db.transaction().execute((trx) => fn(trx as unknown as Tx));
  }
}

/**
 * The executor a repository method runs on: the caller's transaction when it passes one, else the
 * pool. Repository methods take `tx?: Tx` as their last parameter and start with `on(this.db, tx)`.
 */
export function on(db: Database, tx?: Tx): Kysely<DB> {
  return (tx as Kysely<DB> | undefined) ?? db;
}
