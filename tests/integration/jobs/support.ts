import { sql } from "drizzle-orm";
import pg from "pg";
import type { TestClock } from "pg-boss";
import { getDb, getDbKind } from "@/db/client";
import { poolDatabase, type QueueDatabase } from "@/lib/jobs/queue-database";

/** Removes the queue's tables, so each test starts from a queue that was never started. */
export async function dropQueueSchema(): Promise<void> {
  const db = await getDb();
  await db.execute(sql.raw("drop schema if exists pgboss cascade"));
}

/**
 * A database for a second worker, as a second app instance would have it: its own pool on a
 * PostgreSQL server; on PGlite (one process, one connection) the same embedded database.
 */
export async function secondInstanceDatabase(): Promise<{ database?: QueueDatabase; close: () => Promise<void> }> {
  if ((await getDbKind()) === "pglite") return { close: async () => {} };
  const pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 4 });
  return { database: poolDatabase(pool), close: () => pool.end() };
}

/** The state of each job the queue holds for `name`, oldest first. */
export async function queueStates(name: string): Promise<string[]> {
  const db = await getDb();
  // Both drivers answer execute() with { rows }.
  const result = (await db.execute(
    sql`select state::text as state from pgboss.job where name = ${name} order by created_on`,
  )) as unknown as { rows: { state: string }[] };
  return result.rows.map((row) => row.state);
}

/** Moves the test clock in steps until `check` holds (at most `limitMs` of clock time). */
export async function tickUntil(
  clock: TestClock,
  check: () => boolean | Promise<boolean>,
  { stepMs = 500, limitMs = 10 * 60_000 }: { stepMs?: number; limitMs?: number } = {},
): Promise<void> {
  for (let moved = 0; !(await check()); moved += stepMs) {
    if (moved > limitMs) throw new Error(`still not true after ${limitMs} ms of test-clock time`);
    await clock.tick(stepMs);
    // Handlers run outside the clock's bookkeeping: give them a turn of the real event loop.
    await new Promise((resolve) => setTimeout(resolve, 2));
  }
}

/**
 * Polls in real time, with the test clock standing still, until `check` holds (at most `limitMs`).
 * For what a worker writes just after its handler returns (the job's state, a follow-up it asks
 * for): moving the clock instead could start another run.
 */
export async function waitFor(check: () => boolean | Promise<boolean>, limitMs = 5_000): Promise<void> {
  const until = Date.now() + limitMs;
  while (!(await check()) && Date.now() < until) await new Promise((resolve) => setTimeout(resolve, 20));
}
