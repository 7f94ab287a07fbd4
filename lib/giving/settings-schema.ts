import { z } from "zod";
import { isTimeZone } from "./center-time";

/** What the admin may set: the center's time zone, the card fee a donor may cover, the workshop's lead time. */
export const givingSettingsSchema = z.object({
  timeZone: z
    .string()
    .trim()
    .min(1, "Choose the center's time zone.")
    .refine(isTimeZone, "Not a time zone this server knows; use a name such as America/Los_Angeles."),
  feeBasisPoints: z.coerce.number().int().min(0).max(1000, "At most 10%."),
  feeFixedCents: z.coerce.number().int().min(0).max(500, "At most $5.00."),
  leadTimeWeeks: z.coerce.number().int().min(0).max(52, "At most 52 weeks."),
});
export type GivingSettings = z.infer<typeof givingSettingsSchema>;
