"use server";

import { action } from "@/lib/http/action";
import { requestPasswordReset } from "@/lib/mail/commands/password-reset";
import { forgotPasswordSchema, RESET_REQUESTED_MESSAGE } from "@/lib/mail/password-reset-schemas";

// The same answer for every address: whether an account exists is never revealed here.
export const forgotPasswordAction = action(
  { public: true },
  forgotPasswordSchema,
  async ({ email }) => {
    await requestPasswordReset({ email });
    return { message: RESET_REQUESTED_MESSAGE };
  },
);
