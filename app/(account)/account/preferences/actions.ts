"use server";

import { action } from "@/lib/http/action";
import { preferencesSchema } from "@/lib/mail/account-schemas";
import { setSeasonalReminders } from "@/lib/mail/commands/preferences";

export const savePreferencesAction = action(
  { permission: "account" },
  preferencesSchema,
  async ({ seasonalReminders }, user) => {
    if (!user) throw new Error("the account permission always loads the user");
    await setSeasonalReminders({ userId: user.id, on: seasonalReminders });
    return { seasonalReminders };
  },
);
