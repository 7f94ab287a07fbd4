// When to call the payment service again for a refund that has not been confirmed, and which of
// its errors are worth another call. Common practice, no source: the usual lease-and-backoff of
// a retried outbox, and the error types the payments SDK reports ("Error handling", Stripe API
// reference, 2024: connection, API and rate-limit errors may succeed later; an invalid request
// will not). A refund is never given up for an error that may pass: the money must go back.

/** How long one caller holds a refund before the sweeper may call for it again. */
export const REFUND_CLAIM_LEASE_MS = 2 * 60_000;
/** The first retry comes a minute after a failed call, then 2, 4, 8 … minutes later … */
export const REFUND_RETRY_BASE_MS = 60_000;
/** … but never more than an hour apart, well inside the 24 hours an idempotency key is kept. */
export const REFUND_RETRY_MAX_MS = 60 * 60_000;

/** `attempts`: the calls made so far, this one included (1 after the first call). */
export function nextRefundAttemptAt({ attempts, now }: { attempts: number; now: Date }): Date {
  const exponent = Math.max(0, Math.floor(attempts) - 1);
  const delay = Math.min(REFUND_RETRY_MAX_MS, REFUND_RETRY_BASE_MS * 2 ** Math.min(exponent, 30));
  return new Date(now.getTime() + delay);
}

export type RefundErrorVerdict = "retry" | "give-up";

const PASSING_TYPES = new Set(["StripeConnectionError", "StripeAPIError", "StripeRateLimitError", "StripeAuthenticationError"]);
const FINAL_TYPES = new Set(["StripeInvalidRequestError", "StripeIdempotencyError", "StripeCardError", "StripePermissionError"]);

/**
 * Retry what may pass (the service unreachable or failing, too many requests, a key being
 * rotated, a concurrent request under the same key), give up on what the service refused on its
 * merits (already refunded, more than is left, no such payment). Anything unknown is retried.
 */
export function classifyRefundError(error: unknown): RefundErrorVerdict {
  const { type, statusCode } = (error ?? {}) as { type?: unknown; statusCode?: unknown };
  const status = typeof statusCode === "number" ? statusCode : undefined;
  if (status !== undefined && (status >= 500 || status === 429 || status === 409)) return "retry";
  if (typeof type === "string" && PASSING_TYPES.has(type)) return "retry";
  if (typeof type === "string" && FINAL_TYPES.has(type)) return "give-up";
  if (status !== undefined && status >= 400 && status < 500 && status !== 401) return "give-up";
  return "retry";
}
