import { z } from "zod";
import { queryInt } from "@/lib/http/query-number";
import { BAND_IDS } from "./climate-bands";

/** The catalog's filters as they arrive in a URL (`/houses?…` and `GET /api/houses?…`). */
export const catalogQuerySchema = z.object({
  band: z.enum(BAND_IDS, "Choose a band: cool, warm, hot or very-hot.").optional(),
  chambers: queryInt(
    z
      .number({ error: "The number of chambers must be a whole number." })
      .int("The number of chambers must be a whole number.")
      .min(1, "Choose at least 1 chamber.")
      .max(12, "We list houses with at most 12 chambers.")
      .optional(),
  ),
  mount: z.enum(["pole", "building"], "Choose a mount: pole or building.").optional(),
  maxPriceCents: queryInt(
    z
      .number({ error: "The price limit must be a whole number of cents." })
      .int("The price limit must be a whole number of cents.")
      .min(0, "The price limit cannot be negative.")
      .optional(),
  ),
  inStock: z
    .enum(["true", "false", "1", "0"], "inStock must be true or false.")
    .transform((v) => v === "true" || v === "1")
    .optional(),
});
export type CatalogQuery = z.infer<typeof catalogQuerySchema>;
