import type { DataSource, EntityManager } from 'typeorm';

export type Write = <T>(work: (tx: EntityManager) => Promise<T>) => Promise<T>;

/**
 * TypeORM shares one better-sqlite3 connection, so two transactions that
 * overlap across an `await` would nest as savepoints of each other and one
 * request's rollback could undo another's acknowledged write. Every write goes
 * through this queue: one transaction at a time, in arrival order.
 */
export function createWriter(ds: DataSource): Write {
  let tail: Promise<unknown> = Promise.resolve();
  return (work) => {
    const run = tail.then(() => ds.transaction(work));
    tail = run.catch(() => undefined);
    return run;
  };
}
