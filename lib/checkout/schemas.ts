import { z } from "zod";
import { GIFT_MAX_CENTS, GIFT_MIN_CENTS, QUANTITY_MAX, QUANTITY_MIN } from "./pricing";
import { US_STATE_CODES } from "./us-states";

export const stateSchema = z.enum(US_STATE_CODES, "Choose a U.S. state.");
export const zipSchema = z.string().trim().regex(/^\d{5}(-\d{4})?$/, "Enter a ZIP code like 97399 or 97399-1234.");

const quantitySchema = z
  .number({ error: "The quantity must be a number." })
  .int("The quantity must be a whole number.")
  .min(QUANTITY_MIN, `Order at least ${QUANTITY_MIN}.`)
  .max(QUANTITY_MAX, `At most ${QUANTITY_MAX} of one house per order.`);

export const giftCentsSchema = z
  .number({ error: "The gift must be a number of cents." })
  .int("The gift must be a whole number of cents.")
  .refine((c) => c === 0 || (c >= GIFT_MIN_CENTS && c <= GIFT_MAX_CENTS), {
    message: `A gift is between $${GIFT_MIN_CENTS / 100} and $${(GIFT_MAX_CENTS / 100).toLocaleString("en-US")}.`,
  });

export const quoteRequestSchema = z
  .object({
    items: z
      .array(z.object({ slug: z.string().min(1).max(120), quantity: quantitySchema }), "List the items as an array.")
      .max(20, "At most 20 different houses per order."),
    shipTo: z.object({ state: stateSchema, zip: zipSchema }).optional(),
    method: z.enum(["parcel", "pickup"], "Choose parcel or local pickup."),
    giftCents: giftCentsSchema.default(0),
  })
  .superRefine((q, ctx) => {
    if (q.method === "parcel" && q.items.length > 0 && !q.shipTo) {
      ctx.addIssue({ code: "custom", path: ["shipTo"], message: "Give the state and ZIP code to ship to." });
    }
    if (q.items.length === 0 && q.giftCents === 0) {
      ctx.addIssue({ code: "custom", path: ["items"], message: "Your cart is empty." });
    }
    const slugs = q.items.map((i) => i.slug);
    if (new Set(slugs).size !== slugs.length) {
      ctx.addIssue({ code: "custom", path: ["items"], message: "List each house once, with its quantity." });
    }
  });
export type QuoteRequest = z.infer<typeof quoteRequestSchema>;

export const addressSchema = z.object({
  name: z.string().trim().min(1, "Who should the parcel go to?").max(120, "Use at most 120 characters."),
  line1: z.string().trim().min(1, "Enter the street address.").max(200, "Use at most 200 characters."),
  line2: z.string().trim().max(200, "Use at most 200 characters.").optional().default(""),
  city: z.string().trim().min(1, "Enter the town or city.").max(120, "Use at most 120 characters."),
  state: stateSchema,
  zip: zipSchema,
});
export type Address = z.infer<typeof addressSchema>;

export const contactSchema = z.object({
  name: z.string().trim().min(1, "Tell us your name.").max(120, "Use at most 120 characters."),
  email: z.string().trim().toLowerCase().pipe(z.email("Enter an e-mail address like name@example.org.")),
});

/** `POST /api/checkout`: the cart plus who pays and where it goes. Prices never come from the client. */
export const checkoutRequestSchema = z
  .object({
    items: quoteRequestSchema.shape.items,
    method: z.enum(["parcel", "pickup"], "Choose parcel or local pickup.").default("pickup"),
    giftCents: giftCentsSchema.default(0),
    contact: contactSchema,
    address: addressSchema.optional(),
    siteId: z.uuid().optional(),
    guestSiteToken: z.string().max(100).optional(),
  })
  .superRefine((c, ctx) => {
    if (c.items.length > 0 && c.method === "parcel" && !c.address) {
      ctx.addIssue({ code: "custom", path: ["address"], message: "Give the address to ship to." });
    }
    if (c.items.length === 0 && c.giftCents === 0) {
      ctx.addIssue({ code: "custom", path: ["items"], message: "Your cart is empty." });
    }
    const slugs = c.items.map((i) => i.slug);
    if (new Set(slugs).size !== slugs.length) {
      ctx.addIssue({ code: "custom", path: ["items"], message: "List each house once, with its quantity." });
    }
  });
export type CheckoutRequest = z.infer<typeof checkoutRequestSchema>;
