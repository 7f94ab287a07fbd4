// P4, direct sun on the house, by mount and under the site's skyline, mean over the maternity
// season (PRODUCT.md §4).
// Source: published guidance keyed to the average July high, as quoted in agency guides from
// Tuttle, Kiser & Kiser, "The Bat House Builder's Handbook" (2004): at least 6 h of direct sun
// where July highs are under 100 °F, at least 10 h where they are 80 °F or less; 6–8 h of
// morning sun is common practice. The fair bands (6–10 h, 4–6 h) and the 60%-before-solar-noon
// test for the hottest band are this store's own reading of that guidance (PRODUCT.md). "July
// high" is the warmest month's average daily high (PRODUCT.md §2): January south of the
// equator. The caller passes that value as `julyHighF`.
//
// What counts as sun "on the house" depends on the mount (lib/placement/sun.ts): a wall lights
// the house only while the sun is in front of it; a pole (a back-to-back pair too) all round; a
// tree is counted like a pole under the skyline, since its own trunk and crown belong to that
// skyline and P1 already marks tree mounts poor.
import { describeBearing } from "./bearing";
import { formatHours, formatPercent } from "./format";
import { formatAboutMinutes } from "./skyline-words";
import type { Hemisphere } from "./sun-calendar";
import type { RuleResult, RuleStatus, SunOnHouseSummary, SunSummary } from "./types";

const SUN_SOURCE =
  "Published guidance keyed to the average July high (at least 6 h of sun under 100 °F, 10 h at 80 °F or less); morning sun is common practice";

export const OPEN_SKY_NOTE =
  "An open sky was assumed: trees and buildings are not counted, so the house can only get less sun than this.";

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

/** Rates the sun on the house (the by-mount figure). */
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

const bearingWords = (deg: number) => `about ${Math.round(deg)}° (${describeBearing(deg)})`;

function describeNeed(regime: SunRegime): string {
  if (regime === "very hot") {
    return `Where the warmest month's highs average 100 °F or more, ${THRESHOLDS["very hot"].good} h of sun on the house is enough if at least ${MORNING_SHARE_MIN * 100}% of it comes before solar noon.`;
  }
  return regime === "mild"
    ? `Where the warmest month's highs average 80 °F or less, a house needs ${THRESHOLDS.mild.good} h or more of direct sun a day.`
    : `Where the warmest month's highs average above 80 °F and below 100 °F, a house needs ${THRESHOLDS.warm.good} h or more of direct sun a day.`;
}

function describeCounting(sun: SunOnHouseSummary): string {
  if (sun.mount === "building") {
    return "On a wall the house gets sun only while the sun is in front of the wall.";
  }
  if (sun.mount === "tree") {
    return "On a tree we count the sun as for a pole, whenever the sun is above the skyline; the tree's own trunk and leaves shade it more than that (see Mount).";
  }
  return sun.pairedBackToBack
    ? "A back-to-back pair on a pole is lit on one side or another whenever the sun is up."
    : "On a pole the house is lit from the front, the sides or the back whenever the sun is up.";
}

function describeSkyline(sun: SunOnHouseSummary): string {
  if (!sun.skyline.described) return OPEN_SKY_NOTE;
  const { lostHours, mainDirection } = sun.skyline;
  if (lostHours * 60 < 5)
    return "Counted under the skyline you described, which takes hardly any of it.";
  const where = mainDirection ? `, most of it ${mainDirection}` : "";
  return `Counted under the skyline you described, which takes about ${formatAboutMinutes(lostHours * 60)} a day${where}.`;
}

function describeChange({
  regime,
  sun,
  hemisphere,
}: {
  regime: SunRegime;
  sun: SunOnHouseSummary;
  hemisphere: Hemisphere;
}): string {
  // Morning sun comes from the east, leaning toward the equator: mirrored for the south.
  const morningSide = hemisphere === "north" ? "east to southeast" : "east to northeast";
  const onWall = sun.mount === "building";
  const pole = `A pole in the open gets more sun than any wall: about ${formatHours(sun.openPoleHours)} a day here.`;

  if (regime === "very hot") {
    if (sun.house.hours < THRESHOLDS["very hot"].good) {
      return onWall
        ? `Find a wall with at least 4 h of sun, most of it in the morning: one facing ${morningSide}, with nothing tall in front of it to the east.`
        : `Find a spot with at least 4 h of sun, most of it in the morning: open to the east, with trees or a building to the west for shade after noon.`;
    }
    return onWall
      ? `Choose a wall facing ${morningSide}, or shade this one after noon, so most of its sun comes in the morning.`
      : `Lit all round, the house gets less than ${MORNING_SHARE_MIN * 100}% of its sun before noon. Give it shade after noon (trees or a building to its west), or mount it on a wall facing ${morningSide}, so most of its sun comes in the morning.`;
  }

  const target = THRESHOLDS[regime].good;
  if (onWall) {
    const { deg, hours } = sun.bestWall;
    if (hours < target) {
      return `No wall here gets ${target} h: even the best, facing ${bearingWords(deg)}, gets ${formatHours(hours)}. ${pole} Mount the house on a pole, away from trees and buildings.`;
    }
    return `Choose a wall facing ${bearingWords(deg)}, which gets ${formatHours(hours)} here. ${pole}`;
  }
  const start =
    sun.mount === "tree" ? "Move the house off the tree onto a pole, in" : "Move the pole to";
  if (sun.openPoleHours < target) {
    return `${start} the most open spot you have: even with nothing around it, a house here gets about ${formatHours(sun.openPoleHours)} a day.`;
  }
  const where = sun.skyline.mainDirection ? `, above all ${sun.skyline.mainDirection}` : "";
  return sun.skyline.described
    ? `${start} a more open spot, with less in the way${where}: in the open it would get about ${formatHours(sun.openPoleHours)} a day.`
    : `${start} an open spot: in the open it would get about ${formatHours(sun.openPoleHours)} a day.`;
}

/** "15 h 10 min on the house (50% before solar noon); front face 9 h 44 min (62% …)". */
function describeValue(sun: SunOnHouseSummary): string {
  const house = `${formatHours(sun.house.hours)} of direct sun on the house a day (${formatPercent(sun.house.morningShare)} before solar noon)`;
  if (sun.mount === "building") return `${house}, all of it on the front face`;
  return `${house}; front face ${formatHours(sun.face.hours)} (${formatPercent(sun.face.morningShare)} before solar noon)`;
}

export function checkSun({
  julyHighF,
  sun,
  hemisphere = "north",
}: {
  julyHighF: number;
  sun: SunOnHouseSummary;
  hemisphere?: Hemisphere;
}): RuleResult {
  const regime = getSunRegime(julyHighF);
  const status = rateSun({ julyHighF, sun: sun.house });
  const result: RuleResult = {
    id: "P4",
    name: "Sun on the house",
    status,
    value: describeValue(sun),
    reason: `${describeNeed(regime)} ${describeCounting(sun)} ${describeSkyline(sun)}`,
    source: SUN_SOURCE,
  };
  return status === "good"
    ? result
    : { ...result, change: describeChange({ regime, sun, hemisphere }) };
}
