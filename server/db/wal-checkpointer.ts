import { createRequire } from 'node:module';
import { Worker } from 'node:worker_threads';
import type { DataSource } from 'typeorm';

/**
 * SQLite in WAL mode copies the log back into the database file (a checkpoint) every 1000 pages, inside
 * whichever commit crosses the line, and it syncs the file while doing so. better-sqlite3 runs on the
 * request thread, so that commit stalled every request behind it (23 ms seen under `npm run bench:floor`).
 *
 * Here a worker thread with its own connection runs a PASSIVE checkpoint every `everyMs` (it never
 * blocks writers or readers), and the request connection's own threshold is raised to 10 000 pages so it
 * only checkpoints itself if the worker is gone. Nothing changes for durability: commits still go to the
 * WAL first. Not used for `:memory:` databases or PostgreSQL.
 */
const WORKER_SOURCE = `
const { workerData, parentPort } = require('node:worker_threads');
const Database = require(workerData.module);
const db = new Database(workerData.path, { fileMustExist: true });
db.pragma('busy_timeout = 1000');
db.pragma('synchronous = NORMAL');
const timer = setInterval(() => {
  try { db.pragma('wal_checkpoint(PASSIVE)'); } catch { /* busy or locked: the next round catches up */ }
}, workerData.everyMs);
parentPort.on('message', (m) => {
  if (m !== 'stop') return;
  clearInterval(timer);
  db.close();
  parentPort.postMessage('stopped');
});
`;

export interface WalCheckpointer {
  stop(): Promise<void>;
}

export async function startWalCheckpointer(ds: DataSource, path: string, everyMs = 1000): Promise<WalCheckpointer | null> {
  if (ds.options.type !== 'better-sqlite3' || !path || path === ':memory:') return null;
  await ds.query('PRAGMA wal_autocheckpoint = 10000');
  const module = createRequire(import.meta.url).resolve('better-sqlite3');
  const worker = new Worker(WORKER_SOURCE, { eval: true, workerData: { module, path, everyMs } });
  worker.unref();
  let alive = true;
  worker.on('error', (e) => {
    alive = false;
    // The request connection's own (raised) threshold still checkpoints; say why the worker went.
    console.error(`WAL checkpoint worker stopped: ${e instanceof Error ? e.message : String(e)}`);
  });
  worker.on('exit', () => (alive = false));
  return {
    async stop() {
      if (!alive) return;
      const stopped = new Promise<void>((resolve) => {
        worker.once('message', () => resolve());
        worker.once('exit', () => resolve());
      });
      worker.postMessage('stop');
      await Promise.race([stopped, new Promise((r) => setTimeout(r, 2000))]);
      await worker.terminate();
    },
  };
}
