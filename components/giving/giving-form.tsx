"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { GiftPicker, giftDollarsToCents } from "@/components/checkout/gift-picker";
import { Button } from "@/components/ui/button";
import { Checkbox } from "@/components/ui/checkbox";
import { Field } from "@/components/ui/field";
import { FormError } from "@/components/ui/form-error";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { formatUsd } from "@/lib/checkout/money";
import { feeToCover } from "@/lib/giving/fee";

type Contact = { name: string; email: string };
type Fee = { basisPoints: number; fixedCents: number };

function feeWords({ basisPoints, fixedCents }: Fee): string {
  return `${(basisPoints / 100).toFixed(basisPoints % 100 === 0 ? 0 : 1)}% + ${formatUsd(fixedCents)}`;
}

/** A gift on its own, once or every month, with the card fee covered and a tribute if the donor wishes. */
export function GivingForm({ defaultContact, fee }: { defaultContact: Contact | null; fee: Fee }) {
  const router = useRouter();
  const [frequency, setFrequency] = useState<"once" | "monthly">("once");
  const [gift, setGift] = useState("25");
  const [coverFee, setCoverFee] = useState(false);
  const [contact, setContact] = useState<Contact>(defaultContact ?? { name: "", email: "" });
  const [tributeOn, setTributeOn] = useState(false);
  const [tribute, setTribute] = useState({ kind: "honor" as "honor" | "memory", name: "", noticeOn: false, noticeName: "", noticeEmail: "", showAmount: false });
  const [error, setError] = useState<string | null>(null);
  const [fields, setFields] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);
  const cents = giftDollarsToCents(gift);
  const giftError = cents === null || cents < 100 || cents > 1_000_000 ? "Choose a gift between $1 and $10,000." : undefined;
  const added = !giftError && cents !== null && coverFee ? feeToCover({ giftCents: cents, basisPoints: fee.basisPoints, fixedCents: fee.fixedCents }) : 0;
  const monthly = frequency === "monthly";

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    setError(null);
    setFields({});
    if (giftError || cents === null) return setError(giftError ?? "Choose a gift.");
    setBusy(true);
    try {
      const body = monthly
        ? { amountCents: cents, contact, coverFee }
        : {
            amountCents: cents,
            contact,
            coverFee,
            ...(tributeOn
              ? {
                  tribute: {
                    kind: tribute.kind,
                    name: tribute.name,
                    ...(tribute.noticeOn ? { notice: { name: tribute.noticeName, email: tribute.noticeEmail, showAmount: tribute.showAmount } } : {}),
                  },
                }
              : {}),
          };
      const res = await fetch(monthly ? "/api/giving/monthly" : "/api/giving/once", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
      const answer = await res.json();
      if (!res.ok) {
        setFields(answer?.error?.fields ?? {});
        return setError(answer?.error?.message ?? "That did not work; please try again.");
      }
      if (monthly) router.push(answer.managePath);
      else router.push(`/checkout/${answer.orderId}?t=${encodeURIComponent(answer.accessToken)}`);
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-6">
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 font-bold">How often</legend>
        <div className="flex flex-wrap gap-4">
          {(["once", "monthly"] as const).map((f) => (
            <label key={f} className="flex min-h-11 items-center gap-2">
              <input type="radio" name="frequency" value={f} checked={frequency === f} onChange={() => setFrequency(f)} className="size-5" />
              {f === "once" ? "Once" : "Every month"}
            </label>
          ))}
        </div>
        {monthly ? <p className="text-sm text-ink-soft">Charged on the same day each month. Change the amount or stop at any time from the link we e-mail you; each payment gets its own receipt.</p> : null}
      </fieldset>
      <GiftPicker value={gift} onChange={setGift} error={giftError} allowNone={false} />
      <Checkbox
        checked={coverFee}
        onChange={(e) => setCoverFee(e.target.checked)}
        label={`Cover the card fee (${feeWords(fee)})${added > 0 ? `: add ${formatUsd(added)}` : ""}`}
        hint={
          added > 0 && cents !== null
            ? `You will be charged ${formatUsd(cents + added)}${monthly ? " a month" : ""}, so your whole ${formatUsd(cents)} reaches the bats. The addition is part of your gift.`
            : "The card processor keeps a small part of each payment; covering it means all of your gift reaches the bats."
        }
      />
      {!monthly ? (
        <fieldset className="flex flex-col gap-3">
          <legend className="sr-only">Tribute</legend>
          <Checkbox checked={tributeOn} onChange={(e) => setTributeOn(e.target.checked)} label="Give in honour or in memory of someone" />
          {tributeOn ? (
            <div className="flex flex-col gap-3 border-l-4 border-paper-200 pl-4">
              <Field label="The gift is" required>
                <Select value={tribute.kind} onChange={(e) => setTribute({ ...tribute, kind: e.target.value as "honor" | "memory" })}>
                  <option value="honor">In honour of</option>
                  <option value="memory">In memory of</option>
                </Select>
              </Field>
              <Field label="Their name" hint="Shown on your receipt." error={fields["tribute.name"]} required>
                <Input value={tribute.name} onChange={(e) => setTribute({ ...tribute, name: e.target.value })} />
              </Field>
              <Checkbox checked={tribute.noticeOn} onChange={(e) => setTribute({ ...tribute, noticeOn: e.target.checked })} label="E-mail a notice of the gift to someone" />
              {tribute.noticeOn ? (
                <>
                  <Field label="Their name" error={fields["tribute.notice.name"]} required>
                    <Input value={tribute.noticeName} onChange={(e) => setTribute({ ...tribute, noticeName: e.target.value })} />
                  </Field>
                  <Field label="Their e-mail" hint="We write to them once, after your payment, and never again unless they ask." error={fields["tribute.notice.email"]} required>
                    <Input type="email" value={tribute.noticeEmail} onChange={(e) => setTribute({ ...tribute, noticeEmail: e.target.value })} />
                  </Field>
                  <Checkbox
                    checked={tribute.showAmount}
                    onChange={(e) => setTribute({ ...tribute, showAmount: e.target.checked })}
                    label="Say how much I gave"
                    hint="Unless you tick this, the notice does not mention the amount."
                  />
                </>
              ) : null}
            </div>
          ) : null}
        </fieldset>
      ) : (
        <p className="text-sm text-ink-soft">A gift in honour or in memory of someone can be made as a one-time gift.</p>
      )}
      <Field label="Your name" hint="As it should appear on your receipt." error={fields["contact.name"]} required>
        <Input autoComplete="name" value={contact.name} onChange={(e) => setContact({ ...contact, name: e.target.value })} />
      </Field>
      <Field label="E-mail" hint={monthly ? "We send each receipt and your private link to manage the monthly gift here." : "We send the receipt here."} error={fields["contact.email"]} required>
        <Input type="email" autoComplete="email" value={contact.email} onChange={(e) => setContact({ ...contact, email: e.target.value })} />
      </Field>
      <FormError message={error} />
      <Button type="submit" size="lg" loading={busy}>
        {monthly ? "Continue to the first payment" : "Continue to payment"}
      </Button>
    </form>
  );
}
