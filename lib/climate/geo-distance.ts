// Great-circle distance on a sphere by the haversine formula (R. W. Sinnott, "Virtues of the
// Haversine", Sky & Telescope 68(2), 1984). The sphere has the mean Earth radius 3958.8 mi:
// the IUGG mean radius R1 = 6371.0088 km = 3958.76 mi (H. Moritz, "Geodetic Reference System
// 1980", Journal of Geodesy 74, 2000), rounded as the product brief asks.

export const EARTH_RADIUS_MI = 3958.8;
export const DEG = Math.PI / 180;

export type LatLon = { lat: number; lon: number };

/** Haversine of the central angle between two points given in radians with their cosines. */
export function haversineOfAngle(
  latA: number,
  lonA: number,
  cosLatA: number,
  latB: number,
  lonB: number,
  cosLatB: number,
): number {
  const sinHalfDLat = Math.sin((latB - latA) / 2);
  const sinHalfDLon = Math.sin((lonB - lonA) / 2);
  return sinHalfDLat * sinHalfDLat + cosLatA * cosLatB * sinHalfDLon * sinHalfDLon;
}

/** Central angle, radians, from its haversine (clamped against rounding just above 1). */
export function angleFromHaversine(h: number): number {
  return 2 * Math.asin(Math.sqrt(Math.min(1, Math.max(0, h))));
}

/** Great-circle distance in statute miles between two points in degrees. */
export function distanceMiles({ from, to }: { from: LatLon; to: LatLon }): number {
  const latA = from.lat * DEG;
  const latB = to.lat * DEG;
  const h = haversineOfAngle(
    latA,
    from.lon * DEG,
    Math.cos(latA),
    latB,
    to.lon * DEG,
    Math.cos(latB),
  );
  return EARTH_RADIUS_MI * angleFromHaversine(h);
}
