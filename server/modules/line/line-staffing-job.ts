import { loadLineSolver, staffLine, type LineSolver, type StaffLineInput } from '@planning';
import type { StaffingOutcome } from './line-plan';

let highs: Promise<LineSolver> | null = null;

/**
 * The shared-operations solve (planning/line-staffing, HiGHS in WebAssembly) as a job of plain data: it runs in
 * the web process or on a job worker (`npm run worker`) alike. HiGHS is loaded once per process. A RangeError
 * of the core (nobody can run a machine type, a pin on a machine the person lacks, too few machines) comes back
 * as data, since errors lose their class on the way back from a worker.
 */
export async function staffLineJob(input: StaffLineInput): Promise<StaffingOutcome> {
  const solver = await (highs ??= loadLineSolver());
  try {
    return { line: staffLine(input, solver) };
  } catch (e) {
    if (e instanceof RangeError) return { rangeError: e.message };
    throw e;
  }
}
