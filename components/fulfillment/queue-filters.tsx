"use client";

import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { ORDER_STATUS_LABELS } from "@/lib/orders/statuses";
import { PAID_STATES, type QueueParams } from "@/lib/fulfillment/queue-params";

type Props = {
  params: QueueParams;
  searchText: string;
  onSearchText: (text: string) => void;
  onChange: (patch: Partial<QueueParams>) => void;
  onReset: () => void;
  fieldErrors?: Record<string, string>;
};

/** State, method, paid dates and a search box; every change goes straight to the queue. */
export function QueueFilters({ params, searchText, onSearchText, onChange, onReset, fieldErrors }: Props) {
  return (
    <form
      aria-label="Filter the queue"
      className="grid gap-4 rounded-2xl border border-paper-300 bg-paper-50 p-4 shadow-card sm:grid-cols-2 lg:grid-cols-[1.4fr_1fr_1fr_1fr_1.4fr_auto] lg:items-end"
      onSubmit={(e) => e.preventDefault()}
    >
      <div className="flex flex-col gap-1.5">
        <label htmlFor="queue-state" className="font-bold">State</label>
        <Select id="queue-state" value={params.state} onChange={(e) => onChange({ state: e.target.value as QueueParams["state"] })}>
          <option value="open">Needs work</option>
          {PAID_STATES.map((s) => (
            <option key={s} value={s}>
              {ORDER_STATUS_LABELS[s].label}
            </option>
          ))}
          <option value="all">Every paid order</option>
        </Select>
      </div>
      <div className="flex flex-col gap-1.5">
        <label htmlFor="queue-method" className="font-bold">How it goes</label>
        <Select id="queue-method" value={params.method} onChange={(e) => onChange({ method: e.target.value as QueueParams["method"] })}>
          <option value="any">Any</option>
          <option value="parcel">Parcel</option>
          <option value="pickup">Local pickup</option>
        </Select>
      </div>
      <div className="flex flex-col gap-1.5">
        <label htmlFor="queue-from" className="font-bold">Paid from</label>
        <Input id="queue-from" type="date" value={params.from ?? ""} onChange={(e) => onChange({ from: e.target.value || undefined })} />
      </div>
      <div className="flex flex-col gap-1.5">
        <label htmlFor="queue-to" className="font-bold">Paid to</label>
        <Input
          id="queue-to"
          type="date"
          value={params.to ?? ""}
          aria-invalid={fieldErrors?.to ? true : undefined}
          aria-describedby={fieldErrors?.to ? "queue-to-error" : undefined}
          onChange={(e) => onChange({ to: e.target.value || undefined })}
        />
        {fieldErrors?.to ? (
          <p id="queue-to-error" className="text-sm font-bold text-berry-700">
            {fieldErrors.to}
          </p>
        ) : null}
      </div>
      <div className="flex flex-col gap-1.5 sm:col-span-2 lg:col-span-1">
        <label htmlFor="queue-search" className="font-bold">Order number or name</label>
        <Input
          id="queue-search"
          type="search"
          placeholder="RW-00042 or Alcott"
          value={searchText}
          onChange={(e) => onSearchText(e.target.value)}
        />
      </div>
      <Button variant="ghost" onClick={onReset} className="sm:col-span-2 lg:col-span-1">
        Clear filters
      </Button>
    </form>
  );
}
