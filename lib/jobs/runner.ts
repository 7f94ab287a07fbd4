import "server-only";
import { PgBoss, type Clock, type Queue } from "pg-boss";
import { beforeCloseDb, getDb, getDbKind } from "@/db/client";
import { setNudgeTarget, type NudgeTarget } from "./nudge";
import { queueDatabase, type QueueDatabase } from "./queue-database";
import { listJobs, type JobDefinition } from "./registry";

// Runs the registered jobs on pg-boss, a job queue kept in PostgreSQL tables (schema "pgboss"),
// over the app's own database client: the embedded PGlite or the PostgreSQL server's pool.
//
// Each job is a *pass* over work the store keeps in its own tables (outbox rows, unpaid orders,
// …), so the queue only decides when a pass runs: on its schedule (once across every instance;
// pg-boss claims each due time with one conditional update), when nudged, or again after a failure
// with backoff. Every queue is "stately": at most one pass waiting and one running per job, so a
// burst of nudges coalesces into one more pass, as the hand-written runner did.

/** How often an idle worker looks for a pass another instance queued; a local nudge wakes it at once. */
const POLL_SECONDS = 2;
/** Completed passes are kept a day for looking into, then deleted; common practice, no source. */
const KEEP_COMPLETED_SECONDS = 24 * 60 * 60;
/** A pass running longer than this is counted as failed; pg-boss's own default (15 minutes). */
const DEFAULT_TIMEOUT_SECONDS = 15 * 60;
/** How long stop waits for running passes before it gives up on them; they are retried after. */
const STOP_TIMEOUT_MS = 10_000;

export type JobRunnerOptions = {
  /** The jobs to run: the store's list by default; tests pass their own. */
  jobs?: JobDefinition[];
  /** A pg-boss TestClock in tests, so schedules and retries run without waiting. */
  clock?: Clock;
  /** Check the schedules this often (seconds, 1–45); pg-boss's defaults (5 s and 30 s) otherwise. */
  scheduleCheckSeconds?: number;
  /** The database the queue uses: the app's client by default; tests give a second runner its own pool. */
  database?: QueueDatabase;
};

/** One queue worker: what startJobs runs once per process, and what tests run two of. */
export type JobRunner = {
  boss: PgBoss;
  nudge: NudgeTarget;
  stop: (options?: { timeoutMs?: number }) => Promise<void>;
};

const globalForJobs = globalThis as unknown as {
  __roostwrightJobs?: Promise<{ runner: JobRunner; removeCloseHook: () => void }>;
};

function queueOptions(job: JobDefinition): Omit<Queue, "name"> {
  const { retry, timeoutSeconds = DEFAULT_TIMEOUT_SECONDS } = job.options;
  return {
    policy: "stately",
    retryLimit: retry.limit,
    retryDelay: retry.delaySeconds,
    retryBackoff: retry.backoff,
    ...(retry.maxDelaySeconds !== undefined ? { retryDelayMax: retry.maxDelaySeconds } : {}),
    expireInSeconds: timeoutSeconds,
    deleteAfterSeconds: KEEP_COMPLETED_SECONDS,
  };
}

async function prepareQueue(boss: PgBoss, job: JobDefinition): Promise<void> {
  const options = queueOptions(job);
  const existing = await boss.getQueue(job.name);
  if (!existing) await boss.createQueue(job.name, options);
  else {
    if (existing.policy !== options.policy)
      console.warn(
        `jobs: queue ${job.name} has policy ${existing.policy}, expected ${options.policy}; delete the queue to change it`,
      );
    const { policy: _policy, ...changeable } = options;
    await boss.updateQueue(job.name, changeable);
  }
  const schedule = job.options.schedule;
  if (schedule)
    await boss.schedule(
      job.name,
      schedule.cron,
      {},
      { tz: schedule.tz ?? "UTC", missed: schedule.catchUp ? "once" : "skip" },
    );
  else await boss.unschedule(job.name);
}

