"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useMemo, useState, type ReactNode } from "react";
import { useForm, useWatch, type DefaultValues, type Path } from "react-hook-form";
import { createModelAction, updateModelAction } from "@/lib/staff/actions";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/form-error";
import { useToast } from "@/components/ui/toast";
import { checkDraftDesign } from "@/lib/staff/draft-check";
import { modelInputSchema, type ModelInput } from "@/lib/staff/model-input";
import { DesignCheckSummary } from "./design-check-summary";
import { CartonFieldset, ListingFieldset } from "./listing-fieldset";
import { SpecFieldset } from "./spec-fieldset";

const NEW_MODEL: DefaultValues<ModelInput> = {
  name: "",
  tagline: "",
  description: "",
  builderName: "",
  mounts: ["pole", "building"],
  backToBackKit: false,
  spec: { seamsSealed: false, openBottom: true, vented: false },
};

function Section({
  title,
  description,
  children,
}: {
  title: string;
  description?: string;
  children: ReactNode;
}) {
  return (
    <section className="rounded-2xl border border-paper-300 bg-paper-50 p-5 shadow-card sm:p-6">
      <h2 className="font-display text-xl font-semibold text-moss-900">{title}</h2>
      {description ? <p className="mt-1 text-sm text-ink-soft">{description}</p> : null}
      <div className="mt-5">{children}</div>
    </section>
  );
}

/** Create or edit a model; the design check runs on every change with the server's own function. */
export function ModelForm({ model }: { model?: { id: string; input: ModelInput } }) {
  const router = useRouter();
  const toast = useToast();
  const [error, setError] = useState<string | null>(null);
  const form = useForm<ModelInput>({
    resolver: zodResolver(modelInputSchema),
    defaultValues: model?.input ?? NEW_MODEL,
    mode: "onTouched",
  });
  const spec = useWatch({ control: form.control, name: "spec" });
  // A fresh object each render from useWatch; the check is cheap, but memoising on a stable key
  // keeps the summary's live region from re-announcing identical text.
  const specKey = JSON.stringify(spec ?? {}, (_k, v: unknown) =>
    typeof v === "number" && Number.isNaN(v) ? "NaN" : v,
  );
  const check = useMemo(() => checkDraftDesign(spec ?? {}), [specKey]); // eslint-disable-line react-hooks/exhaustive-deps -- keyed on the serialized spec on purpose

  const onSubmit = form.handleSubmit(async (values) => {
    setError(null);
    const result = model
      ? await updateModelAction({ id: model.id, ...values })
      : await createModelAction(values);
    if (!result.ok) {
      for (const [field, message] of Object.entries(result.error.fields ?? {})) {
        if (field !== "_" && field !== "id") form.setError(field as Path<ModelInput>, { message });
      }
      setError(result.error.message);
      return;
    }
    if (model) {
      toast.notify({
        tone: "good",
        title: "Saved.",
        description: "The listing and its design check are up to date.",
      });
      router.refresh();
    } else {
      toast.notify({
        tone: "good",
        title: `${values.name} is saved as a draft.`,
        description: "Add photos and record an inspection before publishing.",
      });
      router.push(`/staff/models/${result.data.slug}`);
    }
  });

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_19rem] lg:items-start"
    >
      <div className="flex min-w-0 flex-col gap-6">
        <FormError message={error} />
        <Section title="Listing" description="What buyers read in the catalog.">
          <ListingFieldset form={form} />
        </Section>
        <Section
          title="Design"
          description="As listed by the builder. Each criterion is checked beside the value it reads, as you type."
        >
          <SpecFieldset form={form} check={check} />
        </Section>
        <Section
          title="Carton and stock"
          description="The shipping carton sets the billable weight; the low-stock mark tells the workshop when to ask for more."
        >
          <CartonFieldset form={form} />
        </Section>
        <div className="flex flex-wrap items-center gap-3">
          <Button type="submit" size="lg" loading={form.formState.isSubmitting}>
            {model ? "Save changes" : "Save as a draft"}
          </Button>
          {Object.keys(form.formState.errors).length > 0 ? (
            <p className="text-sm font-bold text-berry-700">
              Some fields need a look; each says what is wrong.
            </p>
          ) : null}
        </div>
      </div>
      <DesignCheckSummary check={check} className="lg:sticky lg:top-4" />
    </form>
  );
}
