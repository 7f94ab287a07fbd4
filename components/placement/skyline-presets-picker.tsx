"use client";

import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { Select } from "@/components/ui/select";
import {
  buildSkylinePreset,
  findSkylinePreset,
  PRESET_SIDES,
  SKYLINE_PRESETS,
  type SkylinePresetId,
} from "@/lib/placement/skyline-presets";

type SkylinePresetsPickerProps = {
  /** Fills the grid with the chosen angles. */
  onApply: (angles: readonly number[], words: string) => void;
};

/** A plain starting point: pick what the site looks like (and on which side), then fine-tune. */
export function SkylinePresetsPicker({ onApply }: SkylinePresetsPickerProps) {
  const id = useId().replace(/:/g, "");
  const [presetId, setPresetId] = useState<SkylinePresetId>("tree-line");
  const [side, setSide] = useState(4);
  const preset = findSkylinePreset(presetId);

  function apply() {
    if (!preset) return;
    const sideWords = PRESET_SIDES.find((s) => s.index === side)?.label.toLowerCase() ?? "";
    onApply(
      buildSkylinePreset({ id: presetId, side }),
      preset.sided ? `${preset.label}, to the ${sideWords}` : preset.label,
    );
  }

  return (
    <div className="flex flex-col gap-2 rounded-xl border border-paper-300 bg-paper-50 p-3">
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex w-full flex-col gap-1">
          <label htmlFor={`${id}-preset`} className="text-sm font-bold text-ink">
            What the site looks like
          </label>
          <Select
            id={`${id}-preset`}
            value={presetId}
            aria-describedby={`${id}-hint`}
            onChange={(e) => setPresetId(e.target.value as SkylinePresetId)}
          >
            {SKYLINE_PRESETS.map((p) => (
              <option key={p.id} value={p.id}>
                {p.label}
              </option>
            ))}
          </Select>
        </div>
        {preset?.sided ? (
          <div className="flex min-w-36 flex-1 flex-col gap-1">
            <label htmlFor={`${id}-side`} className="text-sm font-bold text-ink">
              On which side
            </label>
            <Select
              id={`${id}-side`}
              value={side}
              onChange={(e) => setSide(Number(e.target.value))}
            >
              {PRESET_SIDES.map((s) => (
                <option key={s.index} value={s.index}>
                  {s.label}
                </option>
              ))}
            </Select>
          </div>
        ) : null}
        <Button type="button" variant="secondary" onClick={apply}>
          Use this skyline
        </Button>
      </div>
      <p id={`${id}-hint`} className="text-sm text-ink-soft">
        {preset?.hint} You can change any angle afterwards.
      </p>
    </div>
  );
}