/** Starts a queue worker for `jobs` on the database; see startJobs for the one a server runs. */
export async function openJobRunner({
  jobs = listJobs(),
  clock,
  scheduleCheckSeconds,
  database,
}: JobRunnerOptions = {}): Promise<JobRunner> {
  const kind = await getDbKind();
  const boss = new PgBoss({
    db: database ?? queueDatabase(await getDb(), kind),
    ...(kind === "pglite" ? { backend: "pglite" as const } : {}),
    ...(clock ? { clock } : {}),
    ...(scheduleCheckSeconds
      ? {
          cronWorkerIntervalSeconds: scheduleCheckSeconds,
          cronMonitorIntervalSeconds: scheduleCheckSeconds,
        }
      : {}),
  });
  boss.on("error", (error) => console.error("jobs: the queue reported an error", error));
  boss.on("warning", (warning) => console.warn(`jobs: ${warning.message}`));
  await boss.start();
  const now = () => new Date(clock ? clock.now() : Date.now());
  const workers = new Map<string, string>();
  try {
    const names = new Set(jobs.map((job) => job.name));
    // A job taken out of the list stops being scheduled.
    for (const schedule of await boss.getSchedules())
      if (!names.has(schedule.name)) await boss.unschedule(schedule.name, schedule.key);
    for (const job of jobs) {
      await prepareQueue(boss, job);
      const id = await boss.work<Record<string, unknown>>(
        job.name,
        { pollingIntervalSeconds: POLL_SECONDS },
        async ([pass]) => {
          if (!pass) return;
          try {
            await job.handler({
              name: job.name,
              data: pass.data ?? {},
              retry: pass.retryCount,
              now: now(),
            });
          } catch (error) {
            console.error(
              `jobs: ${job.name} failed (try ${pass.retryCount + 1} of ${job.options.retry.limit + 1})`,
              error,
            );
            throw error;
          }
        },
      );
      workers.set(job.name, id);
    }
  } catch (error) {
    await boss.stop({ graceful: false }).catch(() => {});
    throw error;
  }
  let stopped = false;
  const send = async (name: string, at: Date | undefined) => {
    const worker = workers.get(name);
    if (!worker) return console.warn(`jobs: nudge for ${name}, which is not a registered job`);
    try {
      if (at) await boss.sendAfter(name, {}, { singletonKey: `at:${at.toISOString()}` }, at);
      else {
        await boss.send(name, {});
        boss.notifyWorker(worker);
      }
    } catch (error) {
      if (!stopped)
        console.error(`jobs: queueing ${name} failed; its schedule picks the work up`, error);
    }
  };
  for (const job of jobs) if (job.options.runOnStart) void send(job.name, undefined);
  return {
    boss,
    nudge: (name, { at }) => {
      if (!stopped) void send(name, at);
    },
    stop: async ({ timeoutMs = STOP_TIMEOUT_MS } = {}) => {
      stopped = true;
      await boss.stop({ graceful: true, timeout: timeoutMs });
    },
  };
}

/**
 * Starts the job runner of this process (instrumentation.ts): the store's jobs, nudges pointed at
 * it, and a hook that stops it before the database closes. Idempotent. Never during `next build`:
 * the caller checks the build phase, and the database opener refuses it too.
 */
export async function startJobs(options: JobRunnerOptions = {}): Promise<JobRunner> {
  if (!globalForJobs.__roostwrightJobs) {
    const starting = openJobRunner(options).then((runner) => {
      setNudgeTarget(runner.nudge);
      return { runner, removeCloseHook: beforeCloseDb(() => stopJobs()) };
    });
    globalForJobs.__roostwrightJobs = starting;
    starting.catch(() => {
      if (globalForJobs.__roostwrightJobs === starting) globalForJobs.__roostwrightJobs = undefined;
    });
  }
  return (await globalForJobs.__roostwrightJobs).runner;
}

/**
 * Stops taking new passes, waits for running ones (up to 10 s; one cut short is retried later)
 * and detaches from the database. Runs by itself before the database closes (closeDb).
 */
export async function stopJobs({
  timeoutMs = STOP_TIMEOUT_MS,
}: { timeoutMs?: number } = {}): Promise<void> {
  const pending = globalForJobs.__roostwrightJobs;
  if (!pending) return;
  globalForJobs.__roostwrightJobs = undefined;
  const started = await pending.catch(() => null);
  if (!started) return;
  setNudgeTarget(undefined);
  started.removeCloseHook();
  await started.runner.stop({ timeoutMs });
}

/** The queue of this process's runner, for tests that look at it; null when stopped. */
export async function getRunningQueue(): Promise<PgBoss | null> {
  const started = await globalForJobs.__roostwrightJobs?.catch(() => null);
  return started?.runner.boss ?? null;
}
