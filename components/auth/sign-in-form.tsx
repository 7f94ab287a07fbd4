"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useActionState, useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { FormError } from "@/components/ui/form-error";
import { signInFormAction } from "@/lib/auth/actions";
import { signInSchema, type SignIn } from "@/lib/auth/password-policy";

/** `notice`: what the page says after a post without script was refused (lib/auth/form-notices.ts). */
export function SignInForm({ next, notice = null }: { next: string; notice?: string | null }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  // Without script the browser posts the form to this server action (the fields in the body,
  // never in the URL); with script onSubmit takes over and the action is not called.
  const [posted, postAction] = useActionState(signInFormAction, null);
  const form = useForm<SignIn>({ resolver: zodResolver(signInSchema), defaultValues: { email: "", password: "" } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setError(null);
    const result = await signIn("credentials", { ...values, redirect: false });
    if (!result || result.error) {
      setError(result?.error && result.error !== "CredentialsSignin" ? result.error : "Sign-in failed. Please try again.");
      return;
    }
    router.push(next);
    router.refresh();
  });

  return (
    <form action={postAction} onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      <FormError message={error ?? (posted && !posted.ok ? posted.error.message : notice)} />
      <input type="hidden" name="next" value={next} />
      <Field label="E-mail" error={errors.email?.message} required>
        <Input type="email" autoComplete="email" {...form.register("email")} />
      </Field>
      <Field label="Password" error={errors.password?.message} required>
        <Input type="password" autoComplete="current-password" {...form.register("password")} />
      </Field>
      <Button type="submit" loading={isSubmitting}>
        Sign in
      </Button>
    </form>
  );
}
