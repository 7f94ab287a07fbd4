import "server-only";
import { getDb } from "@/db/client";
import { signInAttempts } from "@/db/schema";

export async function recordSignInAttempt(attempt: { email: string; ip: string; succeeded: boolean }): Promise<void> {
  const db = await getDb();
  await db.insert(signInAttempts).values(attempt);
}
