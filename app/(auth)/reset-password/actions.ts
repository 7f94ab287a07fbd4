"use server";

import { action } from "@/lib/http/action";
import { resetPassword } from "@/lib/mail/commands/password-reset";
import { resetPasswordSchema } from "@/lib/mail/password-reset-schemas";

export const resetPasswordAction = action(
  { public: true },
  resetPasswordSchema,
  async ({ token, password }) => {
    await resetPassword({ token, password });
    return { changed: true };
  },
);
