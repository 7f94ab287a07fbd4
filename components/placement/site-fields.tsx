"use client";

import { useFormContext, useWatch } from "react-hook-form";
import { Checkbox } from "@/components/ui/checkbox";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { ToneIcon } from "@/components/ui/tone-icon";
import { KILOMETERS_PER_MILE, METERS_PER_FOOT } from "@/lib/placement/format";
import { toOptionalNumber, type PlacementFormValues } from "./form-values";

const MOUNTS = [
  { value: "pole", label: "Pole" },
  { value: "building", label: "Building wall" },
  { value: "tree", label: "Tree" },
] as const;

/** "= 4.57 m" beside a number field, so metric readers need no calculator. */
function Metric({ value, factor, unit }: { value: unknown; factor: number; unit: string }) {
  if (typeof value !== "number" || !Number.isFinite(value)) return null;
  return (
    <span className="text-sm text-ink-soft tabular-nums" aria-hidden="true">
      = {(value * factor).toFixed(2)} {unit}
    </span>
  );
}

/** How the house is mounted and what is around it, each with a line on why it matters. */
export function SiteFields() {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<PlacementFormValues>();
  const [heightFt, waterMi, woodsEdgeFt, mount] = useWatch({
    control,
    name: ["heightFt", "waterMi", "woodsEdgeFt", "mount"],
  });
  const number = { setValueAs: toOptionalNumber };

  return (
    <div className="flex flex-col gap-6">
      <fieldset className="flex flex-col gap-2" aria-describedby="mount-hint">
        <legend className="font-bold text-ink">Mounted on</legend>
        <p id="mount-hint" className="text-sm text-ink-soft">
          Bats seldom move into houses on trees: leaves shade them and climbing predators reach
          them.
        </p>
        <div className="flex flex-wrap gap-x-6 gap-y-2">
          {MOUNTS.map((m) => (
            <label key={m.value} className="flex items-center gap-2">
              <input
                type="radio"
                value={m.value}
                className="size-5 accent-moss-700"
                {...register("mount")}
              />
              {m.label}
            </label>
          ))}
        </div>
        {errors.mount?.message ? (
          <p className="flex items-start gap-1.5 text-sm font-bold text-berry-700">
            <ToneIcon tone="poor" className="mt-px size-4" />
            {errors.mount.message}
          </p>
        ) : null}
      </fieldset>

      <div className="flex flex-col gap-5">
        <div className="flex flex-col gap-1">
          <Field
            label="Height above ground (ft)"
            hint="Higher stays warmer and out of reach; 15–20 ft is best."
            error={errors.heightFt?.message}
          >
            <Input
              type="number"
              inputMode="decimal"
              min={0}
              step="any"
              {...register("heightFt", number)}
            />
          </Field>
          <Metric value={heightFt} factor={METERS_PER_FOOT} unit="m" />
        </div>
        <div className="flex flex-col gap-1">
          <Field
            label="Distance to water (mi)"
            hint="Nursing bats drink often; within ¼ mile is best."
            error={errors.waterMi?.message}
          >
            <Input
              type="number"
              inputMode="decimal"
              min={0}
              step="any"
              {...register("waterMi", number)}
            />
          </Field>
          <Metric value={waterMi} factor={KILOMETERS_PER_MILE} unit="km" />
        </div>
        <div className="flex flex-col gap-1">
          <Field
            label="Distance to the nearest trees (ft)"
            hint={
              mount === "pole"
                ? "Branches within 20 ft of a pole give owls and climbers a perch."
                : "Rated for pole mounts only, where branches within 20 ft give predators a perch."
            }
            error={errors.woodsEdgeFt?.message}
          >
            <Input
              type="number"
              inputMode="decimal"
              min={0}
              step="any"
              {...register("woodsEdgeFt", number)}
            />
          </Field>
          <Metric value={woodsEdgeFt} factor={METERS_PER_FOOT} unit="m" />
        </div>
      </div>

      <fieldset className="flex flex-col gap-4">
        <legend className="mb-1 font-bold text-ink">Around the house</legend>
        <Checkbox
          label="Two houses back to back"
          hint="A pair gives bats a warm side and a cool side; only the sunnier face needs a good bearing."
          error={errors.pairedBackToBack?.message}
          {...register("pairedBackToBack")}
        />
        <Checkbox
          label="One house mounted above another"
          hint="The upper house shades the lower one and drops guano on it."
          error={errors.stacked?.message}
          {...register("stacked")}
        />
        <Checkbox
          label="The space below the house is clear"
          hint="Bats drop a few feet before they fly; branches, wires or shrubs below get in the way."
          error={errors.clearFlightPath?.message}
          {...register("clearFlightPath")}
        />
        <Checkbox
          label="A bright light shines on or near the house"
          hint="Lights keep bats in late and show them to owls and hawks."
          error={errors.brightLight?.message}
          {...register("brightLight")}
        />
        <Checkbox
          label="Outdoor cats or other predators nearby"
          hint="A smooth metal guard below the house keeps climbers off."
          error={errors.predators?.message}
          {...register("predators")}
        />
      </fieldset>
    </div>
  );
}
