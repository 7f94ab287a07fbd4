"use client";

import { useId, useState } from "react";
import { useFormContext } from "react-hook-form";
import { ToneIcon } from "@/components/ui/tone-icon";
import { SKYLINE_DIRECTIONS } from "@/lib/placement/skyline";
import type { PlacementFormValues } from "./form-values";
import { SkylineGrid } from "./skyline-grid";
import { SkylineMeasure } from "./skyline-measure";
import { SkylinePresetsPicker } from "./skyline-presets-picker";

type SkylineFieldsProps = {
  /** True while the buyer describes the skyline; false sends none (an open sky is assumed). */
  describes: boolean;
  onDescribesChange: (describes: boolean) => void;
};

const radioClasses =
  "size-5 accent-moss-700 focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-dusk-500";

/**
 * What blocks the sky around the site (PRODUCT.md §4): none (open sky assumed), or 16 angles
 * typed into a grid, filled from a preset, or measured with the phone.
 */
export function SkylineFields({ describes, onDescribesChange }: SkylineFieldsProps) {
  const id = useId().replace(/:/g, "");
  const {
    setValue,
    formState: { errors },
  } = useFormContext<PlacementFormValues>();
  const [applied, setApplied] = useState("");
  const error = errors.skyline?.message ?? errors.skyline?.root?.message;
  const set = (k: number, angle: number) =>
    setValue(`skyline.${k}`, angle, { shouldDirty: true, shouldValidate: true });

  return (
    <section aria-labelledby={`${id}-heading`} className="flex flex-col gap-4">
      <h2 id={`${id}-heading`} className="font-display text-xl font-semibold text-moss-900">
        What stands around it?
      </h2>
      <p className="-mt-2 text-sm text-ink-soft">
        Trees, buildings and hills shade more bat houses than anything else. Tell us how high they
        rise around the spot and the sun hours count only the sun that clears them.
      </p>
      <fieldset className="flex flex-col gap-2">
        <legend className="sr-only">The skyline around the site</legend>
        <label className="flex items-center gap-2">
          <input
            type="radio"
            name={`${id}-describes`}
            className={radioClasses}
            checked={!describes}
            onChange={() => onDescribesChange(false)}
          />
          Leave it out (we assume open sky)
        </label>
        <label className="flex items-center gap-2">
          <input
            type="radio"
            name={`${id}-describes`}
            className={radioClasses}
            checked={describes}
            onChange={() => onDescribesChange(true)}
          />
          Describe the skyline
        </label>
      </fieldset>
      {describes ? (
        <div className="flex flex-col gap-4">
          <SkylinePresetsPicker
            onApply={(angles, words) => {
              angles.forEach((angle, k) => set(k, angle));
              setApplied(`Skyline filled in: ${words}.`);
            }}
          />
          <p aria-live="polite" className="-mt-2 text-sm font-bold text-moss-800">
            {applied}
          </p>
          <fieldset className="flex flex-col gap-2" aria-describedby={`${id}-hint`}>
            <legend className="font-bold text-ink">Skyline angles, degrees above level</legend>
            <p id={`${id}-hint`} className="-mt-1 text-sm text-ink-soft">
              Seen from where the house will hang, how high the tops of trees, roofs or hills rise
              in each of {SKYLINE_DIRECTIONS} directions, north first and clockwise. 0 is open sky
              down to the horizon; a fist held at arm&apos;s length is about 10°.
            </p>
            <SkylineGrid hintId={`${id}-hint`} errorId={error ? `${id}-error` : undefined} />
            {error ? (
              <p
                id={`${id}-error`}
                className="flex items-start gap-1.5 text-sm font-bold text-berry-700"
              >
                <ToneIcon tone="poor" className="mt-px size-4" />
                <span>{error}</span>
              </p>
            ) : null}
          </fieldset>
          <SkylineMeasure onRecord={set} />
        </div>
      ) : null}
    </section>
  );
}
