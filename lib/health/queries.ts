import "server-only";
import { sql } from "drizzle-orm";
import { getDb, getDbKind } from "@/db/client";

/** Asks the database one trivial question; throws when it does not answer. */
export async function pingDatabase(): Promise<{ kind: Awaited<ReturnType<typeof getDbKind>>; latencyMs: number }> {
  const started = performance.now();
  const db = await getDb();
  await db.execute(sql`select 1`);
  return { kind: await getDbKind(), latencyMs: Math.round((performance.now() - started) * 10) / 10 };
}
