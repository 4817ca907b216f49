/**
 * Runs stock-changing transactions of one studio one after another in this process. SQLite has a single
 * connection, so TypeORM nests concurrent transactions as savepoints on it and one's rollback would undo
 * the other's commit; queued here they never overlap. Across processes (PostgreSQL, job workers) the
 * conditional UPDATEs in roll-stock.repository.ts keep the counts right on their own.
 */
const tails = new Map<number, Promise<unknown>>();

export function withStockLock<T>(studioId: number, fn: () => Promise<T>): Promise<T> {
  const prev = tails.get(studioId) ?? Promise.resolve();
  const run = prev.then(fn, fn);
  const tail = run.catch(() => undefined);
  tails.set(studioId, tail);
  void tail.then(() => {
    if (tails.get(studioId) === tail) tails.delete(studioId);
  });
  return run;
}
