// P3, facing (PRODUCT.md §4). Source: common practice, no published source: south to southeast
// catches the morning sun that warms a roost before the afternoon heat.
import { describeBearing, mirrorBearing, normalizeBearing } from "./bearing";
import { getHemisphere } from "./sun";
import type { PlacementSite, RuleResult, RuleStatus } from "./types";

const FACING_SOURCE =
  "Common practice: south to southeast for morning sun, north to northeast in the southern hemisphere (no published source)";

// Northern-hemisphere bands, both ends included as PRODUCT.md writes them:
// good 135°–180° (SE to S); fair 90°–135° or 180°–202.5°; anything else poor.
const GOOD_FROM = 135;
const GOOD_TO = 180;
const FAIR_FROM = 90;
const FAIR_TO = 202.5;
// Middle of the good band (south-southeast), offered as the bearing to turn to.
const IDEAL_NORTH = 157.5;

const RANK: Record<RuleStatus, number> = { good: 0, fair: 1, poor: 2 };

/**
 * Southern hemisphere: the bearing is MIRRORED across the east–west line, b → (180 − b) mod 360,
 * before the northern bands apply, so north-northeast there rates like south-southeast here.
 */
export function toNorthernEquivalent({ lat, facingDeg }: { lat: number; facingDeg: number }) {
  return getHemisphere(lat) === "south" ? mirrorBearing(facingDeg) : normalizeBearing(facingDeg);
}

export function rateFacing({ lat, facingDeg }: { lat: number; facingDeg: number }): RuleStatus {
  const b = toNorthernEquivalent({ lat, facingDeg });
  if (b >= GOOD_FROM && b <= GOOD_TO) return "good";
  if ((b >= FAIR_FROM && b < GOOD_FROM) || (b > GOOD_TO && b <= FAIR_TO)) return "fair";
  return "poor";
}

/**
 * The face whose sun matters: the house itself, or for a back-to-back pair the half that rates
 * better (the equator-facing one). Use it as `facingDeg` when computing P4's season sun.
 */
export function findSunFaceBearing({
  lat,
  facingDeg,
  pairedBackToBack,
}: Pick<PlacementSite, "lat" | "facingDeg" | "pairedBackToBack">): number {
  const front = normalizeBearing(facingDeg);
  if (!pairedBackToBack) return front;
  const back = normalizeBearing(facingDeg + 180);
  const frontRank = RANK[rateFacing({ lat, facingDeg: front })];
  const backRank = RANK[rateFacing({ lat, facingDeg: back })];
  if (frontRank !== backRank) return frontRank < backRank ? front : back;
  // Same rating: the half nearer the ideal bearing gets the sun.
  const ideal = getHemisphere(lat) === "south" ? mirrorBearing(IDEAL_NORTH) : IDEAL_NORTH;
  return angularDistance(front, ideal) <= angularDistance(back, ideal) ? front : back;
}

function angularDistance(a: number, b: number): number {
  const d = Math.abs(normalizeBearing(a) - normalizeBearing(b));
  return Math.min(d, 360 - d);
}

function describe(deg: number): string {
  return `${Number(normalizeBearing(deg).toFixed(1))}° (${describeBearing(deg)})`;
}

export function checkFacing(site: PlacementSite): RuleResult {
  const south = getHemisphere(site.lat) === "south";
  const ideal = south ? mirrorBearing(IDEAL_NORTH) : IDEAL_NORTH;
  const idealWords = `${describeBearing(ideal)} (about ${ideal}°)`;
  const goodBand = south ? "0°–45° (north to northeast)" : "135°–180° (southeast to south)";
  const face = findSunFaceBearing(site);
  const status = rateFacing({ lat: site.lat, facingDeg: face });
  const pairNote = site.pairedBackToBack
    ? ` The pair is rated by its ${describeBearing(face)}-facing half; the other half is the cooler side bats move to, which is fine.`
    : "";
  const value = site.pairedBackToBack
    ? `${describe(site.facingDeg)}, back to back with ${describe(site.facingDeg + 180)}`
    : describe(site.facingDeg);
  const base = { id: "P3" as const, name: "Facing", value, source: FACING_SOURCE };

  if (status === "good") {
    return {
      ...base,
      status,
      reason: `Faces ${goodBand}, where the morning sun warms the roost early.${pairNote}`,
    };
  }
  return {
    ...base,
    status,
    reason:
      status === "fair"
        ? `Near the best directions but outside ${goodBand}: less morning warmth.${pairNote}`
        : `Faces away from the sun for most of the morning; the best band is ${goodBand}.${pairNote}`,
    change: site.pairedBackToBack
      ? `Turn the pair so one face points ${idealWords}.`
      : `Turn the house to face ${idealWords}.`,
  };
}

export type FacingSector = { from: number; to: number; status: Exclude<RuleStatus, "poor"> };

/**
 * The good and fair sectors of P3 as compass arcs, clockwise from `from` to `to`, for drawing a
 * dial; everything outside them is poor. Mirroring reverses the direction of travel, so a
 * southern sector runs from the mirror of `to` to the mirror of `from`.
 */
export function listFacingSectors({ lat }: { lat: number }): FacingSector[] {
  const north: FacingSector[] = [
    { from: FAIR_FROM, to: GOOD_FROM, status: "fair" },
    { from: GOOD_FROM, to: GOOD_TO, status: "good" },
    { from: GOOD_TO, to: FAIR_TO, status: "fair" },
  ];
  if (getHemisphere(lat) === "north") return north;
  return north.map(({ from, to, status }) => ({
    from: mirrorBearing(to),
    to: mirrorBearing(from),
    status,
  }));
}
