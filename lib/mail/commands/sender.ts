import "server-only";
import { and, asc, eq, lte, sql } from "drizzle-orm";
import { getDb, type Db } from "@/db/client";
import { outbox, type OutboxRow } from "@/db/schema";
import { mailFrom } from "@/lib/admin/center-profile";
import { getOrganization } from "@/lib/admin/queries";
import { env } from "@/lib/config/env";
import { planRetry } from "../backoff";
import { getMailClient } from "../mail-client";
import { PermanentMailError } from "../payloads";
import { renderOutboxMessage } from "../render-message";
import { classifySendError } from "../send-outcome";

// The outbox sender. Each message is claimed with one conditional UPDATE (pending, due, and not
// claimed by anyone else), which moves its next attempt a lease ahead; only the sender whose
// UPDATE returned the row sends it, so two app instances never send one message twice. The
// outbox row id is the Idempotency-Key: if a sender dies after the service accepted a message
// but before recording it, the next attempt, after the lease, is answered from the service's
// memory of that key and nothing is sent again.

/** How long a claimed message stays with its sender before another may take it: common practice, no source. */
export const CLAIM_LEASE_MS = 2 * 60_000;

export type DeliveryReport = { sent: number; retrying: number; failed: number };

async function claim(db: Db, id: string, now: Date): Promise<OutboxRow | null> {
  const [row] = await db
    .update(outbox)
    .set({
      attempts: sql`${outbox.attempts} + 1`,
      nextAttemptAt: new Date(now.getTime() + CLAIM_LEASE_MS),
    })
    .where(and(eq(outbox.id, id), eq(outbox.status, "pending"), lte(outbox.nextAttemptAt, now)))
    .returning();
  return row ?? null;
}

function whileClaimed(row: OutboxRow) {
  return and(
    eq(outbox.id, row.id),
    eq(outbox.status, "pending"),
    eq(outbox.attempts, row.attempts),
  );
}

async function fail(
  db: Db,
  row: OutboxRow,
  message: string,
  now: Date,
): Promise<"retrying" | "failed"> {
  const plan = planRetry({ attempts: row.attempts, now });
  await db
    .update(outbox)
    .set(
      plan.giveUp
        ? { status: "failed", lastError: message }
        : { lastError: message, nextAttemptAt: plan.at },
    )
    .where(whileClaimed(row));
  return plan.giveUp ? "failed" : "retrying";
}

async function giveUp(db: Db, row: OutboxRow, message: string): Promise<"failed"> {
  await db.update(outbox).set({ status: "failed", lastError: message }).where(whileClaimed(row));
  return "failed";
}

async function deliverOne(
  db: Db,
  row: OutboxRow,
  now: Date,
  from: string,
): Promise<"sent" | "retrying" | "failed"> {
  let rendered;
  try {
    rendered = await renderOutboxMessage({ db, row });
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    if (error instanceof PermanentMailError) return giveUp(db, row, message);
    console.error(`mail: rendering ${row.kind} ${row.id} failed`, error);
    return fail(db, row, `Rendering failed: ${message}`, now);
  }
  const { data, error } = await getMailClient().emails.send(
    {
      from,
      to: row.toAddress,
      subject: row.subject,
      html: rendered.html,
      text: rendered.text,
      ...(rendered.replyTo ? { replyTo: rendered.replyTo } : {}),
      ...(rendered.headers ? { headers: rendered.headers } : {}),
      tags: [{ name: "kind", value: row.kind.replace(/[^A-Za-z0-9_-]/g, "_") }],
    },
    { idempotencyKey: row.id },
  );
  if (error) {
    const verdict = classifySendError(error);
    const message = `${error.name}${error.statusCode ? ` (${error.statusCode})` : ""}: ${error.message}`;
    if (verdict === "give-up") return giveUp(db, row, message);
    if (verdict === "retry") return fail(db, row, message, now);
  }
  await db
    .update(outbox)
    .set({
      status: "sent",
      sentAt: now,
      providerId: data?.id ?? null,
      lastError: error ? "Accepted earlier under this idempotency key; not sent again." : null,
      ...(rendered.scrubbedPayload ? { payload: rendered.scrubbedPayload } : {}),
    })
    .where(whileClaimed(row));
  return "sent";
}

/** Sends every message that is due, oldest first; safe to run from several processes at once. */
export async function deliverPendingMail({
  now = new Date(),
  limit = 25,
}: { now?: Date; limit?: number } = {}): Promise<DeliveryReport> {
  const db = await getDb();
  const due = await db
    .select({ id: outbox.id })
    .from(outbox)
    .where(and(eq(outbox.status, "pending"), lte(outbox.nextAttemptAt, now)))
    .orderBy(asc(outbox.nextAttemptAt), asc(outbox.createdAt))
    .limit(limit);
  const report: DeliveryReport = { sent: 0, retrying: 0, failed: 0 };
  if (due.length === 0) return report;
  // The center's name is read at send time, so a rename on /admin/settings shows on the next message.
  const from = mailFrom(env().MAIL_FROM, (await getOrganization())?.displayName);
  for (const { id } of due) {
    const row = await claim(db, id, now);
    if (!row) continue;
    report[await deliverOne(db, row, now, from)] += 1;
  }
  return report;
}
