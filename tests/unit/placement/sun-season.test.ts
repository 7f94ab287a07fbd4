// Season sun hours (PRODUCT.md §4): the mean of the 1st and 15th of May–August, mirrored to
// November–February in the southern hemisphere. Source of the method: PRODUCT.md §4 (store rule);
// the geometry checks below are consequences of the face condition, not tuned values.
import { getPosition } from "suncalc";
import { describe, expect, it } from "vitest";
import {
  isCalendarDate,
  listSeasonDates,
  parseCalendarDate,
  seasonSunHours,
  sunHoursOnFace,
} from "@/lib/placement/sun";

const ONE_MINUTE = 1 / 60;

describe("listSeasonDates", () => {
  it("north: 1st and 15th of May to August", () => {
    expect(listSeasonDates({ lat: 40, year: 2026 })).toEqual([
      "2026-05-01",
      "2026-05-15",
      "2026-06-01",
      "2026-06-15",
      "2026-07-01",
      "2026-07-15",
      "2026-08-01",
      "2026-08-15",
    ]);
  });

  it("south (mirrored): 1st and 15th of November to February, one summer", () => {
    expect(listSeasonDates({ lat: -34, year: 2026 })).toEqual([
      "2025-11-01",
      "2025-11-15",
      "2025-12-01",
      "2025-12-15",
      "2026-01-01",
      "2026-01-15",
      "2026-02-01",
      "2026-02-15",
    ]);
  });

  it("the equator counts as north", () => {
    expect(listSeasonDates({ lat: 0 })[0]).toMatch(/-05-01$/);
  });
});

describe("seasonSunHours", () => {
  const season = seasonSunHours({ lat: 40, lon: -75, facingDeg: 157.5 });

  it("is the mean of its 8 days and keeps the morning share consistent", () => {
    expect(season.byDate).toHaveLength(8);
    const mean = season.byDate.reduce((sum, d) => sum + d.hours, 0) / 8;
    expect(season.hours).toBeCloseTo(mean, 10);
    expect(season.morningShare).toBeCloseTo(season.morningHours / season.hours, 10);
    expect(season.hemisphere).toBe("north");
    expect(season.solstice.date).toBe("2026-06-21");
  });

  it("a south-southeast face gets most of its sun in the morning", () => {
    expect(season.morningShare).toBeGreaterThan(0.6);
    const sswFace = seasonSunHours({ lat: 40, lon: -75, facingDeg: 202.5 });
    expect(sswFace.morningShare).toBeLessThan(0.4);
  });

  it("mirrors in the south: north-facing at 40° S in December ≈ south-facing at 40° N in June", () => {
    const south = seasonSunHours({ lat: -40, lon: 150, facingDeg: 0 });
    expect(south.hemisphere).toBe("south");
    expect(south.seasonLabel).toBe("November to February");
    expect(south.solstice.date).toBe("2025-12-21");
    const north = sunHoursOnFace({ lat: 40, lon: 150, facingDeg: 180, date: "2026-06-21" });
    expect(Math.abs(south.solstice.hours - north.hours)).toBeLessThanOrEqual(0.05);
  });
});

describe("sunHoursOnFace", () => {
  const day = sunHoursOnFace({ lat: 40, lon: -75, facingDeg: 135, date: "2026-07-01" });

  it("byHour has 24 solar hours that add up to the total", () => {
    expect(day.byHour).toHaveLength(24);
    expect(day.byHour.every((m) => m >= 0 && m <= 60)).toBe(true);
    expect(day.byHour.reduce((a, b) => a + b, 0)).toBe(Math.round(day.hours * 60));
    expect(day.byHour.slice(0, 12).reduce((a, b) => a + b, 0)).toBe(
      Math.round(day.morningHours * 60),
    );
  });

  it("solarNoon is when suncalc puts the sun due south at 40° N", () => {
    const { azimuth } = getPosition(new Date(day.solarNoon), 40, -75);
    expect(Math.abs(azimuth - 180)).toBeLessThan(0.1);
  });

  it("opposite faces share every sunlit minute: N + S = E + W = daylight", () => {
    const hoursFor = (facingDeg: number) =>
      sunHoursOnFace({ lat: 40, lon: -75, facingDeg, date: "2026-06-21" }).hours;
    const northSouth = hoursFor(0) + hoursFor(180);
    const eastWest = hoursFor(90) + hoursFor(270);
    expect(Math.abs(northSouth - eastWest)).toBeLessThanOrEqual(2 * ONE_MINUTE);
    // About 15 h of daylight at 40° N at midsummer (sun centre above the apparent horizon).
    expect(northSouth).toBeGreaterThan(14.8);
    expect(northSouth).toBeLessThan(15.1);
  });

  it("an east face is lit only before solar noon, a west face only after", () => {
    const east = sunHoursOnFace({ lat: 40, lon: -75, facingDeg: 90, date: "2026-06-21" });
    const west = sunHoursOnFace({ lat: 40, lon: -75, facingDeg: 270, date: "2026-06-21" });
    expect(east.morningShare).toBe(1);
    expect(west.morningShare).toBe(0);
    expect(Math.abs(east.hours - west.hours)).toBeLessThanOrEqual(2 * ONE_MINUTE);
  });

  it("midnight sun at 70° N: the sun is up all 24 hours", () => {
    const hoursFor = (facingDeg: number) =>
      sunHoursOnFace({ lat: 70, lon: 20, facingDeg, date: "2026-06-21" }).hours;
    expect(hoursFor(0) + hoursFor(180)).toBeCloseTo(24, 1);
  });
});

describe("calendar dates", () => {
  it("refuses dates that do not exist", () => {
    expect(() => parseCalendarDate("2026-02-30")).toThrow(RangeError);
    expect(() => sunHoursOnFace({ lat: 40, lon: 0, facingDeg: 180, date: "2026-6-1" })).toThrow(
      RangeError,
    );
    expect(isCalendarDate("2028-02-29")).toBe(true);
    expect(isCalendarDate("2026-02-29")).toBe(false);
    expect(isCalendarDate("2026-13-01")).toBe(false);
  });
});
