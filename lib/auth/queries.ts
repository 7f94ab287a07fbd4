import "server-only";
import { and, count, eq, gte } from "drizzle-orm";
import { getDb } from "@/db/client";
import { signInAttempts, users, type User } from "@/db/schema";
import { THROTTLE_WINDOW_MS } from "./throttle";

/** The account signing in, password hash included; null when no account has this e-mail. */
export async function findUserForSignIn({ email }: { email: string }): Promise<User | null> {
  const db = await getDb();
  const [user] = await db.select().from(users).where(eq(users.email, email)).limit(1);
  return user ?? null;
}

/** Failed sign-ins within the throttle window, for this account and for this address. */
export async function countRecentSignInFailures({
  email,
  ip,
  now = new Date(),
}: {
  email: string;
  ip: string;
  now?: Date;
}): Promise<{ accountFailures: number; addressFailures: number }> {
  const db = await getDb();
  const since = new Date(now.getTime() - THROTTLE_WINDOW_MS);
  const failuresFor = async (column: typeof signInAttempts.email | typeof signInAttempts.ip, value: string) => {
    const [row] = await db
      .select({ n: count() })
      .from(signInAttempts)
      .where(and(eq(column, value), eq(signInAttempts.succeeded, false), gte(signInAttempts.createdAt, since)));
    return row?.n ?? 0;
  };
  return { accountFailures: await failuresFor(signInAttempts.email, email), addressFailures: await failuresFor(signInAttempts.ip, ip) };
}

/** What each request re-reads about the signed-in account: its role, its name and its session version. */
export async function getSessionFacts({ id }: { id: string }): Promise<{ role: User["role"]; name: string; sessionVersion: number } | null> {
  const db = await getDb();
  const [row] = await db
    .select({ role: users.role, name: users.name, sessionVersion: users.sessionVersion })
    .from(users)
    .where(eq(users.id, id))
    .limit(1);
  return row ?? null;
}
