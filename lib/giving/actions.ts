"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { action } from "@/lib/http/action";
import { saveGivingSettings } from "./commands/settings";
import { resendStatement } from "./commands/statements";
import { givingSettingsSchema } from "./settings-schema";

export const saveGivingSettingsAction = action({ permission: "admin:settings" }, givingSettingsSchema, async (input) => {
  await saveGivingSettings(input);
  revalidatePath("/admin/settings");
  return { saved: true };
});

const resendSchema = z.object({ userId: z.string().uuid(), year: z.number().int().min(2000).max(2100) });

/** The admin's "send again" of one donor's year-end statement (confirmed on the page first). */
export const resendStatementAction = action({ permission: "admin:mail" }, resendSchema, async (input) => {
  await resendStatement(input);
  revalidatePath("/admin/statements");
  return { queued: true };
});
