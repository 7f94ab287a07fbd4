// Where the sun is, cheaply enough to evaluate 11,520 minutes per season check.
//
// Source: Meeus, "Astronomical Algorithms", 2nd ed. (1998): ch. 12 (sidereal time), ch. 13
// (equatorial to horizontal), ch. 16 (refraction, formula 16.4), ch. 25 (solar coordinates, low
// accuracy). These are the same series `suncalc` 2.x evaluates; the tests hold positions here
// to suncalc's getPosition within 0.01°. What differs is the cost: right ascension and
// declination change slowly and smoothly (about 1° and at most 0.4° a day), so they are computed
// twice per day and interpolated, and each minute is a handful of multiplications.
// TT − UT (about 69 s) is ignored: it moves the sun by under 0.001°.

const RAD = Math.PI / 180;
const DAY_MS = 86_400_000;
/** J2000.0, 2000-01-01T12:00:00Z, the epoch of the Meeus series. */
const J2000_MS = Date.UTC(2000, 0, 1, 12);

/**
 * Refraction at the horizon (Meeus 16.4, as in suncalc, which clamps altitudes below 0° to 0°):
 * the sun's centre counts as "above the horizon" (suncalc's apparent altitude > 0) once its
 * true altitude exceeds −REFRACTION_0, about −0.48°; compare sinAltitude with this constant.
 */
const REFRACTION_0 = 0.0002967 / Math.tan(0.00312536 / 0.08901179);
export const SIN_VISIBLE_ALTITUDE = Math.sin(-REFRACTION_0);

/**
 * Apparent altitude (radians, refraction added as Meeus 16.4 and suncalc do) from the sine of
 * the true altitude: what a skyline angle measured by eye or by a phone is compared with.
 */
export function apparentAltitude(sinAltitude: number): number {
  const h = Math.asin(sinAltitude);
  const hClamped = Math.max(h, 0);
  return h + 0.0002967 / Math.tan(hClamped + 0.00312536 / (hClamped + 0.08901179));
}

// Greenwich mean sidereal time in degrees: SIDEREAL_AT_J2000 + SIDEREAL_PER_DAY × days.
const SIDEREAL_AT_J2000 = 280.46061837;
const SIDEREAL_PER_DAY = 360.98564736629;

type Equatorial = { ra: number; dec: number };

/** Apparent right ascension and declination (radians), Meeus ch. 25, low accuracy. */
export function getSunEquatorial(daysSinceJ2000: number): Equatorial {
  const t = daysSinceJ2000 / 36525;
  const L0 = RAD * (280.46646 + t * (36000.76983 + t * 0.0003032));
  const M = RAD * (357.52911 + t * (35999.05029 - t * 0.0001537));
  const C =
    RAD *
    ((1.914602 - t * (0.004817 + t * 0.000014)) * Math.sin(M) +
      (0.019993 - 0.000101 * t) * Math.sin(2 * M) +
      0.000289 * Math.sin(3 * M));
  const omega = RAD * (125.04 - 1934.136 * t);
  const lambda = L0 + C - RAD * (0.00569 + 0.00478 * Math.sin(omega));
  const epsilon =
    RAD * (23.439291 - t * (0.0130042 + t * (0.00000016 - t * 0.000000504))) +
    RAD * 0.00256 * Math.cos(omega);
  return {
    ra: Math.atan2(Math.cos(epsilon) * Math.sin(lambda), Math.cos(lambda)),
    dec: Math.asin(Math.sin(epsilon) * Math.sin(lambda)),
  };
}

/** Local hour angle (radians) for a right ascension, Meeus 12.4 (linear term). */
function getHourAngle({ days, lon, ra }: { days: number; lon: number; ra: number }): number {
  return RAD * (SIDEREAL_AT_J2000 + SIDEREAL_PER_DAY * days + lon) - ra;
}

/**
 * The sun as seen from the site, split the way the face test needs it: `sinAltitude` (true,
 * unrefracted) and the horizontal components `east` = cos(alt)·sin(az), `north` = cos(alt)·cos(az).
 */
type SunVector = { sinAltitude: number; east: number; north: number };

