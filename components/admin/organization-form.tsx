"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { saveOrganizationAction } from "@/lib/admin/actions";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { useToast } from "@/components/ui/toast";
import { organizationSchema, type OrganizationSettings } from "@/lib/admin/settings-schemas";
import { US_STATE_CODES, US_STATES } from "@/lib/checkout/us-states";

const FIELDS: [keyof OrganizationSettings, string, string?][] = [
  ["legalName", "Legal name", "Exactly as registered; printed on every receipt."],
  ["displayName", "Name shown in the store"],
  ["street", "Street address"],
  ["city", "Town or city"],
  ["zip", "ZIP code"],
  ["taxId", "Tax id (EIN)", "Printed on receipts, e.g. 12-3456789."],
  ["email", "E-mail"],
  ["phone", "Phone"],
];

export function OrganizationForm({ initial }: { initial: OrganizationSettings }) {
  const toast = useToast();
  const form = useForm<OrganizationSettings>({ resolver: zodResolver(organizationSchema), defaultValues: initial });
  const { errors, isSubmitting } = form.formState;
  const onSubmit = form.handleSubmit(async (values) => {
    const result = await saveOrganizationAction(values);
    if (result.ok) toast.notify({ tone: "good", title: "The center's details are saved." });
    else {
      for (const [k, m] of Object.entries(result.error.fields ?? {})) form.setError(k as keyof OrganizationSettings, { message: m });
      toast.notify({ tone: "poor", title: result.error.message });
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4 sm:grid-cols-2">
      {FIELDS.map(([name, label, hint]) => (
        <Field key={name} label={label} hint={hint} error={errors[name]?.message} required>
          <Input {...form.register(name)} />
        </Field>
      ))}
      <Field label="State" error={errors.state?.message} required>
        <Select {...form.register("state")}>
          {US_STATE_CODES.map((c) => (
            <option key={c} value={c}>
              {US_STATES[c]}
            </option>
          ))}
        </Select>
      </Field>
      <div className="sm:col-span-2">
        <Button type="submit" loading={isSubmitting}>
          Save the center&apos;s details
        </Button>
      </div>
    </form>
  );
}
