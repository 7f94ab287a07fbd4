import { describe, expect, it } from "vitest";
import {
  currentSeason,
  firstSummerSeason,
  hemisphereOf,
  seasonDates,
  seasonLabel,
  seasonToAdvise,
  seasonToAsk,
  summerNumber,
} from "@/lib/roost-reports/season-rules";

const day = (s: string) => new Date(`${s}T12:00:00Z`);

describe("roost-report seasons (PRODUCT.md §7 months)", () => {
  it("names a southern season by the year it starts and shows both years", () => {
    expect(seasonLabel({ season: 2026, hemisphere: "north" })).toBe("2026");
    expect(seasonLabel({ season: 2026, hemisphere: "south" })).toBe("2026–27");
    expect(seasonLabel({ season: 2099, hemisphere: "south" })).toBe("2099–00");
    const south = seasonDates({ season: 2026, hemisphere: "south" });
    expect(south.maternityStart.toISOString().slice(0, 10)).toBe("2026-10-01");
    expect(south.maternityEnd.toISOString().slice(0, 10)).toBe("2027-02-15");
  });

  it("asks from September 1 to October 31 in the north, both ends included", () => {
    expect(seasonToAsk({ date: day("2026-08-31"), hemisphere: "north" })).toBeNull();
    expect(seasonToAsk({ date: day("2026-09-01"), hemisphere: "north" })).toBe(2026);
    expect(seasonToAsk({ date: day("2026-10-31"), hemisphere: "north" })).toBe(2026);
    expect(seasonToAsk({ date: day("2026-11-01"), hemisphere: "north" })).toBeNull();
  });

  it("asks from March 1 to April 30 in the south, about the season that began the October before", () => {
    expect(seasonToAsk({ date: day("2027-02-28"), hemisphere: "south" })).toBeNull();
    expect(seasonToAsk({ date: day("2027-03-01"), hemisphere: "south" })).toBe(2026);
    expect(seasonToAsk({ date: day("2027-04-30"), hemisphere: "south" })).toBe(2026);
    expect(seasonToAsk({ date: day("2027-05-01"), hemisphere: "south" })).toBeNull();
    // September is the northern question, never the southern one.
    expect(seasonToAsk({ date: day("2026-09-15"), hemisphere: "south" })).toBeNull();
  });

  it("advises from the question until the next maternity season", () => {
    expect(seasonToAdvise({ date: day("2026-12-20"), hemisphere: "north" })).toBe(2026);
    expect(seasonToAdvise({ date: day("2027-03-31"), hemisphere: "north" })).toBe(2026);
    expect(seasonToAdvise({ date: day("2027-04-01"), hemisphere: "north" })).toBeNull();
    expect(seasonToAdvise({ date: day("2027-09-30"), hemisphere: "south" })).toBe(2026);
    expect(seasonToAdvise({ date: day("2027-10-01"), hemisphere: "south" })).toBeNull();
  });

  it("knows which season a report is about on any day", () => {
    expect(currentSeason({ date: day("2026-03-31"), hemisphere: "north" })).toBe(2025);
    expect(currentSeason({ date: day("2026-04-01"), hemisphere: "north" })).toBe(2026);
    expect(currentSeason({ date: day("2027-03-10"), hemisphere: "south" })).toBe(2026);
    expect(currentSeason({ date: day("2026-09-30"), hemisphere: "south" })).toBe(2025);
    expect(currentSeason({ date: day("2026-10-01"), hemisphere: "south" })).toBe(2026);
  });

  it("counts a summer when the house was up by midsummer (July 1 north, January 1 south)", () => {
    expect(firstSummerSeason({ deliveredAt: day("2026-07-01"), hemisphere: "north" })).toBe(2026);
    expect(firstSummerSeason({ deliveredAt: day("2026-07-02"), hemisphere: "north" })).toBe(2027);
    expect(firstSummerSeason({ deliveredAt: day("2026-01-10"), hemisphere: "north" })).toBe(2026);
    expect(firstSummerSeason({ deliveredAt: day("2026-12-31"), hemisphere: "south" })).toBe(2026);
    expect(firstSummerSeason({ deliveredAt: day("2027-01-01"), hemisphere: "south" })).toBe(2026);
    expect(firstSummerSeason({ deliveredAt: day("2027-01-02"), hemisphere: "south" })).toBe(2027);
    expect(firstSummerSeason({ deliveredAt: day("2026-05-20"), hemisphere: "south" })).toBe(2026);
  });

  it("numbers the summers of a house, with 0 for a late arrival and null before it came", () => {
    const deliveredAt = day("2026-08-01");
    expect(summerNumber({ season: 2025, deliveredAt, hemisphere: "north" })).toBeNull();
    expect(summerNumber({ season: 2026, deliveredAt, hemisphere: "north" })).toBe(0);
    expect(summerNumber({ season: 2027, deliveredAt, hemisphere: "north" })).toBe(1);
    expect(summerNumber({ season: 2028, deliveredAt, hemisphere: "north" })).toBe(2);
    expect(summerNumber({ season: 2026, deliveredAt: day("2026-08-16"), hemisphere: "north" })).toBeNull();
    expect(summerNumber({ season: 2026, deliveredAt: day("2026-06-30"), hemisphere: "north" })).toBe(1);
  });

  it("takes the hemisphere from the saved site, else the north", () => {
    expect(hemisphereOf({ siteLat: -14.28 })).toBe("south");
    expect(hemisphereOf({ siteLat: 44.9 })).toBe("north");
    expect(hemisphereOf({ siteLat: 0 })).toBe("north");
    expect(hemisphereOf({ siteLat: null })).toBe("north");
  });

  it("refuses an invalid date", () => {
    expect(() => seasonToAsk({ date: new Date("nope"), hemisphere: "north" })).toThrow(RangeError);
  });
});
