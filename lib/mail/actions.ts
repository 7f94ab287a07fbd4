"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { z } from "zod";
import { action, formAction } from "@/lib/http/action";
import { preferencesSchema, unsubscribeSchema, yearEndRequestSchema } from "@/lib/mail/account-schemas";
import { resendOutboxMessage } from "@/lib/mail/commands/outbox";
import { requestYearEndStatement } from "@/lib/mail/commands/year-end";
import { requestPasswordReset, resetPassword } from "@/lib/mail/commands/password-reset";
import { forgotPasswordSchema, RESET_REQUESTED_MESSAGE, resetPasswordSchema } from "@/lib/mail/password-reset-schemas";
import { setSeasonalReminders, unsubscribeByToken } from "@/lib/mail/commands/preferences";

// Server actions for e-mail: preferences, statements, password resets and the admin's "send
// again". Each checks the session and role on the server (`action`).

export const savePreferencesAction = action(
  { permission: "account" },
  preferencesSchema,
  async ({ seasonalReminders }, user) => {
    if (!user) throw new Error("the account permission always loads the user");
    await setSeasonalReminders({ userId: user.id, on: seasonalReminders });
    return { seasonalReminders };
  },
);

export const emailYearEndStatementAction = action(
  { permission: "account" },
  yearEndRequestSchema,
  async ({ year }, user) => {
    if (!user) throw new Error("the account permission always loads the user");
    return requestYearEndStatement({ userId: user.id, email: user.email, year });
  },
);

// No sign-in: the token in the link is the permission (RFC 8058 one-click semantics).
export const unsubscribeAction = action({ public: true }, unsubscribeSchema, async ({ token }) => ({
  result: await unsubscribeByToken({ token }),
}));

// The same answer for every address: whether an account exists is never revealed here.
export const forgotPasswordAction = action(
  { public: true },
  forgotPasswordSchema,
  async ({ email }) => {
    await requestPasswordReset({ email });
    return { message: RESET_REQUESTED_MESSAGE };
  },
);

export const resetPasswordAction = action(
  { public: true },
  resetPasswordSchema,
  async ({ token, password }) => {
    await resetPassword({ token, password });
    return { changed: true };
  },
);

const resendSchema = z.object({ id: z.uuid("Choose a message.") });

export const resendMailAction = action(
  { permission: "admin:mail" },
  resendSchema,
  async ({ id }) => {
    const result = await resendOutboxMessage({ id });
    revalidatePath("/admin/mail");
    return result;
  },
);

// The same two actions answering a plain form post, for a page whose script has not run.
// The request answers with a redirect to a page of its own: /forgot-password is prerendered, and a
// browser without script would not see the action's state in it.
const forgotPasswordForm = formAction(forgotPasswordAction);
export async function forgotPasswordFormAction(...args: Parameters<typeof forgotPasswordForm>): ReturnType<typeof forgotPasswordForm> {
  const result = await forgotPasswordForm(...args);
  if (result.ok) redirect("/forgot-password/sent");
  return result;
}
const resetPasswordForm = formAction(resetPasswordAction);
export async function resetPasswordFormAction(...args: Parameters<typeof resetPasswordForm>) {
  return resetPasswordForm(...args);
}
