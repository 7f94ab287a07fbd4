"use client";

import { useState } from "react";
import { saveShippingRatesAction } from "@/lib/admin/actions";
import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/input";
import { useToast } from "@/components/ui/toast";
import { FormError } from "@/components/ui/form-error";

type Row = { maxBillableLb: string; dollars: string };

/** The parcel rate table: a price per billable-weight tier (PRODUCT.md §5). */
export function ShippingRatesForm({ initial }: { initial: { maxBillableLb: number; cents: number }[] }) {
  const toast = useToast();
  const [rows, setRows] = useState<Row[]>(initial.map((t) => ({ maxBillableLb: String(t.maxBillableLb), dollars: (t.cents / 100).toFixed(2) })));
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const update = (i: number, patch: Partial<Row>) => setRows((r) => r.map((row, j) => (j === i ? { ...row, ...patch } : row)));

  async function save(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true);
    setError(null);
    const tiers = rows.map((r) => ({ maxBillableLb: Number(r.maxBillableLb), cents: Math.round(Number(r.dollars) * 100) }));
    const result = await saveShippingRatesAction({ tiers: tiers.sort((a, b) => a.maxBillableLb - b.maxBillableLb) });
    setBusy(false);
    if (result.ok) toast.notify({ tone: "good", title: `Saved ${result.data.saved} rate tiers.` });
    else setError(result.error.message);
  }

  return (
    <form onSubmit={save} className="flex flex-col gap-3">
      <table className="w-full max-w-md">
        <caption className="sr-only">Parcel rates by billable weight</caption>
        <thead>
          <tr className="text-left">
            <th className="pb-2 font-bold">Up to (billable lb)</th>
            <th className="pb-2 font-bold">Price ($)</th>
            <th className="pb-2">
              <span className="sr-only">Remove</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={i}>
              <td className="py-1 pr-3">
                <Input aria-label={`Tier ${i + 1} weight limit in pounds`} inputMode="numeric" value={r.maxBillableLb} onChange={(e) => update(i, { maxBillableLb: e.target.value })} />
              </td>
              <td className="py-1 pr-3">
                <Input aria-label={`Tier ${i + 1} price in dollars`} inputMode="decimal" value={r.dollars} onChange={(e) => update(i, { dollars: e.target.value })} />
              </td>
              <td className="py-1">
                <Button variant="ghost" size="sm" onClick={() => setRows((all) => all.filter((_, j) => j !== i))} disabled={rows.length === 1}>
                  Remove
                </Button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <FormError message={error} />
      <div className="flex gap-3">
        <Button variant="secondary" onClick={() => setRows((r) => [...r, { maxBillableLb: "", dollars: "" }])}>
          Add a tier
        </Button>
        <Button type="submit" loading={busy}>
          Save rates
        </Button>
      </div>
    </form>
  );
}
