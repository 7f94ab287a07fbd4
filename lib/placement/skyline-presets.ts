// Plain starting points for a site's skyline, for buyers who would rather pick than measure.
// The angles are rough, typical figures worked out with the tangent of height over distance
// (common practice, no source): a line of 50 ft trees about 25 yd away stands near 30° (atan
// 50/75 ≈ 34°), a two-storey house (about 25 ft) across a 60 ft yard near 20° (atan 25/60 ≈
// 23°), woods round a clearing about 25°, a row of town houses about 15°. The buyer can adjust
// any direction afterwards in the grid.
import { SKYLINE_DIRECTIONS, type Skyline } from "./skyline";

export type SkylinePresetId = "open" | "tree-line" | "house" | "hillside" | "clearing" | "town";

export type SkylinePreset = {
  id: SkylinePresetId;
  label: string;
  hint: string;
  /** True when the preset stands on one side, which the buyer chooses. */
  sided: boolean;
  /**
   * Angles by distance (in 22.5° steps) from the chosen side's centre, 0 to 8; a preset that is
   * not sided uses entry 0 everywhere.
   */
  byOffset: readonly number[];
};

export const SKYLINE_PRESETS: readonly SkylinePreset[] = [
  {
    id: "open",
    label: "Open field",
    hint: "Nothing taller than a fence anywhere near: sky down to the horizon all round.",
    sided: false,
    byOffset: [0],
  },
  {
    id: "tree-line",
    label: "A line of trees on one side",
    hint: "A hedge row or woods edge about 25 yd (23 m) away, tapering off to both ends.",
    sided: true,
    byOffset: [30, 27, 20, 10, 3, 0, 0, 0, 0],
  },
  {
    id: "house",
    label: "A house across the yard",
    hint: "A two-storey house or barn about 60 ft (18 m) away, on one side.",
    sided: true,
    byOffset: [20, 16, 6, 0, 0, 0, 0, 0, 0],
  },
  {
    id: "hillside",
    label: "A hillside rising on one side",
    hint: "Ground climbing away on one side, low trees on the slope.",
    sided: true,
    byOffset: [15, 13, 10, 6, 3, 1, 0, 0, 0],
  },
  {
    id: "clearing",
    label: "A clearing in the woods",
    hint: "Trees all round at a similar distance.",
    sided: false,
    byOffset: [25],
  },
  {
    id: "town",
    label: "A town garden",
    hint: "Neighbouring houses and garden trees on every side.",
    sided: false,
    byOffset: [15],
  },
];

/** The eight sides a sided preset can stand on, as the 16-direction index of each centre. */
export const PRESET_SIDES = [
  { index: 0, label: "North" },
  { index: 2, label: "Northeast" },
  { index: 4, label: "East" },
  { index: 6, label: "Southeast" },
  { index: 8, label: "South" },
  { index: 10, label: "Southwest" },
  { index: 12, label: "West" },
  { index: 14, label: "Northwest" },
] as const;

export function findSkylinePreset(id: string): SkylinePreset | undefined {
  return SKYLINE_PRESETS.find((preset) => preset.id === id);
}

/** The 16 angles of a preset, centred on `side` (a 16-direction index) when it is sided. */
export function buildSkylinePreset({
  id,
  side = 0,
}: {
  id: SkylinePresetId;
  side?: number;
}): Skyline {
  const preset = findSkylinePreset(id);
  if (!preset) throw new RangeError(`Unknown skyline preset "${id}"`);
  return Array.from({ length: SKYLINE_DIRECTIONS }, (_, k) => {
    if (!preset.sided) return preset.byOffset[0] ?? 0;
    const apart = Math.abs(k - side) % SKYLINE_DIRECTIONS;
    return preset.byOffset[Math.min(apart, SKYLINE_DIRECTIONS - apart)] ?? 0;
  });
}
