/**
 * Piscina task file of the CPU pool (server/jobs/cpu-pool.ts): runs one named task of
 * server/jobs/cpu-tasks.ts per call. Thin: the work is in the cores and builders the tasks call.
 */
import { isCpuTaskName, runCpuTaskHere } from './cpu-tasks';

export default async function runTask(task: { name: string; input: unknown }): Promise<unknown> {
  if (!isCpuTaskName(task.name)) throw new Error(`Unknown CPU task ${task.name}`);
  return runCpuTaskHere(task.name, task.input as never);
}
