import "server-only";
import { and, eq, gte, isNotNull, lt } from "drizzle-orm";
import { getDb, type Tx } from "@/db/client";
import { gifts, outbox, users } from "@/db/schema";
import { startOfDayInZone } from "@/lib/fulfillment/store-time";
import { enqueueEmail, withOutbox } from "@/lib/mail/commands/outbox";
import { januaryStatementKey, statementYearDue } from "../january";
import { getCenterTimeZone } from "../queries";

/** The instants a calendar year of the center spans: [start, end). */
export function yearRange(year: number, timeZone: string): { start: Date; end: Date } {
  return { start: startOfDayInZone({ day: `${year}-01-01`, timeZone }), end: startOfDayInZone({ day: `${year + 1}-01-01`, timeZone }) };
}

/** Donors (signed-in accounts) with at least one gift in the center's calendar year. */
export async function listStatementDonors(year: number, timeZone: string): Promise<{ userId: string; email: string; name: string }[]> {
  const db = await getDb();
  const { start, end } = yearRange(year, timeZone);
  const rows = await db
    .selectDistinct({ userId: users.id, email: users.email, name: users.name })
    .from(gifts)
    .innerJoin(users, eq(users.id, gifts.userId))
    .where(and(isNotNull(gifts.userId), gte(gifts.receivedAt, start), lt(gifts.receivedAt, end)));
  return rows.sort((a, b) => a.email.localeCompare(b.email));
}

function statementMessage({ userId, email, year, now, dedupeKey }: { userId: string; email: string; year: number; now: Date; dedupeKey: string }) {
  return {
    dedupeKey,
    kind: "year-end-statement" as const,
    to: email,
    subject: `Your gifts in ${year}: year-end statement`,
    payload: { userId, year, issuedOn: now.toISOString() },
  };
}

/**
 * The January run: in the first days of January (the center's calendar), queues each donor's
 * statement for the year just ended. One outbox row per donor and year (its unique dedupe key),
 * so a second run, a restart or a second instance running at the same moment queues nothing new.
 */
export async function queueJanuaryStatements({ now = new Date() }: { now?: Date } = {}): Promise<{ year: number | null; queued: number }> {
  const timeZone = await getCenterTimeZone();
  const year = statementYearDue(now, timeZone);
  if (year === null) return { year: null, queued: 0 };
  const donors = await listStatementDonors(year, timeZone);
  let queued = 0;
  for (const donor of donors) {
    const inserted = await withOutbox((tx) =>
      enqueueEmailCounting(tx, statementMessage({ userId: donor.userId, email: donor.email, year, now, dedupeKey: januaryStatementKey({ userId: donor.userId, year }) })),
    );
    if (inserted) queued += 1;
  }
  return { year, queued };
}

/** Queues the message unless its key is taken; true when this run wrote it (for the nudge only). */
async function enqueueEmailCounting(tx: Tx, message: ReturnType<typeof statementMessage>): Promise<boolean> {
  const [existing] = await tx.select({ id: outbox.id }).from(outbox).where(eq(outbox.dedupeKey, message.dedupeKey));
  await enqueueEmail(tx, message);
  return !existing;
}

/** The admin's "send again": a new message under a new key, whatever was sent before. */
export async function resendStatement({ userId, year, now = new Date() }: { userId: string; year: number; now?: Date }): Promise<void> {
  const db = await getDb();
  const [user] = await db.select({ email: users.email }).from(users).where(eq(users.id, userId));
  if (!user) return;
  await withOutbox((tx) => enqueueEmail(tx, statementMessage({ userId, email: user.email, year, now, dedupeKey: `year-end-statement:resend:${userId}:${year}:${now.getTime()}` })));
}
