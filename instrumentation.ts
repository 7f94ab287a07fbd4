// Runs once when the server starts: the app owns SIGTERM/SIGINT (NEXT_MANUAL_SIG_HANDLE=1)
// so it can close the embedded database cleanly before exiting. It also starts the background
// jobs of this process: the mail outbox sender (every few seconds, and at once when kicked),
// the daily seasonal reminders, and the expiry of unpaid reservations and the retry of
// unconfirmed refunds (every minute). Every job is safe to run in several app instances at once
// (conditional updates, dedupe and idempotency keys).

const RESERVATION_SWEEP_MS = 60_000;

export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { installShutdown } = await import("./db/client");
  installShutdown();
  // `next build` may load this file; the build must never open the database (STACK.md, trap 5).
  if (process.env.NEXT_PHASE === "phase-production-build") return;
  const { startMailJobs } = await import("./lib/mail/background-jobs");
  startMailJobs();
  const { expireStaleReservations } = await import("./lib/checkout/commands/orders");
  const { retryRequestedRefunds } = await import("./lib/checkout/commands/refunds");
  const sweep = setInterval(() => {
    expireStaleReservations().catch((error: unknown) =>
      console.error("checkout: expiring stale reservations failed", error),
    );
    // Refunds decided but not confirmed by the payment service (it was down, or the process died
    // between the commit and the call): called again under their idempotency keys.
    retryRequestedRefunds().catch((error: unknown) => console.error("refunds: the retry sweep failed", error));
  }, RESERVATION_SWEEP_MS);
  sweep.unref();
}
