"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { savePreferencesAction } from "@/lib/mail/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Checkbox } from "@/components/ui/checkbox";
import { FormError } from "@/components/ui/form-error";
import { preferencesSchema, type Preferences } from "@/lib/mail/account-schemas";

export function PreferencesForm({ initial }: { initial: Preferences }) {
  const [error, setError] = useState<string | null>(null);
  const [saved, setSaved] = useState<Preferences | null>(null);
  const form = useForm<Preferences>({
    resolver: zodResolver(preferencesSchema),
    defaultValues: initial,
  });
  const { isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setError(null);
    setSaved(null);
    const result = await savePreferencesAction(values);
    if (!result.ok) return setError(result.error.message);
    setSaved(result.data);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormError message={error} />
      <Checkbox
        label="Send me the seasonal reminders"
        hint="Three a year at most. Every one has a link to stop them with one click."
        {...form.register("seasonalReminders")}
      />
      <Button type="submit" variant="secondary" loading={isSubmitting} className="self-start">
        Save preferences
      </Button>
      {saved ? (
        <Alert tone="good" live>
          {saved.seasonalReminders
            ? "Saved: you will get the seasonal reminders."
            : "Saved: no seasonal reminders."}
        </Alert>
      ) : null}
    </form>
  );
}
