import { describe, expect, it } from "vitest";
import { dayRangeInZone, formatWaiting, startOfDayInZone, zoneOffsetMinutes } from "@/lib/fulfillment/store-time";

// Source for the clock changes: U.S. daylight saving time as set by the Energy Policy Act of
// 2005 (15 U.S.C. §260a): it begins at 2:00 a.m. on the second Sunday of March and ends at
// 2:00 a.m. on the first Sunday of November. In 2026 those are March 8 and November 1.
// Pacific standard time is UTC−8, Pacific daylight time UTC−7.

const LA = "America/Los_Angeles";

describe("zone offsets", () => {
  it("is −8 h in winter and −7 h in summer", () => {
    expect(zoneOffsetMinutes({ instant: new Date("2026-01-15T12:00:00Z"), timeZone: LA })).toBe(-480);
    expect(zoneOffsetMinutes({ instant: new Date("2026-07-15T12:00:00Z"), timeZone: LA })).toBe(-420);
  });

  it("changes at 2 a.m. local on the published Sundays", () => {
    // 09:59 UTC on March 8 is 01:59 PST; 10:00 UTC is 03:00 PDT.
    expect(zoneOffsetMinutes({ instant: new Date("2026-03-08T09:59:00Z"), timeZone: LA })).toBe(-480);
    expect(zoneOffsetMinutes({ instant: new Date("2026-03-08T10:00:00Z"), timeZone: LA })).toBe(-420);
    // 08:59 UTC on November 1 is 01:59 PDT; 09:00 UTC is 01:00 PST.
    expect(zoneOffsetMinutes({ instant: new Date("2026-11-01T08:59:00Z"), timeZone: LA })).toBe(-420);
    expect(zoneOffsetMinutes({ instant: new Date("2026-11-01T09:00:00Z"), timeZone: LA })).toBe(-480);
  });
});

describe("calendar days at the center", () => {
  it("starts a day at local midnight, either side of the change", () => {
    expect(startOfDayInZone({ day: "2026-03-08", timeZone: LA }).toISOString()).toBe("2026-03-08T08:00:00.000Z");
    expect(startOfDayInZone({ day: "2026-03-09", timeZone: LA }).toISOString()).toBe("2026-03-09T07:00:00.000Z");
    expect(startOfDayInZone({ day: "2026-11-01", timeZone: LA }).toISOString()).toBe("2026-11-01T07:00:00.000Z");
    expect(startOfDayInZone({ day: "2026-11-02", timeZone: LA }).toISOString()).toBe("2026-11-02T08:00:00.000Z");
  });

  it("makes the spring-forward day 23 hours long and the fall-back day 25", () => {
    const length = (day: string) => {
      const { start, end } = dayRangeInZone({ from: day, to: day, timeZone: LA });
      return (end!.getTime() - start!.getTime()) / 3_600_000;
    };
    expect(length("2026-03-08")).toBe(23);
    expect(length("2026-11-01")).toBe(25);
    expect(length("2026-06-01")).toBe(24);
  });

  it("includes both ends of a range and leaves an open end open", () => {
    expect(dayRangeInZone({ from: "2026-03-03", to: "2026-03-05", timeZone: LA })).toEqual({
      start: new Date("2026-03-03T08:00:00Z"),
      end: new Date("2026-03-06T08:00:00Z"),
    });
    expect(dayRangeInZone({ to: "2026-12-31", timeZone: LA })).toEqual({ end: new Date("2027-01-01T08:00:00Z") });
    expect(dayRangeInZone({ timeZone: LA })).toEqual({});
  });

  it("refuses something that is not a day", () => {
    expect(() => startOfDayInZone({ day: "soon", timeZone: LA })).toThrow(RangeError);
  });
});

describe("waiting time", () => {
  const now = new Date("2026-03-10T12:00:00Z");
  it.each([
    ["2026-03-10T12:00:00Z", "just now"],
    ["2026-03-10T11:15:00Z", "45 min"],
    ["2026-03-10T11:00:00Z", "1 h"],
    ["2026-03-08T12:01:00Z", "47 h"],
    ["2026-03-08T12:00:00Z", "2 days"],
    ["2026-03-11T12:00:00Z", "just now"],
  ])("%s → %s", (since, words) => {
    expect(formatWaiting({ since, now })).toBe(words);
  });
});
