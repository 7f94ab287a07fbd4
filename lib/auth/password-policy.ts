import { z } from "zod";
import { COMMON_PASSWORDS } from "./common-passwords";

// OWASP ASVS 5.0 (2025): 6.2.1 at least 8 characters; 6.2.9 at least 64 allowed;
// 6.2.5 no composition rules; 6.2.4 refuse common passwords. 128 is our ceiling against hashing abuse.
export const PASSWORD_MIN = 8;
export const PASSWORD_MAX = 128;

export const passwordSchema = z
  .string()
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`)
  .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters.`)
  .refine((p) => !COMMON_PASSWORDS.has(p.toLowerCase()), {
    message: "That password is on the list of commonly used passwords; choose another.",
  });

export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email("Enter an e-mail address like name@example.org."));

export const signUpSchema = z.object({
  name: z.string().trim().min(1, "Tell us your name.").max(120, "Use at most 120 characters."),
  email: emailSchema,
  password: passwordSchema,
});
export type SignUp = z.infer<typeof signUpSchema>;

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, "Enter your password.").max(PASSWORD_MAX, "That password is too long."),
});
export type SignIn = z.infer<typeof signInSchema>;
