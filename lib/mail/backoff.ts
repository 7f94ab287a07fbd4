// When the outbox sender tries a message again after the mail service failed.
// Truncated exponential backoff: the wait doubles after each failed attempt up to a cap, as in
// Google Cloud's "Retry strategy" guidance (1, 2, 4, 8, 16, 32 s … up to a maximum backoff;
// from memory). No jitter: each message is claimed by one sender at a time, so there is no
// herd of clients retrying together to spread out.

/** First retry after 30 s; common practice, no source. */
export const BASE_DELAY_MS = 30_000;
/** Never wait more than an hour between tries; common practice, no source. */
export const MAX_DELAY_MS = 60 * 60_000;
/** After this many failed attempts (about three hours of trying) a message is marked failed for an admin to look at. */
export const MAX_ATTEMPTS = 10;

/** Wait before the next try, after `attempt` tries have failed (attempt ≥ 1). */
export function getRetryDelayMs({
  attempt,
  baseMs = BASE_DELAY_MS,
  capMs = MAX_DELAY_MS,
}: {
  attempt: number;
  baseMs?: number;
  capMs?: number;
}): number {
  if (!Number.isInteger(attempt) || attempt < 1)
    throw new RangeError(`attempt must be a whole number ≥ 1, got ${attempt}.`);
  // 2 ** 40 is already far past any cap; stopping there keeps the arithmetic finite.
  return Math.min(capMs, baseMs * 2 ** Math.min(attempt - 1, 40));
}

/** What to do with a message after a failed attempt: try again at a time, or give up. */
export function planRetry({
  attempts,
  now,
  maxAttempts = MAX_ATTEMPTS,
}: {
  attempts: number;
  now: Date;
  maxAttempts?: number;
}): { giveUp: true } | { giveUp: false; at: Date } {
  if (attempts >= maxAttempts) return { giveUp: true };
  return { giveUp: false, at: new Date(now.getTime() + getRetryDelayMs({ attempt: attempts })) };
}
