import { z } from "zod";
import { roostAdvicePayloadSchema, roostAskPayloadSchema } from "@/lib/roost-reports/mail-payloads";
import { REMINDER_IDS } from "./seasons";

// Every kind of message the store sends, with the payload its outbox row carries: the one list.
// Queuing (enqueueEmail) refuses a kind that is not here and a payload its schema rejects; the
// sender renders by the kind's family (lib/mail/render-message.ts). Ids, not copies: the sender
// loads the order, the gifts or the model at send time, so a message always shows the current
// record. To add a kind: its schema and entry here, its template in emails/, and its case in the
// family's compose-*.ts. (The templates' own prop shapes are lib/mail/message-types.ts.)

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
export const paymentRefundedPayloadSchema = z.object({
  orderId: id,
  why: z.string().min(1),
  /** What went back; older messages without it show the order's total. */
  amountCents: z.number().int().positive().optional(),
});
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
  /** The hemisphere of the buyer's saved site (older payloads: north). */
  hemisphere: z.enum(["north", "south"]).default("north"),
});
export const lowStockPayloadSchema = z.object({
  modelId: id,
  userId: id,
  stockAfter: z.number().int().min(0),
  threshold: z.number().int().min(0),
});

export const monthlyFailedPayloadSchema = z.object({
  monthlyGiftId: id,
  amountCents: z.number().int().positive(),
  /** The private manage link's path (no sign-in needed): kept, since the donor may have no account. */
  managePath: z.string().startsWith("/give/monthly/"),
});
export const monthlyChangedPayloadSchema = z.object({ monthlyGiftId: id, change: z.enum(["amount", "stopped"]) });
export const tributeNoticePayloadSchema = z.object({ orderId: id });

/** Which composer renders a kind: order messages, the install guide, account messages, giving. */
export type MessageFamily = "order" | "guide" | "account" | "roost" | "giving";

export const MESSAGE_KINDS = {
  "order-confirmation": { family: "order", payload: orderPayloadSchema },
  "gift-receipt": { family: "order", payload: orderPayloadSchema },
  shipped: { family: "order", payload: orderPayloadSchema },
  delivered: { family: "order", payload: orderPayloadSchema },
  "ready-for-pickup": { family: "order", payload: orderPayloadSchema },
  refund: { family: "order", payload: refundPayloadSchema },
  "payment-refunded": { family: "order", payload: paymentRefundedPayloadSchema },
  "install-guide": { family: "guide", payload: installGuidePayloadSchema },
  "password-reset": { family: "account", payload: passwordResetPayloadSchema },
  "year-end-statement": { family: "account", payload: yearEndPayloadSchema },
  "seasonal-reminder": { family: "account", payload: seasonalPayloadSchema },
  "low-stock": { family: "account", payload: lowStockPayloadSchema },
  "roost-report-ask": { family: "roost", payload: roostAskPayloadSchema },
  "roost-report-advice": { family: "roost", payload: roostAdvicePayloadSchema },
  "monthly-gift-failed": { family: "giving", payload: monthlyFailedPayloadSchema },
  "monthly-gift-changed": { family: "giving", payload: monthlyChangedPayloadSchema },
  "tribute-notice": { family: "giving", payload: tributeNoticePayloadSchema },
} as const satisfies Record<string, { family: MessageFamily; payload: z.ZodType }>;

export type MessageKind = keyof typeof MESSAGE_KINDS;
export const MESSAGE_KIND_NAMES = Object.keys(MESSAGE_KINDS) as MessageKind[];
export type MessagePayload<K extends MessageKind> = z.output<(typeof MESSAGE_KINDS)[K]["payload"]>;

export function isMessageKind(value: unknown): value is MessageKind {
  return typeof value === "string" && Object.hasOwn(MESSAGE_KINDS, value);
}

/** One message to queue, typed by its kind: the payload must be that kind's. */
export type OutboxMessageInput = {
  [K in MessageKind]: {
    /** One message per cause, e.g. `order-confirmation:<orderId>`; a second enqueue with the same key is ignored. */
    dedupeKey: string;
    kind: K;
    to: string;
    subject: string;
    payload: z.input<(typeof MESSAGE_KINDS)[K]["payload"]>;
  };
}[MessageKind];

export type PasswordResetPayload = MessagePayload<"password-reset">;
export type SeasonalPayload = MessagePayload<"seasonal-reminder">;
export type LowStockPayload = MessagePayload<"low-stock">;
export type YearEndPayload = MessagePayload<"year-end-statement">;

/** A message that no retry will fix (unknown kind, malformed payload, missing record). */
export class PermanentMailError extends Error {
  override name = "PermanentMailError";
}

/** A message refused at the door: its kind is not in MESSAGE_KINDS, or its payload or envelope is malformed. */
export class InvalidMessageError extends Error {
  override name = "InvalidMessageError";
}

const envelopeSchema = z.object({
  dedupeKey: z.string().trim().min(1, "A message needs a dedupe key."),
  to: z.string().trim().min(3).includes("@", { message: "A message needs an address to go to." }),
  subject: z.string().trim().min(1, "A message needs a subject."),
});

function firstIssue(error: z.ZodError): string {
  const issue = error.issues[0];
  if (!issue) return "invalid";
  return issue.path.length ? `${issue.path.join(".")}: ${issue.message}` : issue.message;
}

/**
 * Checks a message before it is queued and returns its payload as the sender will read it
 * (defaults filled in, unknown keys dropped). Throws InvalidMessageError, so a bad message fails
 * the transaction that tried to queue it instead of waiting in the outbox as "failed".
 */
export function validateMessage(message: { dedupeKey: string; kind: string; to: string; subject: string; payload: unknown }): {
  kind: MessageKind;
  payload: Record<string, unknown>;
} {
  if (!isMessageKind(message.kind)) {
    throw new InvalidMessageError(`There is no message kind "${message.kind}"; add it to MESSAGE_KINDS (lib/mail/payloads.ts) first.`);
  }
  const envelope = envelopeSchema.safeParse(message);
  if (!envelope.success) throw new InvalidMessageError(`The ${message.kind} message: ${firstIssue(envelope.error)}.`);
  const parsed = MESSAGE_KINDS[message.kind].payload.safeParse(message.payload);
  if (!parsed.success) {
    throw new InvalidMessageError(`The ${message.kind} message's payload is malformed: ${firstIssue(parsed.error)}.`);
  }
  return { kind: message.kind, payload: parsed.data as Record<string, unknown> };
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
