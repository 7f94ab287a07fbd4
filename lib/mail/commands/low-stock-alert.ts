import "server-only";
import { asc, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { users } from "@/db/schema";
import { enqueueEmail } from "./outbox";

/**
 * Queues the low-stock alert to every workshop staff member (admins when there are none), in the
 * transaction of the stock movement that crossed the threshold. One alert per model, person and
 * day: carts reserving and releasing around the threshold must not flood the workshop.
 */
export async function queueLowStockAlert(
  tx: DbOrTx,
  {
    modelId,
    modelName,
    stockAfter,
    threshold,
    now = new Date(),
  }: { modelId: string; modelName: string; stockAfter: number; threshold: number; now?: Date },
): Promise<void> {
  let recipients = await tx
    .select({ id: users.id, email: users.email })
    .from(users)
    .where(eq(users.role, "staff"))
    .orderBy(asc(users.email));
  if (recipients.length === 0)
    recipients = await tx
      .select({ id: users.id, email: users.email })
      .from(users)
      .where(eq(users.role, "admin"))
      .orderBy(asc(users.email));
  const day = now.toISOString().slice(0, 10);
  for (const recipient of recipients) {
    await enqueueEmail(tx, {
      dedupeKey: `low-stock:${modelId}:${day}:${recipient.id}`,
      kind: "low-stock",
      to: recipient.email,
      subject: `Low stock: ${modelName} is down to ${stockAfter}`,
      payload: { modelId, userId: recipient.id, stockAfter, threshold },
    });
  }
}
