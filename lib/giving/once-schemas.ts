import { z } from "zod";
import { contactSchema } from "@/lib/checkout/schemas";

/** In honour or in memory of someone, with an optional notice to a person the donor names. */
export const tributeSchema = z
  .object({
    kind: z.enum(["honor", "memory"]),
    name: z.string().trim().min(1, "Whose name should the gift carry?").max(120, "Use at most 120 characters."),
    notice: z
      .object({
        name: z.string().trim().min(1, "Who should we tell?").max(120, "Use at most 120 characters."),
        email: z.string().trim().toLowerCase().pipe(z.email("Enter an e-mail address like name@example.org.")),
        /** The notice states the amount only when the donor says so. */
        showAmount: z.boolean().default(false),
      })
      .optional(),
  })
  .optional();

/** `POST /api/giving/once`: a gift on its own, with its extras; the fee is computed on the server. */
export const giveOnceSchema = z.object({
  amountCents: z.number().int("Whole cents only.").min(100, "Choose a gift between $1 and $10,000.").max(1_000_000, "Choose a gift between $1 and $10,000."),
  contact: contactSchema,
  coverFee: z.boolean().default(false),
  tribute: tributeSchema,
});
export type GiveOnceRequest = z.infer<typeof giveOnceSchema>;
