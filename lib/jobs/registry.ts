// The store's background jobs, registered by name in one place (lib/jobs/store-jobs.ts) and run
// by the queue (lib/jobs/runner.ts). This file holds only the shapes and the list: no database,
// no queue library, so a domain module can name its job without pulling either in.

export type JobContext = {
  /** The job's name, as registered. */
  name: string;
  /** What the nudge or the schedule sent with it (`{}` when nothing). */
  data: Record<string, unknown>;
  /** 0 on the first try, then 1, 2, … on each retry. */
  retry: number;
  /** The queue's clock: the real time, or a test clock in the tests. */
  now: Date;
};

export type JobHandler = (context: JobContext) => Promise<void>;

/** How a failed run is tried again. Delays in seconds. */
export type RetryPolicy = {
  /** Retries after the first failure; 0 never retries. */
  limit: number;
  /** Wait before the first retry. */
  delaySeconds: number;
  /** Double the wait after each failure (with jitter), up to `maxDelaySeconds`. */
  backoff: boolean;
  maxDelaySeconds?: number;
};

export type JobSchedule = {
  /** Five fields (minute hour day-of-month month day-of-week), as in crontab(5). */
  cron: string;
  /** IANA time zone the expression is read in; UTC when left out. */
  tz?: string;
  /** When the store was down at a due time: run once on coming back (true) or skip it (false, the default). */
  catchUp?: boolean;
};

export type JobOptions = {
  /** Runs on this schedule once across every app instance, not once per instance. */
  schedule?: JobSchedule;
  retry: RetryPolicy;
  /** Also run once when the runner starts (for idempotent jobs that should not wait for their first due time). */
  runOnStart?: boolean;
  /** A run that takes longer than this is counted as failed and retried. */
  timeoutSeconds?: number;
};

export type JobDefinition = { name: string; handler: JobHandler; options: JobOptions };

/** Job names become queue names: letters, digits, `-` and `.` only. */
const JOB_NAME = /^[a-z0-9][a-z0-9.-]*$/;

const registered = new Map<string, JobDefinition>();

/** A checked job definition, not yet in the store's list (tests start the runner with their own). */
export function defineJob(name: string, handler: JobHandler, options: JobOptions): JobDefinition {
  if (!JOB_NAME.test(name))
    throw new Error(`Job name "${name}" must be lower-case letters, digits, "-" and ".".`);
  const { limit, delaySeconds, maxDelaySeconds } = options.retry;
  if (!Number.isInteger(limit) || limit < 0)
    throw new Error(`Job "${name}": retry.limit must be a whole number ≥ 0.`);
  if (!(delaySeconds >= 0) || (maxDelaySeconds !== undefined && !(maxDelaySeconds >= delaySeconds)))
    throw new Error(`Job "${name}": retry delays must be ≥ 0 and maxDelaySeconds ≥ delaySeconds.`);
  return { name, handler, options };
}

/** Adds a job to the store's list; call it from lib/jobs/store-jobs.ts. A name can be registered once. */
export function registerJob(name: string, handler: JobHandler, options: JobOptions): void {
  if (registered.has(name)) throw new Error(`Job "${name}" is registered twice.`);
  registered.set(name, defineJob(name, handler, options));
}

export function listJobs(): JobDefinition[] {
  return [...registered.values()];
}
