import { z } from "zod";
import { FULFILLMENT_STATES } from "@/lib/orders/statuses";
import { CARRIERS, validateTrackingNumber } from "./tracking";

// One schema per action on the order page, shared by its form and its route handler. Every
// action carries the order's `version` as the volunteer saw it: a stale version loses (409).

const versionSchema = z.number({ error: "Reload the order and try again." }).int().min(0);

/** Largest carton the store ships. Common practice, no source: parcel carriers cap length near 108 in and weight near 150 lb. */
export const MAX_BOX_IN = 108;
export const MAX_BOX_LB = 150;

const inches = (what: string) =>
  z
    .number({ error: `Enter the ${what} in inches.` })
    .positive(`The ${what} must be more than 0 in.`)
    .max(MAX_BOX_IN, `The ${what} can be at most ${MAX_BOX_IN} in.`);

export const boxSchema = z.object({
  description: z.string().trim().min(1, "Say what is in the box.").max(120, "Use at most 120 characters."),
  lengthIn: inches("length"),
  widthIn: inches("width"),
  heightIn: inches("height"),
  weightLb: z
    .number({ error: "Enter the weight in pounds." })
    .positive("The weight must be more than 0 lb.")
    .max(MAX_BOX_LB, `A box can weigh at most ${MAX_BOX_LB} lb.`),
});
export type Box = z.infer<typeof boxSchema>;

/** Record the boxes and mark the order boxed and weighed. */
export const packSchema = z.object({
  version: versionSchema,
  boxes: z.array(boxSchema, "List the boxes.").min(1, "Record at least one box.").max(30, "At most 30 boxes per order."),
});
export type PackInput = z.infer<typeof packSchema>;

/** Hand one box to a carrier: the tracking number is checked for its carrier's format and check digit. */
export const shipBoxSchema = z
  .object({
    version: versionSchema,
    carrier: z.enum(CARRIERS, "Choose the carrier."),
    service: z.string().trim().min(1, "Enter the service, like Ground.").max(60, "Use at most 60 characters."),
    trackingNumber: z.string().max(80, "That is too long for a tracking number."),
  })
  .superRefine((input, ctx) => {
    const check = validateTrackingNumber({ carrier: input.carrier, number: input.trackingNumber });
    if (!check.ok) ctx.addIssue({ code: "custom", path: ["trackingNumber"], message: check.message });
  });
export type ShipBoxInput = z.infer<typeof shipBoxSchema>;

/** Move the order one step (or, for an admin, one step back with a reason). */
export const transitionSchema = z.object({
  version: versionSchema,
  to: z.enum(FULFILLMENT_STATES, "Choose where the order goes next."),
  reason: z.string().trim().max(500, "Use at most 500 characters.").optional(),
});
export type TransitionInput = z.infer<typeof transitionSchema>;

const reasonSchema = z
  .string()
  .trim()
  .min(3, "Say why, in a few words; it is kept with the order.")
  .max(500, "Use at most 500 characters.");

/** Admin: cancel an order that has not left, refunding it in full and putting its houses back. */
export const cancelSchema = z.object({ version: versionSchema, reason: reasonSchema });
export type CancelInput = z.infer<typeof cancelSchema>;

/** Admin: refund a shipped order, all or part, without taking stock back. Blank amount = all that is left. */
export const refundSchema = z.object({
  version: versionSchema,
  amount: z
    .string()
    .trim()
    .regex(/^(\d{1,6}(\.\d{1,2})?)?$/, "Enter dollars and cents, like 25.00, or leave it blank for the rest.")
    .optional(),
  reason: reasonSchema,
});
export type RefundInput = z.infer<typeof refundSchema>;

/** "25.5" → 2550 cents; blank → undefined (everything not yet refunded). */
export function dollarsToCents(amount: string | undefined): number | undefined {
  if (!amount) return undefined;
  const [whole = "0", fraction = ""] = amount.split(".");
  return Number(whole) * 100 + Number(fraction.padEnd(2, "0"));
}
