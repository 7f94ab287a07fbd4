import "server-only";
import { eq } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db/client";
import { givingSettings } from "@/db/schema";
import { DEFAULT_CENTER_TIME_ZONE } from "./center-time";
import type { GivingSettings } from "./settings-schema";

export const DEFAULT_GIVING_SETTINGS: GivingSettings = {
  timeZone: DEFAULT_CENTER_TIME_ZONE,
  feeBasisPoints: 290,
  feeFixedCents: 30,
  leadTimeWeeks: 6,
};

/** The center's giving settings, or the defaults when the admin has not saved any. */
export async function getGivingSettings(tx?: DbOrTx): Promise<GivingSettings> {
  const db = tx ?? (await getDb());
  const [row] = await db.select().from(givingSettings).where(eq(givingSettings.id, 1));
  if (!row) return { ...DEFAULT_GIVING_SETTINGS };
  return {
    timeZone: row.timeZone,
    feeBasisPoints: row.feeBasisPoints,
    feeFixedCents: row.feeFixedCents,
    leadTimeWeeks: row.leadTimeWeeks,
  };
}

/** The IANA zone whose calendar gives every gift its date and year. */
export async function getCenterTimeZone(tx?: DbOrTx): Promise<string> {
  return (await getGivingSettings(tx)).timeZone;
}
