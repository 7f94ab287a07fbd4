"use client";

import { useFormContext } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { toOptionalNumber, type PlacementFormValues } from "./form-values";

export type LocateBy = "zip" | "coordinates";

type LocationFieldsProps = {
  locateBy: LocateBy;
  onLocateByChange: (mode: LocateBy) => void;
  knowsJulyHigh: boolean;
  onKnowsJulyHighChange: (knows: boolean) => void;
  /** Messages from the last check, by field (a ZIP with no centre, a July high we need). */
  serverErrors: Record<string, string>;
};

const radioClasses =
  "size-5 accent-moss-700 focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-dusk-500";

/** Where the site is (ZIP or coordinates) and, when the buyer knows it, their July high. */
export function LocationFields({
  locateBy,
  onLocateByChange,
  knowsJulyHigh,
  onKnowsJulyHighChange,
  serverErrors,
}: LocationFieldsProps) {
  const {
    register,
    formState: { errors },
  } = useFormContext<PlacementFormValues>();
  const optionalNumber = { setValueAs: toOptionalNumber };

  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-1 font-display text-xl font-semibold text-moss-900">
        Where is it?
      </legend>
      <p className="-mt-2 text-sm text-ink-soft">
        The place sets the sun&apos;s path across the sky and how hot your summers get.
      </p>
      <div
        className="flex flex-wrap gap-x-6 gap-y-2"
        role="radiogroup"
        aria-label="Give the place by"
      >
        <label className="flex items-center gap-2">
          <input
            type="radio"
            name="locate-by"
            className={radioClasses}
            checked={locateBy === "zip"}
            onChange={() => onLocateByChange("zip")}
          />
          By ZIP code
        </label>
        <label className="flex items-center gap-2">
          <input
            type="radio"
            name="locate-by"
            className={radioClasses}
            checked={locateBy === "coordinates"}
            onChange={() => onLocateByChange("coordinates")}
          />
          By latitude and longitude
        </label>
      </div>
      {locateBy === "zip" ? (
        <Field
          label="ZIP code"
          hint="Five digits, U.S. only: we take the ZIP area's centre."
          error={errors.zip?.message ?? serverErrors.zip}
        >
          <Input
            inputMode="numeric"
            autoComplete="postal-code"
            maxLength={10}
            className="max-w-40"
            {...register("zip", {
              setValueAs: (v: unknown) =>
                typeof v === "string" && v.trim() !== "" ? v.trim() : undefined,
            })}
          />
        </Field>
      ) : (
        <div className="grid grid-cols-2 gap-3">
          <Field
            label="Latitude"
            hint="Decimal degrees; south is negative."
            error={errors.lat?.message ?? serverErrors.lat}
          >
            <Input inputMode="decimal" {...register("lat", optionalNumber)} />
          </Field>
          <Field
            label="Longitude"
            hint="West is negative, e.g. −105.35."
            error={errors.lon?.message ?? serverErrors.lon}
          >
            <Input inputMode="decimal" {...register("lon", optionalNumber)} />
          </Field>
        </div>
      )}
      <label className="flex items-start gap-3">
        <input
          type="checkbox"
          className="mt-0.5 size-5 accent-moss-700"
          checked={knowsJulyHigh}
          onChange={(e) => onKnowsJulyHighChange(e.target.checked)}
        />
        <span>I know my average July high</span>
      </label>
      {knowsJulyHigh ? (
        <Field
          label="Average daily high in July (°F)"
          hint="Hotter summers need fewer hours of sun on the house. Leave the box unticked to use the nearest weather stations."
          error={errors.julyHighF?.message ?? serverErrors.julyHighF}
        >
          <Input
            inputMode="decimal"
            className="max-w-32"
            {...register("julyHighF", optionalNumber)}
          />
        </Field>
      ) : serverErrors.julyHighF ? (
        <p className="text-sm font-bold text-berry-700">{serverErrors.julyHighF}</p>
      ) : null}
    </fieldset>
  );
}
