import "server-only";
import { and, count, desc, eq, gte } from "drizzle-orm";
import { getDb } from "@/db/client";
import { outbox } from "@/db/schema";
import { AppError } from "@/lib/http/errors";
import { kickMailSender } from "./kick";

export const OUTBOX_FILTERS = ["all", "pending", "sent", "failed"] as const;
export type OutboxFilter = (typeof OUTBOX_FILTERS)[number];

export type OutboxListItem = {
  id: string;
  kind: string;
  to: string;
  subject: string;
  status: "pending" | "sent" | "failed";
  attempts: number;
  lastError: string | null;
  providerId: string | null;
  createdAt: string;
  sentAt: string | null;
  nextAttemptAt: string;
};

/** The newest messages first, for the admin mail page. */
export async function listOutboxMessages({
  filter = "all",
  limit = 100,
}: {
  filter?: OutboxFilter;
  limit?: number;
}): Promise<OutboxListItem[]> {
  const db = await getDb();
  const rows = await db
    .select()
    .from(outbox)
    .where(filter === "all" ? undefined : eq(outbox.status, filter))
    .orderBy(desc(outbox.createdAt))
    .limit(limit);
  return rows.map((row) => ({
    id: row.id,
    kind: row.kind,
    to: row.toAddress,
    subject: row.subject,
    status: row.status,
    attempts: row.attempts,
    lastError: row.lastError,
    providerId: row.providerId,
    createdAt: row.createdAt.toISOString(),
    sentAt: row.sentAt?.toISOString() ?? null,
    nextAttemptAt: row.nextAttemptAt.toISOString(),
  }));
}

/** Messages queued in the last `days` days, by status. */
export async function countOutboxByStatus({
  days,
  now = new Date(),
}: {
  days: number;
  now?: Date;
}): Promise<Record<"pending" | "sent" | "failed", number>> {
  const since = new Date(now.getTime() - days * 24 * 60 * 60_000);
  const db = await getDb();
  const rows = await db
    .select({ status: outbox.status, n: count() })
    .from(outbox)
    .where(gte(outbox.createdAt, since))
    .groupBy(outbox.status);
  const counts = { pending: 0, sent: 0, failed: 0 };
  for (const row of rows) counts[row.status] = row.n;
  return counts;
}

/**
 * "Send again" on the admin page. A failed or waiting message goes back in the queue with its
 * attempts reset (same idempotency key: it was never accepted). A sent message is copied to a
 * new row, hence a new key, or the mail service would answer from its memory and send nothing.
 * A sent password reset cannot be copied: its token left the outbox when it was sent.
 */
export async function resendOutboxMessage({
  id,
  now = new Date(),
}: {
  id: string;
  now?: Date;
}): Promise<{ mode: "requeued" | "copied"; id: string }> {
  const db = await getDb();
  const result = await db.transaction(async (tx) => {
    const [row] = await tx.select().from(outbox).where(eq(outbox.id, id));
    if (!row) throw new AppError("not_found", "No message has that id.");
    if (row.status !== "sent") {
      const [requeued] = await tx
        .update(outbox)
        .set({ status: "pending", attempts: 0, nextAttemptAt: now, lastError: null })
        .where(
          and(eq(outbox.id, id), eq(outbox.status, row.status), eq(outbox.attempts, row.attempts)),
        )
        .returning({ id: outbox.id });
      if (!requeued)
        throw new AppError(
          "conflict",
          "The sender is working on this message right now; reload in a moment.",
        );
      return { mode: "requeued" as const, id };
    }
    if (row.kind === "password-reset") {
      throw new AppError(
        "conflict",
        "A reset link is sent only once. Ask the person to request a new one from the sign-in page.",
      );
    }
    const [copy] = await tx
      .insert(outbox)
      .values({
        dedupeKey: `${row.dedupeKey}:again:${now.toISOString()}`,
        kind: row.kind,
        toAddress: row.toAddress,
        subject: row.subject,
        payload: row.payload,
        nextAttemptAt: now,
      })
      .returning({ id: outbox.id });
    if (!copy) throw new Error("outbox copy returned nothing");
    return { mode: "copied" as const, id: copy.id };
  });
  kickMailSender();
  return result;
}