function toSunVector({ phi, dec, H }: { phi: number; dec: number; H: number }): SunVector {
  const sinDec = Math.sin(dec);
  const cosDec = Math.cos(dec);
  const cosH = Math.cos(H);
  return {
    sinAltitude: Math.sin(phi) * sinDec + Math.cos(phi) * cosDec * cosH,
    east: -cosDec * Math.sin(H),
    north: Math.cos(phi) * sinDec - Math.sin(phi) * cosDec * cosH,
  };
}

/** Apparent altitude and azimuth in degrees, suncalc's conventions (azimuth clockwise from N). */
export function getSunPosition({ lat, lon, at }: { lat: number; lon: number; at: Date }) {
  const days = (at.getTime() - J2000_MS) / DAY_MS;
  const { ra, dec } = getSunEquatorial(days);
  const v = toSunVector({ phi: lat * RAD, dec, H: getHourAngle({ days, lon, ra }) });
  return {
    altitude: apparentAltitude(v.sinAltitude) / RAD,
    azimuth: (((Math.atan2(v.east, v.north) / RAD) % 360) + 360) % 360,
  };
}

export type SunTrack = { sinAltitude: Float64Array; east: Float64Array; north: Float64Array };

const MINUTES = 1440;

/**
 * Sun vectors at the middle of each minute of the 24 hours from `startMs` (1,440 entries).
 * Right ascension and declination are interpolated linearly between the window's ends: over one
 * day they stray from a straight line by under 0.001° (measured over 2026), so the hour angle
 * and the declination both advance by a constant step per minute, and their sines and cosines
 * follow by the angle-addition rotation: no trig call, Date or object per minute. That keeps
 * even the first, not-yet-optimized calls of a fresh server process cheap.
 */
export function traceSunMinutes({
  lat,
  lon,
  startMs,
}: {
  lat: number;
  lon: number;
  startMs: number;
}): SunTrack {
  const sinPhi = Math.sin(lat * RAD);
  const cosPhi = Math.cos(lat * RAD);
  const d0 = (startMs - J2000_MS) / DAY_MS;
  const first = getSunEquatorial(d0);
  const last = getSunEquatorial(d0 + 1);
  // Unwrap the right ascension so a jump from +π to −π never lands inside the window.
  const raLast = last.ra + 2 * Math.PI * Math.round((first.ra - last.ra) / (2 * Math.PI));

  const decStep = (last.dec - first.dec) / MINUTES;
  const hourAngleStep = (RAD * SIDEREAL_PER_DAY - (raLast - first.ra)) / MINUTES;
  const dec0 = first.dec + 0.5 * decStep;
  const hourAngle0 = getHourAngle({ days: d0, lon, ra: first.ra }) + 0.5 * hourAngleStep;

  let [sinDec, cosDec] = [Math.sin(dec0), Math.cos(dec0)];
  let [sinH, cosH] = [Math.sin(hourAngle0), Math.cos(hourAngle0)];
  const [sinDecStep, cosDecStep] = [Math.sin(decStep), Math.cos(decStep)];
  const [sinHStep, cosHStep] = [Math.sin(hourAngleStep), Math.cos(hourAngleStep)];

  const track: SunTrack = {
    sinAltitude: new Float64Array(MINUTES),
    east: new Float64Array(MINUTES),
    north: new Float64Array(MINUTES),
  };
  for (let i = 0; i < MINUTES; i++) {
    track.sinAltitude[i] = sinPhi * sinDec + cosPhi * cosDec * cosH;
    track.east[i] = -cosDec * sinH;
    track.north[i] = cosPhi * sinDec - sinPhi * cosDec * cosH;
    // sin(x + step) and cos(x + step) from the angle-addition formulas (plain temporaries, not
    // array destructuring, which allocates until the optimizer removes it).
    const nextSinDec = sinDec * cosDecStep + cosDec * sinDecStep;
    cosDec = cosDec * cosDecStep - sinDec * sinDecStep;
    sinDec = nextSinDec;
    const nextSinH = sinH * cosHStep + cosH * sinHStep;
    cosH = cosH * cosHStep - sinH * sinHStep;
    sinH = nextSinH;
  }
  return track;
}
