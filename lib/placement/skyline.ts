// The site's own skyline (PRODUCT.md §4, "The site's own horizon"): the elevation angle, in
// degrees above the horizontal, of whatever blocks the sky in each of the 16 compass directions,
// north first and clockwise (N, NNE, NE, … NNW, 22.5° apart). 0 is open sky down to the
// horizon; 90 would be a wall straight up. Between two directions the angle is taken as linear
// in azimuth, wrapping from north-northwest back to north (PRODUCT.md §4: "linear between the
// 16 directions"). Pure: no framework imports, so the browser's grid and the server share it.
import { abbreviateBearing, describeBearing, type CompassPoint } from "./bearing";

export const SKYLINE_DIRECTIONS = 16;
/** 360° / 16: the step between two directions of the profile. */
export const SKYLINE_STEP_DEG = 22.5;
export const SKYLINE_MAX_DEG = 90;

/** Exactly 16 angles in degrees, 0–90, north first and clockwise. */
export type Skyline = readonly number[];

export const OPEN_SKY: Skyline = Object.freeze(new Array<number>(SKYLINE_DIRECTIONS).fill(0));

/** The compass bearing of direction i (0 = north, 4 = east, 8 = south, 12 = west). */
export function skylineBearing(index: number): number {
  return index * SKYLINE_STEP_DEG;
}

/** "north", "north-northeast", … for direction i. */
export function skylineDirectionName(index: number): CompassPoint {
  return describeBearing(skylineBearing(index));
}

/** "N", "NNE", … for direction i. */
export function skylineDirectionAbbreviation(index: number): string {
  return abbreviateBearing(skylineBearing(index));
}

/** The direction of the profile nearest a compass bearing (348.75° and up is north again). */
export function nearestSkylineIndex(bearingDeg: number): number {
  const wrapped = ((bearingDeg % 360) + 360) % 360;
  return Math.round(wrapped / SKYLINE_STEP_DEG) % SKYLINE_DIRECTIONS;
}

/**
 * The skyline's elevation (degrees) toward any azimuth: linear between the two neighbouring
 * directions, wrapping at north, so 11.25° lies halfway between N and NNE and 354° between NNW
 * and N.
 */
export function skylineElevationAt(skyline: Skyline, azimuthDeg: number): number {
  const x = ((((azimuthDeg % 360) + 360) % 360) / SKYLINE_STEP_DEG) % SKYLINE_DIRECTIONS;
  const i = Math.floor(x);
  const t = x - i;
  const a = skyline[i] ?? 0;
  const b = skyline[(i + 1) % SKYLINE_DIRECTIONS] ?? 0;
  return a + (b - a) * t;
}

/** True when nothing blocks the sky in any direction (an all-zero profile). */
export function isOpenSky(skyline: Skyline | null | undefined): boolean {
  return !skyline || skyline.every((angle) => angle === 0);
}

/**
 * What is wrong with a would-be skyline, in words a buyer (or an API client) can act on; null
 * when it is 16 finite numbers from 0 to 90. One message for the whole field, naming the first
 * direction at fault, so the API answers `fields.skyline`.
 */
export function findSkylineProblem(value: unknown): string | null {
  if (!Array.isArray(value)) {
    return "Give the skyline as 16 angles in degrees, north first and clockwise.";
  }
  if (value.length !== SKYLINE_DIRECTIONS) {
    return `The skyline needs exactly 16 angles, north first and clockwise (this one has ${value.length}).`;
  }
  for (let i = 0; i < SKYLINE_DIRECTIONS; i++) {
    const angle: unknown = value[i];
    const toward = skylineDirectionName(i);
    if (angle === undefined || angle === null || angle === "") {
      return `Enter the angle toward the ${toward}: 0 means open sky.`;
    }
    if (typeof angle !== "number" || !Number.isFinite(angle)) {
      return `The angle toward the ${toward} must be a number of degrees.`;
    }
    if (angle < 0 || angle > SKYLINE_MAX_DEG) {
      return `The angle toward the ${toward} must be between 0° (open sky) and 90°.`;
    }
  }
  return null;
}

// Plain decimals only, as the other query parameters ("12", "7.5"): "1e1" or "0x10" are refused.
const DECIMAL = /^\s*[-+]?(\d+\.?\d*|\.\d+)\s*$/;

/**
 * `GET /api/sun-hours?skyline=…` carries the profile as a comma list of 16 angles, north first
 * ("0,0,5,20,…"). Entries that are not plain decimals stay strings, so the check above names
 * them; an empty parameter counts as not given.
 */
export function parseSkylineQuery(value: unknown): unknown {
  if (value === undefined || value === null || value === "") return undefined;
  if (typeof value !== "string") return value;
  return value.split(",").map((entry) => (DECIMAL.test(entry) ? Number(entry) : entry.trim()));
}

/** The profile as the query encoding above: "0,0,5,20,…". */
export function formatSkylineQuery(skyline: Skyline): string {
  return skyline.join(",");
}
