"use client";

import { useId } from "react";
import { Input } from "@/components/ui/input";
import { cn } from "@/components/ui/cn";

export const GIFT_PRESETS_CENTS = [1000, 2500, 5000, 10000];

/** Preset gift amounts plus a custom one ($1 to $10,000); the value is a dollar string or "". */
export function GiftPicker({ value, onChange, error, allowNone = true }: { value: string; onChange: (v: string) => void; error?: string; allowNone?: boolean }) {
  const id = useId();
  const presets = GIFT_PRESETS_CENTS.map((c) => String(c / 100));
  const custom = value !== "" && !presets.includes(value);
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-1 font-bold">Conservation gift</legend>
      <p className="text-sm text-ink-soft">Gifts pay for the care of injured and orphaned bats at the rescue. They are never taxed.</p>
      <div className="flex flex-wrap gap-2">
        {allowNone ? (
          <button type="button" aria-pressed={value === ""} onClick={() => onChange("")} className={chip(value === "")}>
            No gift
          </button>
        ) : null}
        {presets.map((d) => (
          <button key={d} type="button" aria-pressed={value === d} onClick={() => onChange(d)} className={chip(value === d)}>
            ${d}
          </button>
        ))}
      </div>
      <div className="flex items-center gap-2">
        <label htmlFor={`${id}-custom`} className="text-sm font-bold">
          Another amount ($1 to $10,000)
        </label>
        <span aria-hidden="true">$</span>
        <Input
          id={`${id}-custom`}
          inputMode="decimal"
          className="max-w-32"
          value={custom ? value : ""}
          onChange={(e) => onChange(e.target.value.replace(/[^0-9.]/g, ""))}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
        />
      </div>
      {error ? (
        <p id={`${id}-error`} className="text-sm font-bold text-berry-700">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}

function chip(active: boolean) {
  return cn(
    "min-h-11 rounded-lg border px-4 font-bold focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-dusk-500",
    active ? "border-moss-700 bg-moss-700 text-paper-50" : "border-bark-400 bg-paper-50 text-moss-800 hover:bg-moss-50",
  );
}

/** "$25.50" → 2550; "" → 0; anything else → null. */
export function giftDollarsToCents(value: string): number | null {
  if (value.trim() === "") return 0;
  if (!/^\d{1,5}(\.\d{1,2})?$/.test(value.trim())) return null;
  return Math.round(Number(value) * 100);
}
