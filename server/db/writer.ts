import type Database from 'better-sqlite3';
import type { DataSource, EntityManager } from 'typeorm';

export type Write = <T>(work: (tx: EntityManager) => Promise<T>) => Promise<T>;
export type WriteSync = <T>(work: () => T) => Promise<T>;

/** The better-sqlite3 handle under TypeORM, for prepared statements on hot paths. */
export const sqliteOf = (ds: DataSource): Database.Database => (ds.driver as unknown as { databaseConnection: Database.Database }).databaseConnection;

/**
 * TypeORM shares one better-sqlite3 connection, so two transactions that
 * overlap across an `await` would nest as savepoints of each other and one
 * request's rollback could undo another's acknowledged write. Every write goes
 * through this queue: one transaction at a time, in arrival order. `writeSync`
 * runs a synchronous better-sqlite3 transaction (prepared statements) in the
 * same queue.
 */
export function createWriter(ds: DataSource): { write: Write; writeSync: WriteSync } {
  let tail: Promise<unknown> = Promise.resolve();
  const enqueue = <T>(run: () => Promise<T> | T): Promise<T> => {
    const next = tail.then(run);
    tail = next.catch(() => undefined);
    return next;
  };
  return {
    write: (work) => enqueue(() => ds.transaction(work)),
    writeSync: (work) => enqueue(() => sqliteOf(ds).transaction(work)()),
  };
}
