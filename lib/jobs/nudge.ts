// Asks the job runner to run a job soon, without waiting for its schedule. Safe to import anywhere
// on the server: it pulls in neither the queue library nor the database. Before the runner starts
// (scripts, most tests) a nudge does nothing, and the job's next scheduled run picks the work up.
//
// A nudge never waits and never throws. Call it after the transaction that made the work commits:
// on PGlite a nudge from inside a transaction waits behind it (one connection), and on a
// PostgreSQL server the job could run before the transaction's rows are visible.

export type NudgeTarget = (name: string, options: { at?: Date }) => void;

const globalForNudge = globalThis as unknown as { __roostwrightJobNudge?: NudgeTarget };

/** Run job `name` now, or at `at` (a later run is kept once per distinct time). */
export function nudge(name: string, options: { at?: Date } = {}): void {
  globalForNudge.__roostwrightJobNudge?.(name, options);
}

/** The runner points nudges at itself when it starts, and away when it stops. */
export function setNudgeTarget(target: NudgeTarget | undefined): void {
  globalForNudge.__roostwrightJobNudge = target;
}
