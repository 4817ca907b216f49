import { availableParallelism } from 'node:os';
import { Piscina } from 'piscina';
import type { CpuTaskInput, CpuTaskName, CpuTaskOutput } from './cpu-tasks';
import { builtServerFile, isBuilt } from '../workers/worker-entry';

/**
 * Where the pool's task file is. Under tsx (dev, tests, npm start) this file is TypeScript, so piscina
 * starts the tsx task loader, which imports server/jobs/cpu.worker.ts (as the nesting runner does); built
 * JavaScript runs server/jobs/cpu.worker.js directly. The one place to change when the worker entries
 * move to a shared helper.
 */
export function cpuWorkerFile(): { filename: string; workerData?: { entry: string } } {
  if (!isBuilt) {
    return {
      filename: new URL('../workers/ts-task-loader.mjs', import.meta.url).href,
      workerData: { entry: new URL('./cpu.worker.ts', import.meta.url).href },
    };
  }
  // The production build compiles server/jobs/cpu.worker.ts to dist/server/jobs/cpu.worker.js (server/build-server.ts).
  return { filename: builtServerFile('jobs/cpu.worker.js').href };
}

let pool: Piscina | null = null;
let running = 0;

/**
 * Threads beside the request thread: one fewer than the cores (at least one), so floor logging keeps a
 * core while cut orders, documents and outlines are computed. Idle threads exit after a minute.
 */
function cpuPool(): Piscina {
  return (pool ??= new Piscina({
    ...cpuWorkerFile(),
    minThreads: 0,
    maxThreads: Math.max(1, availableParallelism() - 1),
    idleTimeout: 60_000,
  }));
}

/**
 * Runs one task of server/jobs/cpu-tasks.ts on a worker thread and answers its result. Results cross the
 * thread as structured clones, where a Buffer arrives as a plain Uint8Array: it is made a Buffer again.
 */
export async function runCpuTask<N extends CpuTaskName>(name: N, input: CpuTaskInput<N>): Promise<CpuTaskOutput<N>> {
  running++;
  try {
    const out: unknown = await cpuPool().run({ name, input });
    return (out instanceof Uint8Array && !Buffer.isBuffer(out) ? Buffer.from(out.buffer, out.byteOffset, out.byteLength) : out) as CpuTaskOutput<N>;
  } finally {
    running--;
  }
}

/** Tasks sent to the pool and not yet answered (running or waiting for a thread). */
export const cpuTasksInFlight = () => running;

/** Stops the pool's threads (server shutdown); the next task starts a new pool. */
export async function closeCpuPool(): Promise<void> {
  const p = pool;
  pool = null;
  await p?.destroy();
}
