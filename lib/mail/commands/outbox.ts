import "server-only";
import { and, eq } from "drizzle-orm";
import { getDb, type DbOrTx, type Tx } from "@/db/client";
import { outbox } from "@/db/schema";
import { AppError } from "@/lib/http/errors";
import { kickMailSender } from "../kick";
import { validateMessage, type OutboxMessageInput } from "../payloads";

export type OutboxMessage = OutboxMessageInput;

/**
 * Writes a message to the outbox inside the caller's transaction, so the message exists
 * exactly when the event that causes it commits. The kind must be one of MESSAGE_KINDS and the
 * payload must match its schema (lib/mail/payloads.ts): anything else throws InvalidMessageError
 * and fails the caller's transaction. The sender (lib/mail/commands/sender.ts) delivers it.
 */
export async function enqueueEmail(tx: DbOrTx, message: OutboxMessage): Promise<void> {
  const { kind, payload } = validateMessage(message);
  await tx
    .insert(outbox)
    .values({
      dedupeKey: message.dedupeKey,
      kind,
      toAddress: message.to,
      subject: message.subject,
      payload,
    })
    .onConflictDoNothing({ target: outbox.dedupeKey });
}

/**
 * Runs `work` in one transaction and, once it has committed, nudges the sender to deliver what
 * it queued without waiting for its next tick. The one place the sender is nudged from: every
 * command that queues mail in its own transaction runs it through here.
 */
export async function withOutbox<T>(work: (tx: Tx) => Promise<T>): Promise<T> {
  const db = await getDb();
  const result = await db.transaction(work);
  kickMailSender();
  return result;
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
  return withOutbox(async (tx) => {
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
}
