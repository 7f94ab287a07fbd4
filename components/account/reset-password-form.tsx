"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useActionState, useState } from "react";
import { useForm } from "react-hook-form";
import { resetPasswordAction, resetPasswordFormAction } from "@/lib/mail/actions";
import { Alert } from "@/components/ui/alert";
import { Button, ButtonLink } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormError } from "@/components/ui/form-error";
import { Input } from "@/components/ui/input";
import { PASSWORD_MIN } from "@/lib/auth/password-policy";
import { resetPasswordSchema, type ResetPassword } from "@/lib/mail/password-reset-schemas";

export function ResetPasswordForm({ token }: { token: string }) {
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  // Without script the form posts to this action (the passwords in the body, not the URL).
  const [posted, postAction] = useActionState(resetPasswordFormAction, null);
  const postedFields = posted && !posted.ok ? (posted.error.fields ?? {}) : {};
  const form = useForm<ResetPassword>({
    resolver: zodResolver(resetPasswordSchema),
    defaultValues: { token, password: "", confirm: "" },
  });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setError(null);
    const result = await resetPasswordAction(values);
    if (!result.ok) {
      for (const [field, message] of Object.entries(result.error.fields ?? {})) {
        if (field === "password" || field === "confirm") form.setError(field, { message });
      }
      setError(result.error.message);
      return;
    }
    setDone(true);
  });

  if (done || posted?.ok) {
    return (
      <div className="flex flex-col gap-4">
        <Alert tone="good" title="Your password is changed" live>
          Sign in with your new password. The link you used no longer works.
        </Alert>
        <ButtonLink href="/sign-in">Sign in</ButtonLink>
      </div>
    );
  }

  return (
    <form action={postAction} onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      <FormError message={error ?? (posted && !posted.ok ? posted.error.message : null)} />
      <input type="hidden" defaultValue={token} {...form.register("token")} />
      <Field
        label="New password"
        hint={`At least ${PASSWORD_MIN} characters. A few unrelated words make a strong one; common passwords are refused.`}
        error={errors.password?.message ?? postedFields.password}
        required
      >
        <Input type="password" autoComplete="new-password" {...form.register("password")} />
      </Field>
      <Field label="New password again" error={errors.confirm?.message ?? postedFields.confirm} required>
        <Input type="password" autoComplete="new-password" {...form.register("confirm")} />
      </Field>
      <Button type="submit" loading={isSubmitting}>
        Save the new password
      </Button>
    </form>
  );
}
