// Compass bearings: degrees clockwise from true north, as a buyer reads them off a compass app.

// The 16 points of the mariner's compass rose, 22.5° apart, starting at north.
// Source: the standard 16-point compass rose (any navigation handbook; common practice).
const POINT_NAMES = [
  "north",
  "north-northeast",
  "northeast",
  "east-northeast",
  "east",
  "east-southeast",
  "southeast",
  "south-southeast",
  "south",
  "south-southwest",
  "southwest",
  "west-southwest",
  "west",
  "west-northwest",
  "northwest",
  "north-northwest",
] as const;

const POINT_ABBREVIATIONS = [
  "N",
  "NNE",
  "NE",
  "ENE",
  "E",
  "ESE",
  "SE",
  "SSE",
  "S",
  "SSW",
  "SW",
  "WSW",
  "W",
  "WNW",
  "NW",
  "NNW",
] as const;

export type CompassPoint = (typeof POINT_NAMES)[number];

/** Brings any finite bearing into [0, 360), so 360 → 0 and −90 → 270. */
export function normalizeBearing(deg: number): number {
  const wrapped = deg % 360;
  // `+ 0` turns −0 into 0 so a bearing never prints as "-0°".
  return (wrapped < 0 ? wrapped + 360 : wrapped) + 0;
}

/**
 * Mirrors a bearing across the east–west line: b → (180 − b) mod 360.
 * East and west stay put, north and south swap, so "southeast, for morning sun" in the
 * north becomes "northeast, for morning sun" in the south.
 */
export function mirrorBearing(deg: number): number {
  return normalizeBearing(180 - deg);
}

function pointIndex(deg: number): number {
  // Each point owns ±11.25° around its centre; 348.75° and up rounds back to north.
  return Math.round(normalizeBearing(deg) / 22.5) % 16;
}

/** 157 → "south-southeast"; the nearest of the 16 compass points, in words. */
export function describeBearing(deg: number): CompassPoint {
  return POINT_NAMES[pointIndex(deg)] ?? "north";
}

/** 157 → "SSE"; the nearest of the 16 compass points, abbreviated. */
export function abbreviateBearing(deg: number): string {
  return POINT_ABBREVIATIONS[pointIndex(deg)] ?? "N";
}
