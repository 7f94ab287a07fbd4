// Common practice, no source: a handful of failures per account and a larger budget per address
// within a sliding window; both live in the database so every app instance sees the same counts
// (counted by countRecentSignInFailures in lib/auth/queries.ts).
export const THROTTLE_WINDOW_MS = 15 * 60 * 1000;
export const MAX_FAILURES_PER_ACCOUNT = 5;
export const MAX_FAILURES_PER_ADDRESS = 30;

export type ThrottleVerdict = { throttled: false } | { throttled: true; message: string };

/** Whether recent failures for this account or this address refuse another try. */
export function throttleVerdict({
  accountFailures,
  addressFailures,
}: {
  accountFailures: number;
  addressFailures: number;
}): ThrottleVerdict {
  if (accountFailures >= MAX_FAILURES_PER_ACCOUNT) {
    return {
      throttled: true,
      message: "Too many tries for this account. Wait 15 minutes, or reset your password.",
    };
  }
  if (addressFailures >= MAX_FAILURES_PER_ADDRESS) {
    return { throttled: true, message: "Too many sign-in tries from your network. Wait 15 minutes and try again." };
  }
  return { throttled: false };
}
