import { sendMailJob, type MailJobInput } from '../modules/mail/mail-job';
import { CPU_TASKS } from './cpu-tasks';

/**
 * The long-running work besides nesting, as pure functions of plain data: the CPU work of
 * {@link CPU_TASKS} (cut-order solve, exported documents, piece outlines) and sending mail. A
 * {@link JobRunner} runs them in the web process (the CPU work on worker threads), or (REDIS_URL) hands
 * them to `npm run worker` processes; callers cannot tell which.
 */
export const JOB_HANDLERS = {
  ...CPU_TASKS,
  mail: (input: MailJobInput) => sendMailJob(input),
};

export type JobName = keyof typeof JOB_HANDLERS;
export type JobInput<N extends JobName> = Parameters<(typeof JOB_HANDLERS)[N]>[0];
export type JobOutput<N extends JobName> = Awaited<ReturnType<(typeof JOB_HANDLERS)[N]>>;

export const isJobName = (name: string): name is JobName => Object.hasOwn(JOB_HANDLERS, name);
