"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormError } from "@/components/ui/form-error";
import { Input } from "@/components/ui/input";
import { formatUsd } from "@/lib/checkout/money";
import { fetchJson, isApiError } from "@/lib/http/client";

/** Change the monthly amount or stop, each confirmed before it is done. */
export function MonthlyManage({ id, token, amountCents }: { id: string; token: string | null; amountCents: number }) {
  const router = useRouter();
  const [dollars, setDollars] = useState(String(amountCents / 100));
  const [confirming, setConfirming] = useState<"amount" | "stop" | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const cents = /^\d+(\.\d{1,2})?$/.test(dollars.trim()) ? Math.round(Number(dollars) * 100) : null;

  async function send(method: "PATCH" | "DELETE") {
    setBusy(true);
    setError(null);
    try {
      const body = await fetchJson<{ amountCents: number }>(`/api/giving/monthly/${id}`, {
        method,
        json: method === "PATCH" ? { amountCents: cents, ...(token ? { token } : {}) } : token ? { token } : {},
      });
      setConfirming(null);
      setDone(method === "PATCH" ? `Done: your monthly gift is now ${formatUsd(body.amountCents)}, from the next payment on. We sent you a confirmation.` : "Done: your monthly gift is stopped. No further payment will be taken.");
      router.refresh();
    } catch (failure) {
      setError(isApiError(failure) ? failure.message : "That did not work; please try again.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex flex-col gap-6">
      {done ? (
        <p role="status" className="rounded-lg bg-moss-50 p-3 font-bold text-moss-900">
          {done}
        </p>
      ) : null}
      <section aria-labelledby="amount-heading" className="flex flex-col gap-3">
        <h2 id="amount-heading" className="font-display text-xl font-semibold text-moss-900">
          Change the amount
        </h2>
        <Field label="New monthly amount, in dollars" hint="From $1 to $10,000. The next payment uses it; nothing extra is charged now." error={cents === null ? "Enter an amount such as 30 or 12.50." : undefined}>
          <Input inputMode="decimal" value={dollars} onChange={(e) => { setDollars(e.target.value); setConfirming(null); }} />
        </Field>
        {confirming === "amount" && cents !== null ? (
          <div className="flex flex-wrap items-center gap-3" role="group" aria-label="Confirm the new amount">
            <p>Give {formatUsd(cents)} a month from the next payment?</p>
            <Button onClick={() => send("PATCH")} loading={busy}>Yes, change it</Button>
            <Button variant="ghost" onClick={() => setConfirming(null)}>Keep {formatUsd(amountCents)}</Button>
          </div>
        ) : (
          <div>
            <Button variant="secondary" disabled={cents === null || cents === amountCents} onClick={() => setConfirming("amount")}>Change the amount</Button>
          </div>
        )}
      </section>
      <section aria-labelledby="stop-heading" className="flex flex-col gap-3">
        <h2 id="stop-heading" className="font-display text-xl font-semibold text-moss-900">
          Stop the monthly gift
        </h2>
        {confirming === "stop" ? (
          <div className="flex flex-wrap items-center gap-3" role="group" aria-label="Confirm stopping">
            <p>Stop your monthly gift now? No further payment will be taken.</p>
            <Button variant="danger" onClick={() => send("DELETE")} loading={busy}>Yes, stop it</Button>
            <Button variant="ghost" onClick={() => setConfirming(null)}>Keep giving</Button>
          </div>
        ) : (
          <div>
            <Button variant="danger" onClick={() => setConfirming("stop")}>Stop my monthly gift</Button>
          </div>
        )}
      </section>
      <FormError message={error} />
    </div>
  );
}
