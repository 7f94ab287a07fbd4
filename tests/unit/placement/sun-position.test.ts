// The cheap per-minute sun (lib/placement/sun-position.ts) against `suncalc` 2.x, the library
// the product declares for sun positions (Meeus, "Astronomical Algorithms", 1998, ch. 25):
// positions within 0.01°, and the minute-by-minute face integral within 1 minute of the same
// integral computed with suncalc.getPosition called every minute.
import { getPosition, getTimes } from "suncalc";
import { describe, expect, it } from "vitest";
import { getSunPosition, traceSunMinutes } from "@/lib/placement/sun-position";
import { sunHoursOnFace } from "@/lib/placement/sun";

const DEG = Math.PI / 180;
const SITES = [
  { lat: 40, lon: -75 },
  { lat: -33.9, lon: 151.2 },
  { lat: 64.8, lon: -147.7 },
  { lat: 1.3, lon: 103.8 },
];
const DATES = ["2026-03-20", "2026-06-21", "2026-09-23", "2026-12-21", "2026-01-01"];

function angleGap(a: number, b: number) {
  const d = Math.abs(a - b) % 360;
  return Math.min(d, 360 - d);
}

/** Angle in degrees between two sky directions; well defined even near the zenith. */
function separation(p: { altitude: number; azimuth: number }, q: typeof p) {
  const [a1, z1, a2, z2] = [p.altitude, p.azimuth, q.altitude, q.azimuth].map((v) => v * DEG) as [
    number,
    number,
    number,
    number,
  ];
  const cos = Math.sin(a1) * Math.sin(a2) + Math.cos(a1) * Math.cos(a2) * Math.cos(z1 - z2);
  return Math.acos(Math.min(1, cos)) / DEG;
}

describe("getSunPosition matches suncalc.getPosition", () => {
  it("within 0.01° of sky, over sites, seasons and hours", () => {
    let worst = 0;
    for (const { lat, lon } of SITES) {
      for (const date of DATES) {
        for (let hour = 0; hour < 24; hour += 1.7) {
          const at = new Date(Date.parse(`${date}T00:00:00Z`) + hour * 3_600_000);
          const ours = getSunPosition({ lat, lon, at });
          const theirs = getPosition(at, lat, lon);
          worst = Math.max(worst, separation(ours, theirs));
          expect(Math.abs(ours.altitude - theirs.altitude)).toBeLessThan(0.01);
        }
      }
    }
    expect(worst).toBeLessThan(0.01);
  });
});

describe("traceSunMinutes (interpolated) matches suncalc minute by minute", () => {
  it("sun vectors within 0.01° over a whole day, including an RA wrap in September", () => {
    for (const date of ["2026-06-21", "2026-09-22"]) {
      const startMs = Date.parse(`${date}T00:00:00Z`);
      const track = traceSunMinutes({ lat: 40, lon: -75, startMs });
      for (let i = 0; i < 1440; i += 37) {
        const p = getPosition(new Date(startMs + (i + 0.5) * 60_000), 40, -75);
        // Add refraction as suncalc does (Meeus 16.4, altitudes below 0° clamped) to compare
        // like with like: suncalc reports the apparent altitude.
        const h = Math.asin(track.sinAltitude[i] ?? Number.NaN);
        const hc = Math.max(h, 0);
        const apparent = (h + 0.0002967 / Math.tan(hc + 0.00312536 / (hc + 0.08901179))) / DEG;
        expect(Math.abs(apparent - p.altitude)).toBeLessThan(0.01);
        const azimuth = Math.atan2(track.east[i] ?? 0, track.north[i] ?? 0) / DEG;
        expect(angleGap(azimuth, p.azimuth)).toBeLessThan(0.01);
      }
    }
  });

  it("face minutes agree within 1 minute with suncalc called every minute", () => {
    for (const { lat, lon } of SITES) {
      for (const date of DATES) {
        const noon = getTimes(
          new Date(Date.parse(`${date}T12:00:00Z`) - (lon / 15) * 3_600_000),
          lat,
          lon,
        ).solarNoon.getTime();
        const positions = Array.from({ length: 1440 }, (_, i) =>
          getPosition(new Date(noon + (i - 720 + 0.5) * 60_000), lat, lon),
        );
        for (const facingDeg of [0, 45, 90, 157.5, 180, 270, 315]) {
          const expected = positions.filter(
            (p) =>
              p.altitude > 0 &&
              Math.cos(p.altitude * DEG) * Math.cos((p.azimuth - facingDeg) * DEG) > 0,
          ).length;
          const ours = sunHoursOnFace({ lat, lon, facingDeg, date });
          expect(
            Math.abs(ours.hours * 60 - expected),
            `${lat},${lon} ${date} ${facingDeg}°`,
          ).toBeLessThanOrEqual(1);
        }
      }
    }
  });
});
