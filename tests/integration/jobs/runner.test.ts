import { TestClock } from "pg-boss";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { closeDb, getDb } from "@/db/client";
import { nudge } from "@/lib/jobs/nudge";
import { defineJob, type JobContext } from "@/lib/jobs/registry";
import { getRunningQueue, openJobRunner, startJobs, stopJobs, type JobRunner } from "@/lib/jobs/runner";
import { dropQueueSchema, queueStates, secondInstanceDatabase, tickUntil, waitFor } from "./support";

// The job runner on the queue, against the test database: an in-memory PGlite by default, the
// PostgreSQL server of DATABASE_URL in CI's second pass. Time moves only through a TestClock, so
// nothing here waits for a schedule in real time.

const runners: JobRunner[] = [];
const closers: (() => Promise<void>)[] = [];

beforeEach(async () => {
  await dropQueueSchema();
});
afterEach(async () => {
  await Promise.all(runners.splice(0).map((runner) => runner.stop({ timeoutMs: 1000 })));
  await stopJobs({ timeoutMs: 1000 });
  for (const close of closers.splice(0)) await close();
});

async function open(options: Parameters<typeof openJobRunner>[0]): Promise<JobRunner> {
  const runner = await openJobRunner(options);
  runners.push(runner);
  return runner;
}

const minute = (date: Date) => date.toISOString().slice(0, 16);

describe("scheduled jobs", () => {
  it("run once per due time when two workers poll the same database", async () => {
    // 09:59:40 in Los Angeles (PST): the 09:59 run is due at once, then 10:00, 10:01, 10:02.
    const clock = new TestClock(new Date("2030-01-15T17:59:40Z"));
    const runs: { worker: string; at: Date }[] = [];
    const every = (worker: string) =>
      defineJob("test-every-minute", async ({ now }: JobContext) => void runs.push({ worker, at: now }), {
        schedule: { cron: "* * * * *", tz: "America/Los_Angeles" },
        retry: { limit: 0, delaySeconds: 0, backoff: false },
      });
    const second = await secondInstanceDatabase();
    closers.push(second.close);
    await open({ jobs: [every("a")], clock, scheduleCheckSeconds: 1 });
    await open({ jobs: [every("b")], clock, scheduleCheckSeconds: 1, ...second });

    await tickUntil(clock, () => clock.now() >= Date.parse("2030-01-15T18:02:30Z"), { stepMs: 5000 });
    await tickUntil(clock, () => runs.some((r) => minute(r.at) === "2030-01-15T18:02"));

    const perMinute = new Map<string, number>();
    for (const run of runs) perMinute.set(minute(run.at), (perMinute.get(minute(run.at)) ?? 0) + 1);
    expect(Object.fromEntries(perMinute)).toEqual({
      "2030-01-15T17:59": 1,
      "2030-01-15T18:00": 1,
      "2030-01-15T18:01": 1,
      "2030-01-15T18:02": 1,
    });
    // The queue marks the last run done just after its handler returns.
    await waitFor(async () => (await queueStates("test-every-minute")).every((state) => state === "completed"));
    expect(await queueStates("test-every-minute")).toEqual(["completed", "completed", "completed", "completed"]);
  });

  it("read the cron expression in the job's time zone", async () => {
    // 10:29:30 in Los Angeles is 18:29:30 UTC: "30 10 * * *" is due in 30 s there, and not in UTC.
    const clock = new TestClock(new Date("2030-01-15T18:29:30Z"));
    const ran: string[] = [];
    const at10h30 = (name: string, tz: string) =>
      defineJob(name, async ({ now }) => void ran.push(`${name} ${now.toISOString()}`), {
        schedule: { cron: "30 10 * * *", tz },
        retry: { limit: 0, delaySeconds: 0, backoff: false },
      });
    await open({ jobs: [at10h30("test-pacific", "America/Los_Angeles"), at10h30("test-utc", "UTC")], clock, scheduleCheckSeconds: 1 });

    await tickUntil(clock, () => ran.length > 0 && clock.now() >= Date.parse("2030-01-15T18:32:00Z"), { stepMs: 5000 });

    expect(ran).toHaveLength(1);
    expect(ran[0]).toMatch(/^test-pacific 2030-01-15T18:30:0\d/);
  });
});

