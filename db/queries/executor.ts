import type { Db } from '../client';

/** A transaction handle as drizzle passes it to `db.transaction(async (tx) => …)`. */
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
/** Either the pool-backed database or an open transaction: queries that may join a transaction take this. */
export type Executor = Db | Tx;
