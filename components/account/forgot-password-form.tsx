"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useActionState, useState } from "react";
import { useForm } from "react-hook-form";
import { forgotPasswordAction, forgotPasswordFormAction } from "@/lib/mail/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormError } from "@/components/ui/form-error";
import { Input } from "@/components/ui/input";
import { forgotPasswordSchema, type ForgotPassword } from "@/lib/mail/password-reset-schemas";

export function ForgotPasswordForm() {
  const [error, setError] = useState<string | null>(null);
  const [answer, setAnswer] = useState<string | null>(null);
  // Without script the form posts to this action (the address in the body, not the URL).
  const [posted, postAction] = useActionState(forgotPasswordFormAction, null);
  const shownAnswer = answer ?? (posted?.ok ? posted.data.message : null);
  const form = useForm<ForgotPassword>({
    resolver: zodResolver(forgotPasswordSchema),
    defaultValues: { email: "" },
  });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setError(null);
    const result = await forgotPasswordAction(values);
    if (!result.ok) {
      const field = result.error.fields?.email;
      if (field) form.setError("email", { message: field });
      setError(result.error.message);
      return;
    }
    setAnswer(result.data.message);
  });

  return (
    <form action={postAction} onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      <FormError message={error ?? (posted && !posted.ok ? posted.error.message : null)} />
      <Field label="E-mail" error={errors.email?.message ?? (posted && !posted.ok ? posted.error.fields?.email : undefined)} required>
        <Input type="email" autoComplete="email" {...form.register("email")} />
      </Field>
      <Button type="submit" loading={isSubmitting}>
        Send the link
      </Button>
      {shownAnswer ? (
        <Alert tone="good" title="Check your inbox" live>
          {shownAnswer}
        </Alert>
      ) : null}
    </form>
  );
}
