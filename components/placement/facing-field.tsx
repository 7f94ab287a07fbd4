"use client";

import { useId, useState } from "react";
import { Input } from "@/components/ui/input";
import { ToneIcon } from "@/components/ui/tone-icon";
import { describeBearing } from "@/lib/placement/bearing";
import { CompassDial } from "./compass-dial";

type FacingFieldProps = {
  value: number | undefined;
  onChange: (bearing: number | undefined) => void;
  onBlur?: () => void;
  error?: string;
  /** The site's latitude when known, for the mirrored arcs south of the equator. */
  lat?: number;
};

const toText = (value: number | undefined) =>
  value === undefined || Number.isNaN(value) ? "" : String(value);

/** Which way the house faces: the compass dial and a number field, kept in step. */
export function FacingField({ value, onChange, onBlur, error, lat }: FacingFieldProps) {
  const id = useId().replace(/:/g, "");
  const [text, setText] = useState(toText(value));
  const [shown, setShown] = useState(value);
  // The dial (or a loaded site) changed the value: show it, unless the text already says it
  // ("157.0" stays as typed). Adjusted while rendering, React's pattern for state that follows a prop.
  if (!Object.is(value, shown)) {
    setShown(value);
    if (!(text.trim() !== "" && Number(text) === value)) setText(toText(value));
  }
  const south = lat !== undefined && lat < 0;
  const best = south ? "north to northeast" : "southeast to south";

  return (
    <fieldset className="flex flex-col gap-3" aria-describedby={`${id}-hint`}>
      <legend id={`${id}-legend`} className="font-bold text-ink">
        Which way the house faces
      </legend>
      <p id={`${id}-hint`} className="-mt-2 text-sm text-ink-soft">
        Morning sun on the front warms the roost early; {best} is best. Stand with your back to the
        wall or pole and read the bearing off a phone compass.
      </p>
      <div className="flex flex-wrap items-center gap-5">
        <CompassDial
          value={value ?? 0}
          onChange={onChange}
          lat={lat}
          labelledBy={`${id}-legend`}
          className="w-48 sm:w-56"
        />
        <div className="flex min-w-40 flex-1 flex-col gap-2">
          <label htmlFor={`${id}-deg`} className="font-bold text-ink">
            Bearing in degrees
          </label>
          <div className="flex items-center gap-2">
            <Input
              id={`${id}-deg`}
              type="number"
              inputMode="decimal"
              min={0}
              max={359.9}
              step="any"
              value={text}
              aria-invalid={error ? true : undefined}
              aria-describedby={error ? `${id}-error` : undefined}
              onChange={(e) => {
                setText(e.target.value);
                onChange(e.target.value.trim() === "" ? undefined : Number(e.target.value));
              }}
              onBlur={onBlur}
              className="max-w-28"
            />
            <span aria-hidden="true" className="text-lg text-ink-soft">
              °
            </span>
          </div>
          <p className="text-sm text-ink-soft" aria-hidden="true">
            {value !== undefined && Number.isFinite(value)
              ? `Faces ${describeBearing(value)}`
              : "\u00a0"}
          </p>
          <p className="flex items-center gap-2 text-sm text-ink-soft">
            <span
              className="inline-block size-3 rounded-sm bg-moss-200 ring-1 ring-moss-600"
              aria-hidden="true"
            />{" "}
            best
            <span
              className="ml-2 inline-block size-3 rounded-sm bg-ember-100 ring-1 ring-ember-600"
              aria-hidden="true"
            />{" "}
            fair
          </p>
        </div>
      </div>
      {error ? (
        <p id={`${id}-error`} className="flex items-start gap-1.5 text-sm font-bold text-berry-700">
          <ToneIcon tone="poor" className="mt-px size-4" />
          <span>{error}</span>
        </p>
      ) : null}
    </fieldset>
  );
}
