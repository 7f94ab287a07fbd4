import type { DbOrTx } from "@/db/client";
import { outbox } from "@/db/schema";

export type OutboxMessage = {
  /** One message per cause, e.g. `order-confirmation:<orderId>`; a second enqueue with the same key is ignored. */
  dedupeKey: string;
  /** The template: "order-confirmation", "install-guide", "gift-receipt", "shipped", … (emails/). */
  kind: string;
  to: string;
  subject: string;
  /** What the template needs, as plain JSON (ids to load, or the values themselves). */
  payload: Record<string, unknown>;
};

/**
 * Writes a message to the outbox inside the caller's transaction, so the message exists
 * exactly when the event that causes it commits. The sender (lib/mail/sender.ts) delivers it.
 */
export async function enqueueEmail(tx: DbOrTx, message: OutboxMessage): Promise<void> {
  await tx
    .insert(outbox)
    .values({
      dedupeKey: message.dedupeKey,
      kind: message.kind,
      toAddress: message.to,
      subject: message.subject,
      payload: message.payload,
    })
    .onConflictDoNothing({ target: outbox.dedupeKey });
}
