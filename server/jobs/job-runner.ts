import { deserialize, serialize } from 'node:v8';
import { Queue, QueueEvents, Worker } from 'bullmq';
import PQueue from 'p-queue';
import { redisConnection } from './redis-connection';
import { closeCpuPool, runCpuTask } from './cpu-pool';
import { isCpuTaskName } from './cpu-tasks';
import { isJobName, JOB_HANDLERS, type JobInput, type JobName, type JobOutput } from './handlers';

/** BullMQ queue of the jobs in server/jobs/handlers.ts (markers have their own queue). */
export const JOB_QUEUE_NAME = 'seamrun-jobs';

/** Runs a job and answers with its result, wherever it ran. */
export interface JobRunner {
  readonly where: 'in-process' | 'redis';
  run<N extends JobName>(name: N, input: JobInput<N>): Promise<JobOutput<N>>;
  stop(): Promise<void>;
}

// Job data and results cross Redis as V8 structured-clone bytes (base64), so Dates and Buffers survive.
const encode = (v: unknown) => serialize(v).toString('base64');
const decode = <T>(s: string) => deserialize(Buffer.from(s, 'base64')) as T;

const handle = <N extends JobName>(name: N, input: JobInput<N>) =>
  (JOB_HANDLERS[name] as (i: JobInput<N>) => Promise<JobOutput<N>>)(input);

/**
 * The embedded default: jobs run in this process, at most `concurrency` at once; the CPU-bound ones
 * (server/jobs/cpu-tasks.ts) on the worker threads of the CPU pool, so the request thread stays free.
 */
export function createLocalJobRunner(concurrency = 2): JobRunner {
  const queue = new PQueue({ concurrency });
  const runHere = <N extends JobName>(name: N, input: JobInput<N>) =>
    (isCpuTaskName(name) ? runCpuTask(name, input as never) : handle(name, input)) as Promise<JobOutput<N>>;
  return {
    where: 'in-process',
    run: (name, input) => queue.add(() => runHere(name, input)) as Promise<JobOutput<typeof name>>,
    async stop() {
      await queue.onIdle();
      await closeCpuPool();
    },
  };
}

/**
 * REDIS_URL: each job goes to the BullMQ queue and the caller waits for its result; any number of
 * `npm run worker` processes, on any machine, take jobs from it. A worker that dies mid-job leaves it
 * stalled; BullMQ hands it to another worker once its lock expires, and the caller still gets one answer.
 */
export function createRedisJobRunner(redisUrl: string, opts: { timeoutMs?: number } = {}): JobRunner {
  const connection = redisConnection(redisUrl);
  const queue = new Queue(JOB_QUEUE_NAME, { connection });
  const events = new QueueEvents(JOB_QUEUE_NAME, { connection: redisConnection(redisUrl) });
  const ready = events.waitUntilReady();
  return {
    where: 'redis',
    async run(name, input) {
      await ready;
      const job = await queue.add(name, { payload: encode(input) }, { removeOnComplete: 1000, removeOnFail: 1000, attempts: 1 });
      const result = (await job.waitUntilFinished(events, opts.timeoutMs ?? 180_000)) as string;
      return decode(result);
    },
    async stop() {
      await events.close();
      await queue.close();
      connection.disconnect();
    },
  };
}

/** The worker side (`npm run worker`): take jobs from the queue and run them with the same handlers. */
export function startJobWorker(redisUrl: string, opts: { name?: string; concurrency?: number; lockDurationMs?: number; stalledIntervalMs?: number } = {}) {
  return new Worker<{ payload: string }, string>(
    JOB_QUEUE_NAME,
    async (job) => {
      if (!isJobName(job.name)) throw new Error(`Unknown job ${job.name}`);
      return encode(await handle(job.name, decode(job.data.payload)));
    },
    {
      connection: redisConnection(redisUrl),
      concurrency: opts.concurrency ?? 2,
      name: opts.name,
      lockDuration: opts.lockDurationMs ?? 30_000,
      stalledInterval: opts.stalledIntervalMs ?? 30_000,
    },
  );
}

/** The runner a server uses: Redis with REDIS_URL, else in-process. Connects on first use. */
export function lazyJobRunner(redisUrl: string | undefined): JobRunner {
  let runner: JobRunner | null = null;
  const get = () => (runner ??= redisUrl ? createRedisJobRunner(redisUrl) : createLocalJobRunner());
  return {
    get where() {
      return redisUrl ? ('redis' as const) : ('in-process' as const);
    },
    run: (name, input) => get().run(name, input),
    async stop() {
      await runner?.stop();
      runner = null;
    },
  };
}
