import { z } from "zod";
import { emailSchema, passwordSchema } from "@/lib/auth/password-policy";

// The two forms of the reset flow, shared by the pages (react-hook-form) and the server actions.

export const forgotPasswordSchema = z.object({ email: emailSchema });
export type ForgotPassword = z.infer<typeof forgotPasswordSchema>;

export const resetPasswordSchema = z
  .object({
    token: z
      .string()
      .min(20, "This reset link is incomplete; copy the whole link from the e-mail.")
      .max(200, "This reset link is not one of ours."),
    password: passwordSchema,
    confirm: z.string().min(1, "Type the new password again."),
  })
  .refine((input) => input.password === input.confirm, {
    path: ["confirm"],
    message: "The two passwords are not the same.",
  });
export type ResetPassword = z.infer<typeof resetPasswordSchema>;

/** What the forgot-password form always answers, whether or not the address has an account. */
export const RESET_REQUESTED_MESSAGE =
  "If an account uses that address, we are sending it a link to choose a new password. It works once, for 30 minutes. Check your spam folder if it has not arrived in a few minutes.";
