// Buyer-facing numbers: imperial first, metric alongside (PRODUCT.md "Units").
//
// Values are rounded AWAY from the good side of their rule, so a reading just short of a
// threshold never prints as the threshold: 14.999 ft shows "14.99 ft" next to "needs 15 ft",
// and 0.251 mi shows "0.26 mi" next to "within 0.25 mi".

// Exact conversion factors: international foot = 0.3048 m and mile = 1,609.344 m
// (International Yard and Pound Agreement, 1959).
export const METERS_PER_FOOT = 0.3048;
export const KILOMETERS_PER_MILE = 1.609344;

// The epsilon absorbs binary noise (0.29 * 100 = 28.999999999999996) before floor/ceil.
const EPSILON = 1e-9;

function roundDown(value: number, decimals: number): string {
  const scale = 10 ** decimals;
  return String(Math.floor(value * scale + EPSILON) / scale);
}

function roundUp(value: number, decimals: number): string {
  const scale = 10 ** decimals;
  return String(Math.ceil(value * scale - EPSILON) / scale);
}

/** Heights and distances to trees (more is better): 14.999 → "14.99 ft (4.57 m)". */
export function formatFeet(ft: number): string {
  return `${roundDown(ft, 2)} ft (${roundDown(ft * METERS_PER_FOOT, 2)} m)`;
}

/** Distances to water (less is better): 0.251 → "0.26 mi (0.41 km)". */
export function formatMiles(mi: number): string {
  return `${roundUp(mi, 2)} mi (${roundUp(mi * KILOMETERS_PER_MILE, 2)} km)`;
}

/** Shares of sun before noon (more is better): 0.599 → "59%". */
export function formatPercent(share: number): string {
  return `${roundDown(share * 100, 0)}%`;
}

/** 7.85 → "7 h 51 min": whole minutes, rounded down (5.99 h shows "5 h 59 min", not "6 h"). */
export function formatHours(hours: number): string {
  const totalMinutes = Math.floor(hours * 60 + EPSILON);
  const h = Math.floor(totalMinutes / 60);
  const min = totalMinutes % 60;
  return min === 0 ? `${h} h` : `${h} h ${min} min`;
}
