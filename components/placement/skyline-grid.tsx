"use client";

import { useFormContext, useWatch } from "react-hook-form";
import { cn } from "@/components/ui/cn";
import { getControlClasses } from "@/components/ui/control-classes";
import {
  SKYLINE_DIRECTIONS,
  SKYLINE_MAX_DEG,
  skylineDirectionAbbreviation,
  skylineDirectionName,
} from "@/lib/placement/skyline";
import { toOptionalNumber, type PlacementFormValues } from "./form-values";

const DIRECTIONS = Array.from({ length: SKYLINE_DIRECTIONS }, (_, k) => k);

const outOfRange = (value: unknown) =>
  typeof value !== "number" || !Number.isFinite(value) || value < 0 || value > SKYLINE_MAX_DEG;

/**
 * The 16 angles in a compact grid, north first and clockwise (so Tab walks round the compass);
 * each box is a plain number field, so arrows step it by a degree.
 */
export function SkylineGrid({ hintId, errorId }: { hintId: string; errorId?: string }) {
  const { register, control } = useFormContext<PlacementFormValues>();
  const values = useWatch({ control, name: "skyline" });

  return (
    <div
      className="grid grid-cols-4 gap-x-3 gap-y-2 sm:grid-cols-8 lg:grid-cols-4"
      aria-describedby={hintId}
    >
      {DIRECTIONS.map((k) => {
        const value = values?.[k];
        const invalid = errorId !== undefined && outOfRange(value);
        const inputId = `skyline-${k}`;
        return (
          <div key={k} className="flex flex-col gap-0.5">
            <label htmlFor={inputId} className="text-sm font-bold text-ink">
              <span aria-hidden="true">{skylineDirectionAbbreviation(k)}</span>
              <span className="sr-only">Skyline toward the {skylineDirectionName(k)}, degrees</span>
            </label>
            <div className="flex items-center gap-1">
              <input
                id={inputId}
                type="number"
                inputMode="decimal"
                min={0}
                max={SKYLINE_MAX_DEG}
                step="any"
                defaultValue={0}
                aria-invalid={invalid ? true : undefined}
                aria-describedby={invalid ? errorId : undefined}
                className={cn(getControlClasses("min-h-11 w-full min-w-0 px-2 tabular-nums"))}
                {...register(`skyline.${k}`, { setValueAs: toOptionalNumber })}
              />
              <span aria-hidden="true" className="text-ink-soft">
                °
              </span>
            </div>
          </div>
        );
      })}
    </div>
  );
}
