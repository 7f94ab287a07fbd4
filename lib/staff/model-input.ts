import { z } from "zod";
import { houseSpecSchema } from "@/lib/catalog/spec";

// One schema for a house model as staff list it: the create and edit forms validate with it in
// the browser, and the server actions validate with it again.

const text = ({ label, min, max }: { label: string; min: number; max: number }) =>
  z
    .string({ error: `Enter the ${label}.` })
    .trim()
    .min(min, min <= 1 ? `Enter the ${label}.` : `The ${label} needs at least ${min} characters.`)
    .max(max, `Keep the ${label} to ${max} characters.`);

const cartonLength = (label: string) =>
  z
    .number({ error: `Enter the carton ${label} in inches.` })
    .min(1, `The carton ${label} must be at least 1 in.`)
    .max(108, `The carton ${label} must be at most 108 in (the longest parcel carriers take).`);

export const MOUNTS = ["pole", "building"] as const;
export type Mount = (typeof MOUNTS)[number];
// Trees are left out on purpose: tree-mounted houses are seldom taken up (product brief, P1).
export const MOUNT_LABELS: Record<Mount, string> = { pole: "Pole", building: "Building wall" };

export const modelInputSchema = z.object({
  name: text({ label: "model name", min: 3, max: 80 }),
  tagline: z.string().trim().max(140, "Keep the tagline to 140 characters."),
  description: z.string().trim().max(2000, "Keep the description to 2,000 characters."),
  priceCents: z
    .number({ error: "Enter the price in dollars, like 149 or 149.50." })
    .int("Enter the price in whole cents.")
    .min(100, "The price must be at least $1.00.")
    .max(500_000, "The price must be at most $5,000.00."),
  builderName: text({ label: "builder's name", min: 2, max: 100 }),
  mounts: z.array(z.enum(MOUNTS)).min(1, "Choose at least one way to mount it."),
  backToBackKit: z.boolean(),
  carton: z.object({
    lengthIn: cartonLength("length"),
    widthIn: cartonLength("width"),
    heightIn: cartonLength("height"),
    weightLb: z
      .number({ error: "Enter the packed weight in pounds." })
      .min(0.5, "The packed weight must be at least 0.5 lb.")
      .max(150, "The packed weight must be at most 150 lb (the most parcel carriers take)."),
  }),
  lowStockThreshold: z
    .number({ error: "Enter the low-stock mark as a whole number." })
    .int("Enter the low-stock mark as a whole number.")
    .min(0, "The low-stock mark cannot be negative.")
    .max(100, "The low-stock mark must be at most 100."),
  spec: houseSpecSchema,
});
export type ModelInput = z.infer<typeof modelInputSchema>;

export const updateModelSchema = modelInputSchema.extend({ id: z.uuid("Choose a model.") });
export type UpdateModelInput = z.infer<typeof updateModelSchema>;

export const modelIdSchema = z.object({ id: z.uuid("Choose a model.") });
export type ModelIdInput = z.infer<typeof modelIdSchema>;

/** "Hollow Four (2026)" → "hollow-four-2026": the model's address in the store, made once at creation. */
export function slugify(name: string): string {
  const slug = name
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/&/g, " and ")
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60)
    .replace(/-+$/g, "");
  return slug || "house";
}

/** The first free slug: "hollow-four", then "hollow-four-2", "hollow-four-3"… */
export function firstFreeSlug({
  base,
  taken,
}: {
  base: string;
  taken: ReadonlySet<string>;
}): string {
  if (!taken.has(base)) return base;
  for (let n = 2; ; n++) {
    const candidate = `${base}-${n}`;
    if (!taken.has(candidate)) return candidate;
  }
}
