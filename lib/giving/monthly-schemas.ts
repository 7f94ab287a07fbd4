import { z } from "zod";
import { contactSchema } from "@/lib/checkout/schemas";

export const MONTHLY_MIN_CENTS = 100;
export const MONTHLY_MAX_CENTS = 1_000_000;

const amount = z
  .number()
  .int("Whole cents only.")
  .min(MONTHLY_MIN_CENTS, "Choose at least $1 a month.")
  .max(MONTHLY_MAX_CENTS, "Choose at most $10,000 a month.");

/** `POST /api/giving/monthly`: the amount the donor chose, who they are, and whether they cover the card fee. */
export const startMonthlySchema = z.object({
  amountCents: amount,
  contact: contactSchema,
  coverFee: z.boolean().default(false),
});

/** `PATCH /api/giving/monthly/:id`: a new monthly amount. The private link's token or the donor's session proves who asks. */
export const changeMonthlySchema = z.object({ amountCents: amount, token: z.string().max(100).optional() });
export const stopMonthlySchema = z.object({ token: z.string().max(100).optional() });
