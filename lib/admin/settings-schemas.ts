import { z } from "zod";
import { stateSchema, zipSchema } from "@/lib/checkout/schemas";
import { US_STATE_CODES } from "@/lib/checkout/us-states";

const text = (label: string, max = 200) => z.string().trim().min(1, `Enter the ${label}.`).max(max, `Use at most ${max} characters.`);

/** The center's details printed on receipts. */
export const organizationSchema = z.object({
  legalName: text("legal name"),
  displayName: text("name shown in the store", 120),
  street: text("street address"),
  city: text("town or city", 120),
  state: stateSchema,
  zip: zipSchema,
  // IRS employer identification numbers are written NN-NNNNNNN (IRS Publication 1635).
  taxId: z.string().trim().regex(/^\d{2}-\d{7}$/, "Write the tax id (EIN) as 12-3456789."),
  email: z.string().trim().pipe(z.email("Enter an e-mail address.")),
  phone: z.string().trim().regex(/^[0-9()+\-. ]{7,20}$/, "Enter a phone number, e.g. (541) 555-0148."),
});
export type OrganizationSettings = z.infer<typeof organizationSchema>;

export const shippingRatesSchema = z
  .object({
    tiers: z
      .array(
        z.object({
          maxBillableLb: z.number({ error: "Enter a weight in whole pounds." }).int("Use whole pounds.").min(1, "At least 1 lb.").max(500, "At most 500 lb."),
          cents: z.number({ error: "Enter a price." }).int("Prices are whole cents.").min(0, "A price cannot be negative.").max(100_000, "At most $1,000 a parcel."),
        }),
      )
      .min(1, "Keep at least one tier.")
      .max(20, "At most 20 tiers."),
  })
  .superRefine(({ tiers }, ctx) => {
    const seen = new Set<number>();
    tiers.forEach((t, i) => {
      if (seen.has(t.maxBillableLb)) ctx.addIssue({ code: "custom", path: ["tiers", i, "maxBillableLb"], message: "Each tier needs its own weight limit." });
      seen.add(t.maxBillableLb);
    });
  });
export type ShippingRates = z.infer<typeof shippingRatesSchema>;

export const taxRatesSchema = z.object({
  rates: z
    .array(
      z.object({
        state: z.enum(US_STATE_CODES),
        basisPoints: z.number({ error: "Enter a rate." }).int("Use hundredths of a percent.").min(0, "A rate cannot be negative.").max(2000, "At most 20%."),
      }),
    )
    .max(US_STATE_CODES.length),
});
export type TaxRates = z.infer<typeof taxRatesSchema>;
