"use client";

import type { UseFormReturn } from "react-hook-form";
import { Checkbox } from "@/components/ui/checkbox";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Textarea } from "@/components/ui/textarea";
import { MOUNTS, MOUNT_LABELS, type ModelInput } from "@/lib/staff/model-input";
import { decimal, dollars, inches, wholeNumber } from "./field-formats";
import { ParsedInput } from "./parsed-input";

type Form = UseFormReturn<ModelInput>;

export function ListingFieldset({ form }: { form: Form }) {
  const { control, register, formState } = form;
  const e = formState.errors;
  return (
    <div className="grid gap-5 md:grid-cols-2">
      <Field label="Model name" error={e.name?.message} required className="md:col-span-2">
        <Input {...register("name")} />
      </Field>
      <Field
        label="Tagline"
        hint="One line for the catalog card."
        error={e.tagline?.message}
        className="md:col-span-2"
      >
        <Input {...register("tagline")} />
      </Field>
      <Field label="Description" error={e.description?.message} className="md:col-span-2">
        <Textarea rows={4} {...register("description")} />
      </Field>
      <Field label="Price (USD)" hint="Like 149 or 149.50." error={e.priceCents?.message} required>
        <ParsedInput
          control={control}
          name="priceCents"
          inputMode="decimal"
          parse={dollars.parse}
          format={dollars.format}
        />
      </Field>
      <Field
        label="Builder"
        hint="The volunteer group or woodworker who builds it."
        error={e.builderName?.message}
        required
      >
        <Input {...register("builderName")} />
      </Field>
      <fieldset className="flex flex-col gap-2 md:col-span-2">
        <legend className="font-bold text-ink">
          Mounts <span className="ml-1.5 text-sm font-normal text-ink-soft">(required)</span>
        </legend>
        <p className="text-sm text-ink-soft">
          Trees are not offered: houses on trees are seldom taken up.
        </p>
        <div className="flex flex-wrap gap-x-6 gap-y-2">
          {MOUNTS.map((m) => (
            <Checkbox key={m} label={MOUNT_LABELS[m]} value={m} {...register("mounts")} />
          ))}
        </div>
        {e.mounts?.message ? (
          <p className="text-sm font-bold text-berry-700">{e.mounts.message}</p>
        ) : null}
      </fieldset>
      <Checkbox
        className="md:col-span-2"
        label="Sold as a back-to-back pair for one pole"
        {...register("backToBackKit")}
      />
    </div>
  );
}

export function CartonFieldset({ form }: { form: Form }) {
  const { control, formState } = form;
  const e = formState.errors;
  const box = (name: "lengthIn" | "widthIn" | "heightIn", label: string) => (
    <Field label={label} hint="Inches" error={e.carton?.[name]?.message} required>
      <ParsedInput
        control={control}
        name={`carton.${name}`}
        inputMode="decimal"
        parse={inches.parse}
        format={inches.format}
      />
    </Field>
  );
  return (
    <div className="grid gap-5 sm:grid-cols-2 lg:grid-cols-4">
      {box("lengthIn", "Carton length")}
      {box("widthIn", "Carton width")}
      {box("heightIn", "Carton height")}
      <Field label="Packed weight" hint="Pounds" error={e.carton?.weightLb?.message} required>
        <ParsedInput
          control={control}
          name="carton.weightLb"
          inputMode="decimal"
          parse={decimal.parse}
          format={decimal.format}
        />
      </Field>
      <Field
        label="Low-stock mark"
        hint="The workshop home lists this model when stock falls to this many."
        error={e.lowStockThreshold?.message}
        required
        className="sm:col-span-2"
      >
        <ParsedInput
          control={control}
          name="lowStockThreshold"
          inputMode="numeric"
          parse={wholeNumber.parse}
          format={wholeNumber.format}
        />
      </Field>
    </div>
  );
}
