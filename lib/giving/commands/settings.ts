import "server-only";
import { getDb } from "@/db/client";
import { givingSettings } from "@/db/schema";
import type { GivingSettings } from "../settings-schema";

export async function saveGivingSettings(input: GivingSettings): Promise<void> {
  const db = await getDb();
  await db.insert(givingSettings).values({ id: 1, ...input }).onConflictDoUpdate({ target: givingSettings.id, set: input });
}
