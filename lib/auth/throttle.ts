import { and, count, eq, gte } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { signInAttempts } from "@/db/schema";

// Common practice, no source: a handful of failures per account and a larger budget per address
// within a sliding window; both live in the database so every app instance sees the same counts.
export const THROTTLE_WINDOW_MS = 15 * 60 * 1000;
export const MAX_FAILURES_PER_ACCOUNT = 5;
export const MAX_FAILURES_PER_ADDRESS = 30;

export type ThrottleVerdict = { throttled: false } | { throttled: true; message: string };

export async function checkSignInThrottle(
  db: DbOrTx,
  { email, ip, now = new Date() }: { email: string; ip: string; now?: Date },
): Promise<ThrottleVerdict> {
  const since = new Date(now.getTime() - THROTTLE_WINDOW_MS);
  const failuresFor = async (column: typeof signInAttempts.email | typeof signInAttempts.ip, value: string) => {
    const [row] = await db
      .select({ n: count() })
      .from(signInAttempts)
      .where(and(eq(column, value), eq(signInAttempts.succeeded, false), gte(signInAttempts.createdAt, since)));
    return row?.n ?? 0;
  };
  if ((await failuresFor(signInAttempts.email, email)) >= MAX_FAILURES_PER_ACCOUNT) {
    return {
      throttled: true,
      message: "Too many tries for this account. Wait 15 minutes, or reset your password.",
    };
  }
  if ((await failuresFor(signInAttempts.ip, ip)) >= MAX_FAILURES_PER_ADDRESS) {
    return { throttled: true, message: "Too many sign-in tries from your network. Wait 15 minutes and try again." };
  }
  return { throttled: false };
}

export async function recordSignInAttempt(
  db: DbOrTx,
  attempt: { email: string; ip: string; succeeded: boolean },
): Promise<void> {
  await db.insert(signInAttempts).values(attempt);
}
