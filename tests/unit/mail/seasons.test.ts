import { describe, expect, it } from "vitest";
import { findDueReminder } from "@/lib/mail/seasons";
import { getUpkeepSeason } from "@/lib/mail/upkeep-calendar";

// Source: PRODUCT.md §7 (upkeep in winter while empty; maternity season roughly April to
// mid-August); the window lengths are common practice, no source.

const on = (iso: string) => findDueReminder({ date: new Date(`${iso}T12:00:00Z`) });

describe("which seasonal reminder is due", () => {
  it("sends the winter check from December 1 through January 31, named for the December's year", () => {
    expect(on("2026-11-30")).toBeNull();
    expect(on("2026-12-01")).toEqual({
      id: "winter-check",
      season: "winter",
      seasonKey: "winter-check-2026",
    });
    expect(on("2027-01-31")?.seasonKey).toBe("winter-check-2026");
    expect(on("2027-02-01")).toBeNull();
  });

  it("sends the spring return from March 1 to March 20", () => {
    expect(on("2028-02-29")).toBeNull();
    expect(on("2028-03-01")?.id).toBe("spring-return");
    expect(on("2028-03-20")?.seasonKey).toBe("spring-return-2028");
    expect(on("2028-03-21")).toBeNull();
  });

  it("sends the maternity-season quiet time in April, when the season starts", () => {
    expect(on("2026-03-31")).toBeNull();
    expect(on("2026-04-01")).toEqual({
      id: "quiet-time",
      season: "maternity",
      seasonKey: "quiet-time-2026",
    });
    expect(on("2026-04-30")?.id).toBe("quiet-time");
    expect(on("2026-05-01")).toBeNull();
  });

  it("reads the date in UTC: 23:59 on November 30 in UTC is not yet winter", () => {
    expect(findDueReminder({ date: new Date("2026-11-30T23:59:59Z") })).toBeNull();
    expect(findDueReminder({ date: new Date("2026-12-01T00:00:00Z") })?.id).toBe("winter-check");
  });

  it("refuses an invalid date", () => {
    expect(() => findDueReminder({ date: new Date("nope") })).toThrow(RangeError);
  });

  it("matches the upkeep calendar: the quiet time covers the maternity season of April to mid-August", () => {
    expect(getUpkeepSeason({ id: "maternity" }).months).toBe("April to mid-August");
    expect(getUpkeepSeason({ id: "winter" }).tasks.join(" ")).toMatch(/Re-caulk/);
  });
});
