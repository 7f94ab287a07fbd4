"use client";

import { useState } from "react";
import { useFormContext } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
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
    getValues,
    formState: { errors },
  } = useFormContext<PlacementFormValues>();
  // °F or °C, as on the climate page; only the field of the chosen unit is registered.
  const [unit, setUnit] = useState<"F" | "C">(() => (getValues("julyHighC") !== undefined ? "C" : "F"));
  const highField = unit === "F" ? "julyHighF" : "julyHighC";
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
        <span>I know the average daily high of my warmest month</span>
      </label>
      {knowsJulyHigh ? (
        <div className="flex flex-wrap items-end gap-3">
          <Field
            key={highField}
            label={`Average daily high of your warmest month (°${unit})`}
            hint="July north of the equator, January south of it. Hotter summers need fewer hours of sun on the house. Leave the box unticked to use the nearest weather stations."
            error={errors[highField]?.message ?? serverErrors.julyHighF ?? serverErrors.julyHighC}
          >
            <Input inputMode="decimal" className="max-w-32" {...register(highField, optionalNumber)} />
          </Field>
          <div className="flex flex-col gap-1.5">
            <label htmlFor="site-high-unit" className="font-bold">
              Unit
            </label>
            <Select id="site-high-unit" value={unit} onChange={(e) => setUnit(e.target.value as "F" | "C")}>
              <option value="F">°F</option>
              <option value="C">°C</option>
            </Select>
          </div>
        </div>
      ) : serverErrors.julyHighF ? (
        <p className="text-sm font-bold text-berry-700">{serverErrors.julyHighF}</p>
      ) : null}
    </fieldset>
  );
}
