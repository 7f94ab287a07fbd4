"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm, useWatch } from "react-hook-form";
import { applyFieldErrors } from "@/lib/http/client";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { shipBoxSchema, type ShipBoxInput } from "@/lib/fulfillment/schemas";
import { CARRIER_LABELS, CARRIERS, type Carrier } from "@/lib/fulfillment/tracking";
import type { NextStepBox } from "./ship-box";
import type { useOrderAction } from "./use-order-action";

// Services the center uses most, offered as suggestions; any other name can be typed.
const SERVICES: Record<Carrier, string[]> = {
  ups: ["Ground", "3 Day Select", "2nd Day Air"],
  usps: ["Ground Advantage", "Priority Mail"],
  fedex: ["Ground", "Home Delivery", "Express Saver"],
  other: [],
};

type Props = { orderId: string; version: number; box: NextStepBox; position: number; action: ReturnType<typeof useOrderAction> };

/** Carrier, service and tracking number for one box; the number is checked as you leave the field. */
export function ShipBoxForm({ orderId, version, box, position, action }: Props) {
  const form = useForm<ShipBoxInput>({
    resolver: zodResolver(shipBoxSchema),
    mode: "onTouched",
    defaultValues: { version, carrier: "ups", service: "Ground", trackingNumber: "" },
  });
  const carrier = useWatch({ control: form.control, name: "carrier" });
  const errors = form.formState.errors;
  const listId = `services-${box.id}`;

  async function submit(input: ShipBoxInput) {
    const result = await action.run(
      `/api/fulfillment/orders/${orderId}/boxes/${box.id}/ship`,
      input,
      `Box ${position} is with ${CARRIER_LABELS[input.carrier]}.`,
    );
    if (!result.ok) applyFieldErrors(result, form.setError);
  }

  return (
    <form
      onSubmit={form.handleSubmit(submit)}
      noValidate
      aria-label={`Ship box ${position}`}
      className="grid gap-3 rounded-xl border border-paper-300 p-4 sm:grid-cols-2 lg:grid-cols-[1fr_1fr_2fr_auto] lg:items-start"
    >
      <p className="font-bold sm:col-span-2 lg:col-span-4">
        Box {position}: {box.description}
      </p>
      <Field label="Carrier" error={errors.carrier?.message}>
        <Select {...form.register("carrier")}>
          {CARRIERS.map((c) => (
            <option key={c} value={c}>
              {CARRIER_LABELS[c]}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Service" error={errors.service?.message}>
        <Input list={listId} {...form.register("service")} />
      </Field>
      <datalist id={listId}>
        {SERVICES[carrier].map((s) => (
          <option key={s} value={s} />
        ))}
      </datalist>
      <Field
        label="Tracking number"
        hint={carrier === "other" ? "Any 4 to 40 letters and digits." : "Spaces and dashes are fine; the check digit is verified."}
        error={errors.trackingNumber?.message}
      >
        <Input autoComplete="off" spellCheck={false} className="font-mono" {...form.register("trackingNumber")} />
      </Field>
      <Button type="submit" loading={action.pending} className="lg:mt-8">
        Ship box {position}
      </Button>
    </form>
  );
}
