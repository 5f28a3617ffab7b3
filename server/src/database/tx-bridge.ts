import type { Kysely } from 'kysely';
import type { DB } from '@holdfast/db';
import type { Tx } from './unit-of-work.js';

/**
 * A Kysely transaction handed in by a service still listed in kyselyNotYetMoved (issue 14). A
 * moved service's method that such a service calls with its transaction accepts `Tx | LegacyTx`
 * until the caller is moved too.
 */
export type LegacyTx = Kysely<DB>;

/**
 * Hands a `Tx` to a method that still types its transaction as a Kysely handle (a service not
 * yet moved to repositories). At run time a `Tx` is that handle. The target type is taken from
 * the call, so the bridge keeps compiling once the callee takes `Tx`; remove it when
 * kyselyNotYetMoved is empty.
 */
export function passTx<T>(tx: Tx): T {
  return tx as unknown as T;
}
