import "server-only";
import { eq } from "drizzle-orm";
import { outbox } from "@/db/schema";
import { enqueueEmail, withOutbox } from "./outbox";

/**
 * Queues a year-end statement e-mail. Asking again the same day sends nothing new (one per
 * person, year and day), so an impatient double click does not send two.
 */
export async function requestYearEndStatement({
  userId,
  email,
  year,
  now = new Date(),
}: {
  userId: string;
  email: string;
  year: number;
  now?: Date;
}): Promise<{ queued: boolean }> {
  const dedupeKey = `year-end-statement:${userId}:${year}:${now.toISOString().slice(0, 10)}`;
  const queued = await withOutbox(async (tx) => {
    const [existing] = await tx
      .select({ id: outbox.id })
      .from(outbox)
      .where(eq(outbox.dedupeKey, dedupeKey));
    if (existing) return false;
    await enqueueEmail(tx, {
      dedupeKey,
      kind: "year-end-statement",
      to: email,
      subject: `Your gifts in ${year}: year-end statement`,
      payload: { userId, year, issuedOn: now.toISOString() },
    });
    return true;
  });
  return { queued };
}
