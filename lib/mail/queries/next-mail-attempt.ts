import "server-only";
import { eq, min } from "drizzle-orm";
import { getDb } from "@/db/client";
import { outbox } from "@/db/schema";

/** When the earliest pending message is next due (a retry, or a claim's lease running out), or null when none waits. */
export async function findNextMailAttempt(): Promise<Date | null> {
  const db = await getDb();
  const [row] = await db
    .select({ at: min(outbox.nextAttemptAt) })
    .from(outbox)
    .where(eq(outbox.status, "pending"));
  return row?.at ?? null;
}
