"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { useToast } from "@/components/ui/toast";
import { saveGivingSettingsAction } from "@/lib/giving/actions";
import { givingSettingsSchema, type GivingSettings } from "@/lib/giving/settings-schema";

/** The center's time zone, the card fee a donor may cover and the workshop's lead time. */
export function GivingSettingsForm({ initial }: { initial: GivingSettings }) {
  const toast = useToast();
  const form = useForm({ resolver: zodResolver(givingSettingsSchema), defaultValues: initial });
  const { errors, isSubmitting } = form.formState;
  const onSubmit = form.handleSubmit(async (values) => {
    const result = await saveGivingSettingsAction(values);
    if (result.ok) toast.notify({ tone: "good", title: "The giving settings are saved." });
    else {
      for (const [k, m] of Object.entries(result.error.fields ?? {})) form.setError(k as keyof GivingSettings, { message: m });
      toast.notify({ tone: "poor", title: result.error.message });
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4 sm:grid-cols-2">
      <Field
        label="The center's time zone"
        hint="An IANA name such as America/Los_Angeles. Every gift's date, the statement year and the January run follow it."
        error={errors.timeZone?.message}
        required
      >
        <Input {...form.register("timeZone")} autoComplete="off" />
      </Field>
      <Field label="Workshop lead time, weeks" hint="How long a batch of houses takes to build and certify." error={errors.leadTimeWeeks?.message} required>
        <Input type="number" inputMode="numeric" min={0} max={52} {...form.register("leadTimeWeeks")} />
      </Field>
      <Field label="Card fee, hundredths of a percent" hint="290 means 2.9%. Offered to donors who choose to cover the fee." error={errors.feeBasisPoints?.message} required>
        <Input type="number" inputMode="numeric" min={0} max={1000} {...form.register("feeBasisPoints")} />
      </Field>
      <Field label="Card fee, fixed part in cents" hint="30 means $0.30 per payment." error={errors.feeFixedCents?.message} required>
        <Input type="number" inputMode="numeric" min={0} max={500} {...form.register("feeFixedCents")} />
      </Field>
      <div className="sm:col-span-2">
        <Button type="submit" loading={isSubmitting}>
          Save the giving settings
        </Button>
      </div>
    </form>
  );
}
