"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { applyFieldErrors } from "@/lib/http/client";
import { recordInspectionAction } from "@/lib/staff/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Checkbox } from "@/components/ui/checkbox";
import { Field } from "@/components/ui/field";
import { FormError } from "@/components/ui/form-error";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { Textarea } from "@/components/ui/textarea";
import { useToast } from "@/components/ui/toast";
import {
  CERTIFICATION_NAME,
  evaluateInspection,
  inspectionMeasurementsSchema,
} from "@/lib/catalog/certification";
import { INTERIOR_SURFACES, INTERIOR_SURFACE_LABELS, type HouseSpec } from "@/lib/catalog/spec";
import { inspectionInputSchema, type InspectionInput } from "@/lib/staff/inspection-input";
import { inches } from "./field-formats";
import { MeasurementTable } from "./measurement-table";
import { ParsedInput } from "./parsed-input";

function localToday(): string {
  const d = new Date();
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, "0")}-${String(d.getDate()).padStart(2, "0")}`;
}

const LENGTHS = [
  ["chamberGapIn", "Chamber gap"],
  ["chamberHeightIn", "Chamber height"],
  ["chamberWidthIn", "Chamber width"],
  ["landingAreaIn", "Landing area"],
] as const;

/** Measured values of a built unit; the verdict is computed from the listing as they are typed. */
export function InspectionForm({
  modelId,
  spec,
  inspectorName,
}: {
  modelId: string;
  spec: HouseSpec;
  inspectorName: string;
}) {
  const router = useRouter();
  const toast = useToast();
  const [error, setError] = useState<string | null>(null);
  const [outcome, setOutcome] = useState<{ passed: boolean } | null>(null);
  const form = useForm<InspectionInput>({
    resolver: zodResolver(inspectionInputSchema),
    defaultValues: {
      modelId,
      inspector: inspectorName,
      inspectedOn: localToday(),
      notes: "",
      measured: { seamsSealed: false },
    },
    mode: "onTouched",
  });
  const { errors } = form.formState;
  const measured = useWatch({ control: form.control, name: "measured" });
  const parsed = inspectionMeasurementsSchema.safeParse(measured);
  const preview = parsed.success ? evaluateInspection({ spec, measured: parsed.data }) : null;

  const onSubmit = form.handleSubmit(async (values) => {
    setError(null);
    setOutcome(null);
    const result = await recordInspectionAction(values);
    if (!result.ok) {
      applyFieldErrors(result.error, form.setError);
      setError(result.error.message);
      return;
    }
    setOutcome({ passed: result.data.passed });
    toast.notify(
      result.data.passed
        ? { tone: "good", title: "Inspection recorded: it passed." }
        : { tone: "warn", title: "Inspection recorded: it did not pass." },
    );
    form.reset({
      modelId,
      inspector: values.inspector,
      inspectedOn: localToday(),
      notes: "",
      measured: { seamsSealed: false },
    });
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      <FormError message={error} />
      <div aria-live="polite" className="empty:hidden">
        {outcome ? (
          <Alert
            tone={outcome.passed ? "good" : "warn"}
            title={
              outcome.passed
                ? "Passed: recorded in the history below"
                : "Did not pass: recorded in the history below"
            }
          >
            {outcome.passed
              ? `If the design meets every required criterion, the model is ${CERTIFICATION_NAME} for 12 months from the inspection day.`
              : "Every measure must match the listing within 1/16 in and meet our criteria. Correct the build or the listing, then inspect again."}
          </Alert>
        ) : null}
      </div>
      <div className="grid gap-5 sm:grid-cols-2">
        {LENGTHS.map(([name, label]) => (
          <Field
            key={name}
            label={`Measured ${label.toLowerCase()}`}
            hint="Inches: 3/4, 23 15/16 or 0.75."
            error={errors.measured?.[name]?.message}
            required
          >
            <ParsedInput
              control={form.control}
              name={`measured.${name}` as const}
              inputMode="decimal"
              parse={inches.parse}
              format={inches.format}
            />
          </Field>
        ))}
        <Field
          label="Inside surface as built"
          error={errors.measured?.roughening?.message}
          required
        >
          <Select
            {...form.register("measured.roughening", {
              setValueAs: (v: unknown) => (v === "" ? undefined : v),
            })}
          >
            <option value="">Choose…</option>
            {INTERIOR_SURFACES.map((s) => (
              <option key={s} value={s}>
                {INTERIOR_SURFACE_LABELS[s]}
              </option>
            ))}
          </Select>
        </Field>
        <div className="flex items-end pb-2">
          <Checkbox
            label="Seams are sealed on the built unit"
            error={errors.measured?.seamsSealed?.message}
            {...form.register("measured.seamsSealed")}
          />
        </div>
        <Field label="Inspector" error={errors.inspector?.message} required>
          <Input autoComplete="name" {...form.register("inspector")} />
        </Field>
        <Field label="Day measured" error={errors.inspectedOn?.message} required>
          <Input type="date" max={localToday()} {...form.register("inspectedOn")} />
        </Field>
        <Field
          label="Notes"
          hint="Anything the next inspector should know."
          error={errors.notes?.message}
          className="sm:col-span-2"
        >
          <Textarea rows={3} {...form.register("notes")} />
        </Field>
      </div>
      {preview ? (
        <div className="flex flex-col gap-2">
          <p className="font-bold text-ink" data-testid="inspection-preview">
            {preview.passed
              ? "As typed, this inspection passes."
              : "As typed, this inspection would not pass."}
          </p>
          <MeasurementTable
            caption="Measured against the listing"
            measurements={preview.measurements}
          />
        </div>
      ) : (
        <p className="text-sm text-ink-soft">
          Enter the measured values to compare them with the listing.
        </p>
      )}
      <div>
        <Button type="submit" size="lg" loading={form.formState.isSubmitting}>
          Record inspection
        </Button>
      </div>
    </form>
  );
}
