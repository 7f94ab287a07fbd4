"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch, type Path } from "react-hook-form";
import { applyFieldErrors } from "@/lib/http/client";
import { adjustStockAction, receiveStockAction } from "@/lib/staff/actions";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormError } from "@/components/ui/form-error";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { useToast } from "@/components/ui/toast";
import {
  ADJUST_REASONS,
  ADJUST_REASON_LABELS,
  adjustStockSchema,
  receiveStockSchema,
  type AdjustStockInput,
  type ReceiveStockInput,
} from "@/lib/staff/stock-input";
import { wholeNumber } from "./field-formats";
import { ParsedInput } from "./parsed-input";

function FormCard({
  title,
  description,
  children,
}: {
  title: string;
  description: string;
  children: React.ReactNode;
}) {
  return (
    <section className="rounded-2xl border border-paper-300 bg-paper-50 p-5 shadow-card sm:p-6">
      <h2 className="font-display text-xl font-semibold text-moss-900">{title}</h2>
      <p className="mt-1 text-sm text-ink-soft">{description}</p>
      <div className="mt-4">{children}</div>
    </section>
  );
}

export function ReceiveStockForm({
  modelId,
  builderName,
}: {
  modelId: string;
  builderName: string;
}) {
  const router = useRouter();
  const toast = useToast();
  const [error, setError] = useState<string | null>(null);
  const defaults = { modelId, batch: "", builderName, note: "" };
  const form = useForm<ReceiveStockInput>({
    resolver: zodResolver(receiveStockSchema),
    defaultValues: defaults,
  });
  const { errors } = form.formState;
  const onSubmit = form.handleSubmit(async (values) => {
    setError(null);
    const result = await receiveStockAction(values);
    if (!result.ok) {
      applyFieldErrors(result.error, form.setError);
      return setError(result.error.message);
    }
    toast.notify({
      tone: "good",
      title: `Received ${values.count}.`,
      description: `${result.data.stockAfter} now in stock.`,
    });
    form.reset(defaults);
    router.refresh();
  });
  return (
    <FormCard
      title="Receive from a builder"
      description="A finished batch arrives at the workshop."
    >
      <form onSubmit={onSubmit} noValidate className="grid gap-4 sm:grid-cols-2">
        <div className="sm:col-span-2">
          <FormError message={error} />
        </div>
        <Field label="How many" hint="Houses in this batch." error={errors.count?.message} required>
          <ParsedInput
            control={form.control}
            name="count"
            inputMode="numeric"
            parse={wholeNumber.parse}
            format={wholeNumber.format}
          />
        </Field>
        <Field label="Batch" hint="Like 2026-spring-3." error={errors.batch?.message} required>
          <Input {...form.register("batch")} />
        </Field>
        <Field
          label="Built by"
          error={errors.builderName?.message}
          required
          className="sm:col-span-2"
        >
          <Input {...form.register("builderName")} />
        </Field>
        <Field label="Note" error={errors.note?.message} className="sm:col-span-2">
          <Input {...form.register("note")} />
        </Field>
        <div className="sm:col-span-2">
          <Button type="submit" loading={form.formState.isSubmitting}>
            Receive stock
          </Button>
        </div>
      </form>
    </FormCard>
  );
}

export function AdjustStockForm({ modelId, stock }: { modelId: string; stock: number }) {
  const router = useRouter();
  const toast = useToast();
  const [error, setError] = useState<string | null>(null);
  const defaults = { modelId, note: "" };
  const form = useForm<AdjustStockInput>({
    resolver: zodResolver(adjustStockSchema),
    defaultValues: defaults,
  });
  const { errors } = form.formState;
  const change = useWatch({ control: form.control, name: "change" });
  const onSubmit = form.handleSubmit(async (values) => {
    setError(null);
    const result = await adjustStockAction(values);
    if (!result.ok) {
      for (const [f, message] of Object.entries(result.error.fields ?? {})) {
        form.setError((f === "delta" ? "change" : f) as Path<AdjustStockInput>, { message });
      }
      return setError(result.error.message);
    }
    toast.notify({
      tone: "good",
      title: "Stock adjusted.",
      description: `${result.data.stockAfter} now in stock.`,
    });
    form.reset(defaults);
    router.refresh();
  });
  const after = typeof change === "number" && Number.isInteger(change) ? stock + change : null;
  return (
    <FormCard
      title="Adjust"
      description="Damaged, returned, or a count that does not match the shelf. Every change needs a reason."
    >
      <form onSubmit={onSubmit} noValidate className="grid gap-4">
        <div>
          <FormError message={error} />
        </div>
        <Field label="Reason" error={errors.reason?.message} required>
          <Select
            {...form.register("reason", { setValueAs: (v: unknown) => (v === "" ? undefined : v) })}
          >
            <option value="">Choose…</option>
            {ADJUST_REASONS.map((r) => (
              <option key={r} value={r}>
                {ADJUST_REASON_LABELS[r]}
              </option>
            ))}
          </Select>
        </Field>
        <Field
          label="Change"
          hint={
            after === null
              ? "Negative to remove, like -2; positive to add."
              : after < 0
                ? `That would leave ${after}: stock cannot go below 0.`
                : `Stock goes from ${stock} to ${after}.`
          }
          error={errors.change?.message}
          required
        >
          <ParsedInput
            control={form.control}
            name="change"
            inputMode="numeric"
            parse={wholeNumber.parse}
            format={wholeNumber.format}
          />
        </Field>
        <Field
          label="Note"
          hint="Needed for a recount: what did you find?"
          error={errors.note?.message}
        >
          <Input {...form.register("note")} />
        </Field>
        <div>
          <Button type="submit" variant="secondary" loading={form.formState.isSubmitting}>
            Record adjustment
          </Button>
        </div>
      </form>
    </FormCard>
  );
}
