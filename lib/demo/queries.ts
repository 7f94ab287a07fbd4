import "server-only";
import { count } from "drizzle-orm";
import type { Db } from "@/db/client";
import { users } from "@/db/schema";

/** A database with no accounts is a fresh one: the start command loads the demo scenario into it. */
export async function isEmpty(db: Db): Promise<boolean> {
  const [row] = await db.select({ n: count() }).from(users);
  return (row?.n ?? 0) === 0;
}
