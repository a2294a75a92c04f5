import PgBoss from 'pg-boss';
import { config } from '../config.ts';
import { logger } from './logger.ts';

/**
 * Background jobs on PostgreSQL (pg-boss): work that must happen but must not
 * hold up or fail the request that caused it, such as sending mail. Jobs
 * survive restarts and are retried with backoff while a service is down.
 */
let boss: PgBoss | undefined;
let starting: Promise<PgBoss> | undefined;

type Handler = (data: unknown, job: { id: string }) => Promise<void>;
const handlers = new Map<string, { handler: Handler; retryLimit: number }>();
let workOptions: { pollingIntervalSeconds: number } | undefined;

async function attach(b: PgBoss, name: string, handler: Handler, work: boolean) {
  await b.createQueue(name);
  if (!work) return;
  await b.work(name, { pollingIntervalSeconds: workOptions?.pollingIntervalSeconds ?? 2, batchSize: 5 }, async (jobs) => {
    for (const job of jobs) await handler(job.data, { id: job.id });
  });
}

/**
 * Registers a job kind, usually at module load. A kind defined after the
 * queue started (a module imported later) gets its worker at once.
 */
export function defineJob<T>(name: string, handler: (data: T, job: { id: string }) => Promise<void>, opts: { retryLimit?: number } = {}) {
  handlers.set(name, { handler: handler as Handler, retryLimit: opts.retryLimit ?? 30 });
  if (boss) void attach(boss, name, handler as Handler, workOptions !== undefined).catch((err: unknown) => logger.error({ err, name }, 'job worker not started'));
}

/**
 * Starts pg-boss (creating its schema on first use) and, when `work` is true,
 * the workers for every defined job. Idempotent.
 */
export function startJobs(opts: { work: boolean; pollingIntervalSeconds?: number } = { work: true }): Promise<PgBoss> {
  starting ??= (async () => {
    const b = new PgBoss({ connectionString: config().db.url, schema: 'pgboss', max: 3, application_name: 'pourscope-jobs' });
    b.on('error', (err) => logger.error({ err }, 'job queue error'));
    await b.start();
    if (opts.work) workOptions = { pollingIntervalSeconds: opts.pollingIntervalSeconds ?? 2 };
    for (const [name, { handler }] of handlers) await attach(b, name, handler, opts.work);
    boss = b;
    return b;
  })();
  return starting;
}

/** Queues a job; resolves once it is stored in PostgreSQL. */
export async function enqueue(name: string, data: object): Promise<string | null> {
  const entry = handlers.get(name);
  if (!entry) throw new Error(`no job kind "${name}" is defined`);
  const b = boss ?? (await startJobs({ work: false }));
  // Exponential backoff from 5 s: a mail server down for an hour is retried
  // for about a day before the job is given up and logged.
  return b.send(name, data, { retryLimit: entry.retryLimit, retryDelay: 5, retryBackoff: true, expireInSeconds: 120 });
}

export async function stopJobs(): Promise<void> {
  const b = boss ?? (starting ? await starting.catch(() => undefined) : undefined);
  boss = undefined;
  starting = undefined;
  workOptions = undefined;
  if (b) await b.stop({ graceful: true, wait: true, timeout: 5_000 });
}
