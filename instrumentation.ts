// Runs once when the server starts: the app owns SIGTERM/SIGINT (NEXT_MANUAL_SIG_HANDLE=1)
// so it can close the embedded database cleanly before exiting. It also starts this process's
// background jobs (lib/jobs/store-jobs.ts: the outbox sender, the expiry of unpaid reservations,
// the seasonal reminders) on the job queue; closing the database stops them first.

export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { installShutdown } = await import("./db/client");
  installShutdown();
  // `next build` may load this file; the build must never open the database (STACK.md, trap 5).
  if (process.env.NEXT_PHASE === "phase-production-build") return;
  await import("./lib/jobs/store-jobs");
  const { startJobs } = await import("./lib/jobs/runner");
  // Not awaited: a slow or failed start must not hold up the server; it is logged.
  startJobs().catch((error: unknown) => console.error("jobs: the job runner did not start", error));
}
