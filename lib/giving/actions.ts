"use server";

import { revalidatePath } from "next/cache";
import { action } from "@/lib/http/action";
import { saveGivingSettings } from "./commands/settings";
import { givingSettingsSchema } from "./settings-schema";

export const saveGivingSettingsAction = action({ permission: "admin:settings" }, givingSettingsSchema, async (input) => {
  await saveGivingSettings(input);
  revalidatePath("/admin/settings");
  return { saved: true };
});
