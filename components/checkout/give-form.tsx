"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormError } from "@/components/ui/form-error";
import { Input } from "@/components/ui/input";
import { contactSchema } from "@/lib/checkout/schemas";
import type { z } from "zod";
import { GiftPicker, giftDollarsToCents } from "./gift-picker";

type Contact = z.infer<typeof contactSchema>;

/** A gift on its own, from a guest or a signed-in supporter. */
export function GiveForm({ defaultContact }: { defaultContact: Contact | null }) {
  const router = useRouter();
  const [gift, setGift] = useState("25");
  const [error, setError] = useState<string | null>(null);
  const form = useForm<Contact>({ resolver: zodResolver(contactSchema), defaultValues: defaultContact ?? { name: "", email: "" } });
  const cents = giftDollarsToCents(gift);
  const giftError = cents === null || cents < 100 || cents > 1_000_000 ? "Choose a gift between $1 and $10,000." : undefined;

  const onSubmit = form.handleSubmit(async (contact) => {
    setError(null);
    if (giftError) return setError(giftError);
    const res = await fetch("/api/checkout", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ items: [], method: "pickup", giftCents: cents, contact }),
    });
    const body = await res.json();
    if (!res.ok) return setError(body?.error?.message ?? "That did not work; please try again.");
    router.push(`/checkout/${body.orderId}?t=${encodeURIComponent(body.accessToken)}`);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6">
      <GiftPicker value={gift} onChange={setGift} error={giftError} allowNone={false} />
      <Field label="Your name" hint="As it should appear on your receipt." error={form.formState.errors.name?.message} required>
        <Input autoComplete="name" {...form.register("name")} />
      </Field>
      <Field label="E-mail" hint="We send the receipt here." error={form.formState.errors.email?.message} required>
        <Input type="email" autoComplete="email" {...form.register("email")} />
      </Field>
      <FormError message={error} />
      <Button type="submit" size="lg" loading={form.formState.isSubmitting}>
        Continue to payment
      </Button>
    </form>
  );
}
