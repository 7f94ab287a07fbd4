// Sun hours against the closed form for a south-facing wall (PRODUCT.md §4).
// Source: spherical astronomy, e.g. Meeus, "Astronomical Algorithms" (1998), ch. 13: the sun
// crosses the prime vertical (due east / due west) at hour angle h with cos h = tan δ / tan φ,
// and a south face sees the sun between those two crossings: hours = 2h / 15.
// The sun crosses due east well above the horizon (about 38° at 40° N in June), so refraction
// (under 0.03° up there) changes the result by seconds: the check holds for suncalc's apparent
// altitude too.
import { describe, expect, it } from "vitest";
import { sunHoursOnFace } from "@/lib/placement/sun";

const DEG = Math.PI / 180;
const SOLSTICE_DECLINATION = 23.44;

function closedFormSouthFaceHours({ latDeg, decDeg }: { latDeg: number; decDeg: number }) {
  const cosH = Math.tan(decDeg * DEG) / Math.tan(latDeg * DEG);
  return (2 * Math.acos(cosH)) / DEG / 15;
}

describe("south-facing wall on the June solstice, closed form", () => {
  it("the closed form gives 7.85 h at 40° N", () => {
    expect(closedFormSouthFaceHours({ latDeg: 40, decDeg: SOLSTICE_DECLINATION })).toBeCloseTo(
      7.85,
      2,
    );
  });

  it.each([0, -75, 120])("sunHoursOnFace gives 7.85 h ± 0.05 h at 40° N, longitude %s", (lon) => {
    const day = sunHoursOnFace({ lat: 40, lon, facingDeg: 180, date: "2026-06-21" });
    expect(Math.abs(day.hours - 7.85)).toBeLessThanOrEqual(0.05);
    // Symmetric about solar noon: half the sun before it (1 min of grid slack).
    expect(Math.abs(day.morningHours - day.hours / 2)).toBeLessThanOrEqual(1 / 60);
  });

  it.each([30, 35, 45, 50])("matches the closed form within 0.05 h at %s° N", (lat) => {
    const expected = closedFormSouthFaceHours({ latDeg: lat, decDeg: SOLSTICE_DECLINATION });
    const day = sunHoursOnFace({ lat, lon: -90, facingDeg: 180, date: "2026-06-21" });
    expect(Math.abs(day.hours - expected)).toBeLessThanOrEqual(0.05);
  });
});
