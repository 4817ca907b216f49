import { buildBundleTicketsPdf } from '@exports/pdf/bundle-tickets.pdf';
import { buildCutTicketPdf } from '@exports/pdf/cut-ticket.pdf';
import { buildMarkerListPdf } from '@exports/pdf/marker-list.pdf';
import { buildBundleRegisterXlsx } from '@exports/xlsx/bundle-register.xlsx';
import { buildCostingSheetXlsx } from '@exports/xlsx/costing-sheet.xlsx';
import { buildMarkerListXlsx } from '@exports/xlsx/marker-list.xlsx';
import { buildPaySheetXlsx } from '@exports/xlsx/pay-sheet.xlsx';
import { buildPurchaseOrderXlsx } from '@exports/xlsx/purchase-order.xlsx';
import { solveCutOrderJob, type CutOrderJobInput } from '../modules/cutting/cut-order-job';
import { sendMailJob, type MailJobInput } from '../modules/mail/mail-job';

/**
 * The long-running work besides nesting, as pure functions of plain data: the cut-order solve, the
 * exported documents, and sending mail. A {@link JobRunner} runs them in the web process, or (REDIS_URL)
 * hands them to `npm run worker` processes; callers cannot tell which.
 */
export const JOB_HANDLERS = {
  'cut-order': (input: CutOrderJobInput) => solveCutOrderJob(input),
  'marker-list.xlsx': async (input: Parameters<typeof buildMarkerListXlsx>[0]) => Buffer.from(await buildMarkerListXlsx(input)),
  'marker-list.pdf': async (input: Parameters<typeof buildMarkerListPdf>[0]) => Buffer.from(await buildMarkerListPdf(input)),
  'cut-ticket.pdf': async (input: Parameters<typeof buildCutTicketPdf>[0]) => Buffer.from(await buildCutTicketPdf(input)),
  'bundle-register.xlsx': async (input: Parameters<typeof buildBundleRegisterXlsx>[0]) => Buffer.from(await buildBundleRegisterXlsx(input)),
  'bundle-tickets.pdf': async (input: Parameters<typeof buildBundleTicketsPdf>[0]) => Buffer.from(await buildBundleTicketsPdf(input)),
  'costing-sheet.xlsx': async (input: Parameters<typeof buildCostingSheetXlsx>[0]) => Buffer.from(await buildCostingSheetXlsx(input)),
  'pay-sheet.xlsx': async (input: Parameters<typeof buildPaySheetXlsx>[0]) => Buffer.from(await buildPaySheetXlsx(input)),
  'purchase-order.xlsx': async (input: Parameters<typeof buildPurchaseOrderXlsx>[0]) => Buffer.from(await buildPurchaseOrderXlsx(input)),
  mail: (input: MailJobInput) => sendMailJob(input),
};

export type JobName = keyof typeof JOB_HANDLERS;
export type JobInput<N extends JobName> = Parameters<(typeof JOB_HANDLERS)[N]>[0];
export type JobOutput<N extends JobName> = Awaited<ReturnType<(typeof JOB_HANDLERS)[N]>>;

export const isJobName = (name: string): name is JobName => Object.hasOwn(JOB_HANDLERS, name);
