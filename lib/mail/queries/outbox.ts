import "server-only";
import { count, desc, eq, gte } from "drizzle-orm";
import { getDb } from "@/db/client";
import { outbox } from "@/db/schema";

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
