import type { DefaultValues } from "react-hook-form";
import type { z } from "zod";
import type { placementInputSchema } from "@/lib/placement/schema";

/** What the planner's form holds: the API's input before validation (numbers may be missing). */
export type PlacementFormValues = z.input<typeof placementInputSchema>;

/** Empty number fields are "not given", so the schema says "required" instead of "not a number". */
export function toOptionalNumber(value: unknown): number | undefined {
  if (value === "" || value === null || value === undefined) return undefined;
  return typeof value === "number" ? value : Number(String(value).trim());
}

// Booleans start on the common case (single house, nothing stacked, clear below, no light, no
// predators reported); measurements start empty so the buyer enters their own.
export const PLANNER_DEFAULTS: DefaultValues<PlacementFormValues> = {
  zip: "",
  mount: "pole",
  facingDeg: 160,
  pairedBackToBack: false,
  stacked: false,
  clearFlightPath: true,
  brightLight: false,
  predators: false,
};
