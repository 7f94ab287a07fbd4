// P4, direct sun on the house face, mean over the maternity season (PRODUCT.md §4).
// Source: published guidance keyed to the average July high, as quoted in agency guides from
// Tuttle, Kiser & Kiser, "The Bat House Builder's Handbook" (2004): at least 6 h of direct sun
// where July highs are under 100 °F, at least 10 h where they are 80 °F or less; 6–8 h of
// morning sun is common practice. The fair bands (6–10 h, 4–6 h) and the 60%-before-solar-noon
// test for the hottest band are this store's own reading of that guidance (PRODUCT.md).
import { formatHours, formatPercent } from "./format";
import type { Hemisphere } from "./sun";
import type { RuleResult, RuleStatus, SunSummary } from "./types";

const SUN_SOURCE =
  "Published guidance keyed to the average July high (at least 6 h of sun under 100 °F, 10 h at 80 °F or less); morning sun is common practice";

const OPEN_SKY_NOTE =
  "Open-sky estimate: trees, buildings and hills that shade the site are not modelled.";

export type SunRegime = "mild" | "warm" | "very hot";

/** ≤ 80 °F mild; above 80 and below 100 °F warm; 100 °F and above very hot. */
export function getSunRegime(julyHighF: number): SunRegime {
  if (julyHighF <= 80) return "mild";
  if (julyHighF < 100) return "warm";
  return "very hot";
}

// Thresholds per regime, hours of direct sun a day. Both lower ends included.
const THRESHOLDS = {
  mild: { good: 10, fair: 6 },
  warm: { good: 6, fair: 4 },
  "very hot": { good: 4, fair: 0 },
} as const satisfies Record<SunRegime, { good: number; fair: number }>;

/** In the very hot band at least this share of the sun must fall before solar noon. */
export const MORNING_SHARE_MIN = 0.6;

export function rateSun({ julyHighF, sun }: { julyHighF: number; sun: SunSummary }): RuleStatus {
  const regime = getSunRegime(julyHighF);
  const { good, fair } = THRESHOLDS[regime];
  if (regime === "very hot") {
    // "good when ≥ 4 h with at least 60% of them before solar noon, else fair": never poor.
    return sun.hours >= good && sun.morningShare >= MORNING_SHARE_MIN ? "good" : "fair";
  }
  if (sun.hours >= good) return "good";
  return sun.hours >= fair ? "fair" : "poor";
}

function describeChange({
  regime,
  sun,
  hemisphere,
}: {
  regime: SunRegime;
  sun: SunSummary;
  hemisphere: Hemisphere;
}): string {
  // Morning sun comes from the east, leaning toward the equator: mirrored for the south.
  const morningSide = hemisphere === "north" ? "east to southeast" : "east to northeast";
  if (regime === "very hot") {
    return sun.hours < THRESHOLDS["very hot"].good
      ? `Find a spot with at least 4 h of sun, most of it in the morning (an ${morningSide} face), with shade in the afternoon.`
      : `Turn the face ${morningSide}, or shade it after noon, so most of its sun comes in the morning.`;
  }
  const target = THRESHOLDS[regime].good;
  return `Move the house to a more open spot or turn it toward the best bearing, so it gets at least ${target} h of direct sun a day.`;
}

export function checkSun({
  julyHighF,
  sun,
  hemisphere = "north",
}: {
  julyHighF: number;
  sun: SunSummary;
  hemisphere?: Hemisphere;
}): RuleResult {
  const regime = getSunRegime(julyHighF);
  const status = rateSun({ julyHighF, sun });
  const value = `${formatHours(sun.hours)} of direct sun a day (${formatPercent(sun.morningShare)} before solar noon)`;
  const need =
    regime === "very hot"
      ? `Where July highs reach 100 °F or more, ${THRESHOLDS["very hot"].good} h is enough if at least ${MORNING_SHARE_MIN * 100}% of it comes before solar noon.`
      : regime === "mild"
        ? `Where July highs are 80 °F or less, a house needs ${THRESHOLDS.mild.good} h or more.`
        : `Where July highs are above 80 °F and below 100 °F, a house needs ${THRESHOLDS.warm.good} h or more.`;
  const result: RuleResult = {
    id: "P4",
    name: "Sun on the face",
    status,
    value,
    reason: `${need} ${OPEN_SKY_NOTE}`,
    source: SUN_SOURCE,
  };
  return status === "good"
    ? result
    : { ...result, change: describeChange({ regime, sun, hemisphere }) };
}