describe("retries", () => {
  it("try a failing job again after a delay that doubles, and stop after the limit", async () => {
    const clock = new TestClock(new Date("2030-01-15T12:00:00Z"));
    const tries: { retry: number; at: number }[] = [];
    const flaky = defineJob(
      "test-flaky",
      async ({ retry, now }) => {
        tries.push({ retry, at: now.getTime() });
        throw new Error(`the mail service is down (try ${retry + 1})`);
      },
      { retry: { limit: 2, delaySeconds: 20, backoff: true } },
    );
    const quiet = vi.spyOn(console, "error").mockImplementation(() => {});
    const runner = await open({ jobs: [flaky], clock });
    runner.nudge("test-flaky", {});
    await tickUntil(clock, () => tries.length === 3, { stepMs: 1000 });
    // Long after the last retry would have come: nothing more.
    await clock.tick(10 * 60_000);
    quiet.mockRestore();

    expect(tries.map((t) => t.retry)).toEqual([0, 1, 2]);
    const gaps = [tries[1]!.at - tries[0]!.at, tries[2]!.at - tries[1]!.at].map((ms) => ms / 1000);
    // pg-boss's backoff: delay × 2^(n−1) × (1 + jitter in [0, 1)), so 20–40 s, then 40–80 s,
    // plus up to one poll (2 s) before a worker picks the retry up.
    expect(gaps[0]).toBeGreaterThanOrEqual(20);
    expect(gaps[0]).toBeLessThan(40 + 2.5);
    expect(gaps[1]).toBeGreaterThanOrEqual(40);
    expect(gaps[1]).toBeLessThan(80 + 2.5);
    expect(await queueStates("test-flaky")).toEqual(["failed"]);
  });

  it("count a job that succeeds on a retry as completed", async () => {
    const clock = new TestClock(new Date("2030-01-15T12:00:00Z"));
    let calls = 0;
    const once = defineJob(
      "test-second-time",
      async () => {
        calls += 1;
        if (calls === 1) throw new Error("first try fails");
      },
      { retry: { limit: 3, delaySeconds: 5, backoff: false } },
    );
    const quiet = vi.spyOn(console, "error").mockImplementation(() => {});
    const runner = await open({ jobs: [once], clock });
    runner.nudge("test-second-time", {});
    await tickUntil(clock, async () => (await queueStates("test-second-time"))[0] === "completed");
    quiet.mockRestore();
    expect(calls).toBe(2);
  });
});

describe("nudges", () => {
  it("coalesce: many nudges during a run give one more run, not one each", async () => {
    const clock = new TestClock(new Date("2030-01-15T12:00:00Z"));
    let release: () => void = () => {};
    let runs = 0;
    const pass = defineJob(
      "test-pass",
      async () => {
        runs += 1;
        if (runs === 1) await new Promise<void>((resolve) => (release = resolve));
      },
      { retry: { limit: 0, delaySeconds: 0, backoff: false } },
    );
    const runner = await open({ jobs: [pass], clock });
    runner.nudge("test-pass", {});
    await tickUntil(clock, () => runs === 1);
    for (let i = 0; i < 5; i++) runner.nudge("test-pass", {});
    await tickUntil(clock, async () => (await queueStates("test-pass")).length === 2);
    release();
    await tickUntil(clock, () => runs === 2);
    await clock.tick(30_000);
    expect(runs).toBe(2);
    expect(await queueStates("test-pass")).toEqual(["completed", "completed"]);
  });
});

describe("starting and stopping", () => {
  it("stop waits for the running pass, and after it nudges do nothing", async () => {
    let finished = false;
    let started = false;
    const slow = defineJob(
      "test-slow",
      async () => {
        started = true;
        await new Promise((resolve) => setTimeout(resolve, 300));
        finished = true;
      },
      { retry: { limit: 0, delaySeconds: 0, backoff: false } },
    );
    const errors = vi.spyOn(console, "error");
    await startJobs({ jobs: [slow] });
    nudge("test-slow");
    for (let i = 0; i < 500 && !started; i++) await new Promise((resolve) => setTimeout(resolve, 10));
    expect(started).toBe(true);

    await stopJobs();
    expect(finished).toBe(true);
    expect(await getRunningQueue()).toBeNull();
    expect(await queueStates("test-slow")).toEqual(["completed"]);
    nudge("test-slow");
    await new Promise((resolve) => setTimeout(resolve, 100));
    expect(await queueStates("test-slow")).toEqual(["completed"]);
    expect(errors).not.toHaveBeenCalled();
    errors.mockRestore();
  });

  it("closing the database stops the runner first", async () => {
    const errors = vi.spyOn(console, "error");
    await startJobs({ jobs: [] });
    expect(await getRunningQueue()).not.toBeNull();
    await closeDb();
    expect(await getRunningQueue()).toBeNull();
    expect(errors).not.toHaveBeenCalled();
    errors.mockRestore();
    // The next test file reopens the database; make sure it opens cleanly here too.
    await getDb();
  });
});
