import { z } from "zod";
import { inspectionMeasurementsSchema } from "@/lib/catalog/certification";

// An inspection as staff record it: the measured values of a built unit, who measured and when.
// The result (pass or not) is never typed: the server computes it from the listing.

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

export function isRealDate(text: string): boolean {
  if (!ISO_DATE.test(text)) return false;
  const date = new Date(`${text}T00:00:00Z`);
  return !Number.isNaN(date.getTime()) && date.toISOString().slice(0, 10) === text;
}

export const inspectionInputSchema = z.object({
  modelId: z.uuid("Choose a model."),
  measured: inspectionMeasurementsSchema,
  inspector: z
    .string({ error: "Enter who measured the house." })
    .trim()
    .min(2, "Enter who measured the house.")
    .max(100, "Keep the inspector's name to 100 characters."),
  inspectedOn: z
    .string({ error: "Enter the day it was measured." })
    .refine(isRealDate, "Enter the day as a date, like 2026-05-14.")
    // A day ahead of the server's UTC date is allowed: it is already tomorrow somewhere.
    .refine(
      (d) => d <= new Date(Date.now() + 24 * 3600 * 1000).toISOString().slice(0, 10),
      "The inspection day cannot be in the future.",
    )
    .refine((d) => d >= "2000-01-01", "Enter a day from this century."),
  notes: z.string().trim().max(1000, "Keep the notes to 1,000 characters."),
});
export type InspectionInput = z.infer<typeof inspectionInputSchema>;

/**
 * Noon UTC of the given day: the stored moment then reads as the same calendar day in every U.S.
 * time zone, and the 12-month validity runs from it.
 */
export function inspectionMoment(day: string): Date {
  return new Date(`${day}T12:00:00Z`);
}
