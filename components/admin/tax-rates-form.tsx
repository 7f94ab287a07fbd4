"use client";

import { useState } from "react";
import { saveTaxRatesAction } from "@/lib/admin/actions";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/form-error";
import { Input } from "@/components/ui/input";
import { useToast } from "@/components/ui/toast";
import { US_STATE_CODES, US_STATES, type UsState } from "@/lib/checkout/us-states";

/** Sales tax per state in percent, applied to houses only; blank means none collected. */
export function TaxRatesForm({ initial }: { initial: { state: string; basisPoints: number }[] }) {
  const toast = useToast();
  const [values, setValues] = useState<Record<string, string>>(Object.fromEntries(initial.map((r) => [r.state, (r.basisPoints / 100).toString()])));
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function save(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true);
    setError(null);
    const rates = Object.entries(values)
      .filter(([, v]) => v.trim() !== "")
      .map(([state, v]) => ({ state: state as UsState, basisPoints: Math.round(Number(v) * 100) }));
    const result = await saveTaxRatesAction({ rates });
    setBusy(false);
    if (result.ok) toast.notify({ tone: "good", title: `Saved tax rates for ${result.data.saved} states.` });
    else setError(result.error.message);
  }

  return (
    <form onSubmit={save} className="flex flex-col gap-4">
      <div className="grid grid-cols-2 gap-x-6 gap-y-2 sm:grid-cols-3 lg:grid-cols-4">
        {US_STATE_CODES.map((code) => (
          <label key={code} className="flex items-center justify-between gap-2">
            <span className="text-sm">{US_STATES[code]}</span>
            <span className="flex items-center gap-1">
              <Input className="w-20" inputMode="decimal" value={values[code] ?? ""} onChange={(e) => setValues((v) => ({ ...v, [code]: e.target.value }))} />
              <span aria-hidden="true">%</span>
            </span>
          </label>
        ))}
      </div>
      <FormError message={error} />
      <div>
        <Button type="submit" loading={busy}>
          Save tax rates
        </Button>
      </div>
    </form>
  );
}
