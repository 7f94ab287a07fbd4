import { z } from "zod";
import { REMINDER_IDS } from "./seasons";

// What each kind of outbox message carries. Ids, not copies: the sender loads the order, the
// gifts or the model at send time, so a message always shows the current record.

const id = z.uuid();

export const orderPayloadSchema = z.object({ orderId: id });
export const installGuidePayloadSchema = z.object({
  orderId: id,
  occasion: z.enum(["paid", "delivered"]).default("paid"),
});
export const refundPayloadSchema = z.object({
  orderId: id,
  amountCents: z.number().int().positive(),
  cancelled: z.boolean().default(false),
});
export const paymentRefundedPayloadSchema = z.object({ orderId: id, why: z.string().min(1) });
/** The token is sealed (lib/mail/sealed.ts) and removed from the row once the message is sent. */
export const passwordResetPayloadSchema = z.object({ userId: id, sealedToken: z.string().min(1) });
export const yearEndPayloadSchema = z.object({
  userId: id,
  year: z.number().int().min(1900).max(9999),
  issuedOn: z.iso.datetime(),
});
export const seasonalPayloadSchema = z.object({
  userId: id,
  reminderId: z.enum(REMINDER_IDS),
  seasonKey: z.string().min(1),
});
export const lowStockPayloadSchema = z.object({
  modelId: id,
  userId: id,
  stockAfter: z.number().int().min(0),
  threshold: z.number().int().min(0),
});

export type PasswordResetPayload = z.infer<typeof passwordResetPayloadSchema>;
export type SeasonalPayload = z.infer<typeof seasonalPayloadSchema>;
export type LowStockPayload = z.infer<typeof lowStockPayloadSchema>;
export type YearEndPayload = z.infer<typeof yearEndPayloadSchema>;

/** A message that no retry will fix (unknown kind, malformed payload, missing record). */
export class PermanentMailError extends Error {
  override name = "PermanentMailError";
}

export function parsePayload<S extends z.ZodType>({
  schema,
  payload,
  kind,
}: {
  schema: S;
  payload: unknown;
  kind: string;
}): z.infer<S> {
  const parsed = schema.safeParse(payload);
  if (!parsed.success)
    throw new PermanentMailError(
      `The ${kind} message's payload is malformed: ${parsed.error.issues[0]?.message ?? "invalid"}.`,
    );
  return parsed.data;
}
