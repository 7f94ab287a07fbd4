"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useFieldArray, useForm, useWatch } from "react-hook-form";
import { applyFieldErrors } from "@/lib/http/client";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { billableForBox, type BoxDraft } from "@/lib/fulfillment/packing";
import { packSchema, type PackInput } from "@/lib/fulfillment/schemas";
import type { useOrderAction } from "./use-order-action";

type Props = { orderId: string; version: number; defaultBoxes: BoxDraft[]; action: ReturnType<typeof useOrderAction> };

/** One row per box, started from the houses' cartons; the billable weight updates as you type. */
export function PackForm({ orderId, version, defaultBoxes, action }: Props) {
  const form = useForm<PackInput>({
    resolver: zodResolver(packSchema),
    defaultValues: { version, boxes: defaultBoxes },
  });
  const { fields, append, remove } = useFieldArray({ control: form.control, name: "boxes" });
  const boxes = useWatch({ control: form.control, name: "boxes" });
  const errors = form.formState.errors;

  async function submit(input: PackInput) {
    const result = await action.run(`/api/fulfillment/orders/${orderId}/pack`, input, "Boxes recorded; the order is boxed and weighed.");
    if (!result.ok) applyFieldErrors(result, form.setError);
  }

  const number = { valueAsNumber: true } as const;
  return (
    <form onSubmit={form.handleSubmit(submit)} noValidate className="flex flex-col gap-5" aria-label="Record the boxes">
      <p className="text-ink-soft">
        Each house goes in its own carton. Measure and weigh each box as packed; the billable weight is the greater of the weight
        and the size (length × width × height ÷ 139), each rounded up.
      </p>
      {fields.map((field, index) => {
        const billable = billableForBox(boxes?.[index] ?? {});
        const e = errors.boxes?.[index];
        return (
          <fieldset key={field.id} className="grid gap-3 rounded-xl border border-paper-300 p-4 sm:grid-cols-2 lg:grid-cols-[2fr_1fr_1fr_1fr_1fr]">
            <legend className="px-1 font-bold">Box {index + 1}</legend>
            <Field label="What's inside" error={e?.description?.message} className="sm:col-span-2 lg:col-span-1">
              <Input {...form.register(`boxes.${index}.description`)} />
            </Field>
            <Field label="Length (in)" error={e?.lengthIn?.message}>
              <Input type="number" step="0.1" inputMode="decimal" {...form.register(`boxes.${index}.lengthIn`, number)} />
            </Field>
            <Field label="Width (in)" error={e?.widthIn?.message}>
              <Input type="number" step="0.1" inputMode="decimal" {...form.register(`boxes.${index}.widthIn`, number)} />
            </Field>
            <Field label="Height (in)" error={e?.heightIn?.message}>
              <Input type="number" step="0.1" inputMode="decimal" {...form.register(`boxes.${index}.heightIn`, number)} />
            </Field>
            <Field label="Weight (lb)" error={e?.weightLb?.message}>
              <Input type="number" step="0.1" inputMode="decimal" {...form.register(`boxes.${index}.weightLb`, number)} />
            </Field>
            <div className="flex flex-wrap items-center justify-between gap-2 sm:col-span-2 lg:col-span-5">
              <p aria-live="polite">
                {billable ? (
                  <>
                    Billable: <strong>{billable.billableLb} lb</strong>{" "}
                    <span className="text-sm text-ink-soft">
                      (weight {billable.actualLb} lb, size {billable.dimLb} lb)
                    </span>
                  </>
                ) : (
                  <span className="text-ink-soft">Enter all four measurements to see the billable weight.</span>
                )}
              </p>
              {fields.length > 1 ? (
                <Button variant="ghost" size="sm" onClick={() => remove(index)}>
                  Remove box {index + 1}
                </Button>
              ) : null}
            </div>
          </fieldset>
        );
      })}
      {errors.boxes?.message ? <p className="font-bold text-berry-700">{errors.boxes.message}</p> : null}
      <div className="flex flex-wrap gap-3">
        <Button
          variant="secondary"
          onClick={() => append({ description: "Extra box", lengthIn: NaN, widthIn: NaN, heightIn: NaN, weightLb: NaN })}
        >
          Add a box
        </Button>
        <Button type="submit" loading={action.pending}>
          Record {fields.length === 1 ? "the box" : `${fields.length} boxes`} and mark packed
        </Button>
      </div>
    </form>
  );
}
