import { buildBundleTicketsPdf } from '@exports/pdf/bundle-tickets.pdf';
import { buildCutTicketPdf } from '@exports/pdf/cut-ticket.pdf';
import { buildMaterialCutTicketPdf } from '@exports/pdf/material-cut-ticket.pdf';
import { buildMarkerListPdf } from '@exports/pdf/marker-list.pdf';
import { buildMarkerPlotPdf } from '@exports/pdf/marker-plot.pdf';
import { readPatternFile, type PatternUnit } from '@exports/import/index';
import { tiledPiecePdf } from '@exports/pdf/tiled-piece';
import { buildBundleRegisterXlsx } from '@exports/xlsx/bundle-register.xlsx';
import { buildCostingSheetXlsx } from '@exports/xlsx/costing-sheet.xlsx';
import { buildMarkerListXlsx } from '@exports/xlsx/marker-list.xlsx';
import { buildPaySheetXlsx } from '@exports/xlsx/pay-sheet.xlsx';
import { buildPurchaseOrderXlsx } from '@exports/xlsx/purchase-order.xlsx';
import { solveCutOrderJob, type CutOrderJobInput } from '../modules/cutting/cut-order-job';
import { cuttingPiecesOf } from '../modules/grading/graded-pieces';
import { computeGrading } from '../modules/grading/grading-compute';
import { staffLineJob } from '../modules/line/line-staffing-job';

/**
 * The CPU-bound work a request may ask for, as functions of plain data that answer plain data or bytes:
 * they run on the worker threads of server/jobs/cpu-pool.ts (never on the request thread), or on a job
 * worker process with REDIS_URL. Documents come back as Buffers: ExcelJS workbooks and PDF documents are
 * built and serialised inside the task, so only bytes cross the thread.
 */
export const CPU_TASKS = {
  'cut-order': async (input: CutOrderJobInput) => solveCutOrderJob(input),
  'marker-list.xlsx': async (input: Parameters<typeof buildMarkerListXlsx>[0]) => Buffer.from(await buildMarkerListXlsx(input)),
  'marker-list.pdf': async (input: Parameters<typeof buildMarkerListPdf>[0]) => Buffer.from(await buildMarkerListPdf(input)),
  'marker-plot.pdf': async (input: Parameters<typeof buildMarkerPlotPdf>[0]) => Buffer.from(await buildMarkerPlotPdf(input)),
  'cut-ticket.pdf': async (input: Parameters<typeof buildCutTicketPdf>[0]) => Buffer.from(await buildCutTicketPdf(input)),
  'material-cut-ticket.pdf': async (input: Parameters<typeof buildMaterialCutTicketPdf>[0]) => Buffer.from(await buildMaterialCutTicketPdf(input)),
  'bundle-register.xlsx': async (input: Parameters<typeof buildBundleRegisterXlsx>[0]) => Buffer.from(await buildBundleRegisterXlsx(input)),
  'bundle-tickets.pdf': async (input: Parameters<typeof buildBundleTicketsPdf>[0]) => Buffer.from(await buildBundleTicketsPdf(input)),
  'costing-sheet.xlsx': async (input: Parameters<typeof buildCostingSheetXlsx>[0]) => Buffer.from(await buildCostingSheetXlsx(input)),
  'pay-sheet.xlsx': async (input: Parameters<typeof buildPaySheetXlsx>[0]) => Buffer.from(await buildPaySheetXlsx(input)),
  'purchase-order.xlsx': async (input: Parameters<typeof buildPurchaseOrderXlsx>[0]) => Buffer.from(await buildPurchaseOrderXlsx(input)),
  /** One graded piece at full size, tiled over printer pages. */
  'piece-tiles.pdf': async (input: { piece: Parameters<typeof tiledPiecePdf>[0]; options: Parameters<typeof tiledPiecePdf>[1] }) =>
    Buffer.from(await tiledPiecePdf(input.piece, input.options)),
  /** Cutting pieces of a style per size from its grading set (grading, seam allowance, unfolding). */
  'cutting-pieces': async (input: { set: Parameters<typeof cuttingPiecesOf>[0]; baseSize: string }) => cuttingPiecesOf(input.set, input.baseSize),
  /** Pieces read from an uploaded DXF or SVG pattern file (text), with a problem per entity not read. */
  'pattern-file': async (input: { text: string; units?: PatternUnit }) => readPatternFile(input.text, { units: input.units }),
  /** A grading set graded over its run, with its seam checks and errors. */
  grading: async (input: { set: Parameters<typeof computeGrading>[0]; styleBase: string }) => computeGrading(input.set, input.styleBase),
  /** The shared-operations line solve (HiGHS, loaded once per thread). */
  'line-staffing': (input: Parameters<typeof staffLineJob>[0]) => staffLineJob(input),
};

export type CpuTaskName = keyof typeof CPU_TASKS;
export type CpuTaskInput<N extends CpuTaskName> = Parameters<(typeof CPU_TASKS)[N]>[0];
export type CpuTaskOutput<N extends CpuTaskName> = Awaited<ReturnType<(typeof CPU_TASKS)[N]>>;

export const isCpuTaskName = (name: string): name is CpuTaskName => Object.hasOwn(CPU_TASKS, name);

/** Runs one named task here, on whatever thread calls it (the worker thread, or a job worker process). */
export function runCpuTaskHere<N extends CpuTaskName>(name: N, input: CpuTaskInput<N>): Promise<CpuTaskOutput<N>> {
  return (CPU_TASKS[name] as (i: CpuTaskInput<N>) => Promise<CpuTaskOutput<N>>)(input);
}
