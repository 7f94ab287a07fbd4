"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useActionState, useState } from "react";
import { useForm } from "react-hook-form";
import { signUpAction } from "@/lib/accounts/actions";
import { signUpFormAction } from "@/lib/auth/actions";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormError } from "@/components/ui/form-error";
import { Input } from "@/components/ui/input";
import { PASSWORD_MIN, signUpSchema, type SignUp } from "@/lib/auth/password-policy";

/** `notice`: what the page says after a post without script was refused (lib/auth/form-notices.ts). */
export function SignUpForm({ next, notice = null }: { next: string; notice?: string | null }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  // Without script the browser posts the form to this server action (never a GET with the
  // password in the URL); with script onSubmit takes over.
  const [posted, postAction] = useActionState(signUpFormAction, null);
  const postedFields = posted && !posted.ok ? (posted.error.fields ?? {}) : {};
  const form = useForm<SignUp>({ resolver: zodResolver(signUpSchema), defaultValues: { name: "", email: "", password: "" } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setError(null);
    const result = await signUpAction(values);
    if (!result.ok) {
      for (const [field, message] of Object.entries(result.error.fields ?? {})) {
        if (field === "name" || field === "email" || field === "password") form.setError(field, { message });
      }
      setError(result.error.message);
      return;
    }
    const signedIn = await signIn("credentials", { email: values.email, password: values.password, redirect: false });
    router.push(signedIn?.ok ? next : "/sign-in");
    router.refresh();
  });

  return (
    <form action={postAction} onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      <FormError message={error ?? (posted && !posted.ok ? posted.error.message : notice)} />
      <input type="hidden" name="next" value={next} />
      <Field label="Your name" error={errors.name?.message ?? postedFields.name} required>
        <Input autoComplete="name" {...form.register("name")} />
      </Field>
      <Field label="E-mail" error={errors.email?.message ?? postedFields.email} required>
        <Input type="email" autoComplete="email" {...form.register("email")} />
      </Field>
      <Field
        label="Password"
        hint={`At least ${PASSWORD_MIN} characters. A few unrelated words make a strong one; common passwords are refused.`}
        error={errors.password?.message ?? postedFields.password}
        required
      >
        <Input type="password" autoComplete="new-password" {...form.register("password")} />
      </Field>
      <Button type="submit" loading={isSubmitting}>
        Create account
      </Button>
    </form>
  );
}
