import { describe, expect, it } from "vitest";
import { findDueReminder } from "@/lib/mail/seasons";
import { getUpkeepSeason, upkeepCalendarFor } from "@/lib/mail/upkeep-calendar";
import { cautionsFor } from "@/lib/safety/cautions";

// Source: PRODUCT.md §7 (upkeep in winter while empty; maternity season roughly April to
// mid-August); the window lengths are common practice, no source.

const on = (iso: string) => findDueReminder({ date: new Date(`${iso}T12:00:00Z`) });

describe("which seasonal reminder is due", () => {
  it("sends the winter check from December 1 through January 31, named for the December's year", () => {
    expect(on("2026-11-30")).toBeNull();
    expect(on("2026-12-01")).toEqual({
      id: "winter-check",
      season: "winter",
      hemisphere: "north",
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
      hemisphere: "north",
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

// PRODUCT.md §7: south of the equator the maternity season is roughly October to mid-February and
// upkeep falls in June–August; every calendar, reminder and caution uses the site's hemisphere.
describe("seasons south of the equator", () => {
  const south = (iso: string) => findDueReminder({ date: new Date(`${iso}T12:00:00Z`), hemisphere: "south" });

  it("sends the winter check from June 1 to July 31, the spring return in September, the quiet time in October", () => {
    expect(south("2026-05-31")).toBeNull();
    expect(south("2026-06-01")).toEqual({ id: "winter-check", season: "winter", hemisphere: "south", seasonKey: "winter-check-south-2026" });
    expect(south("2026-07-31")?.id).toBe("winter-check");
    expect(south("2026-08-01")).toBeNull();
    expect(south("2026-09-01")?.id).toBe("spring-return");
    expect(south("2026-09-21")).toBeNull();
    expect(south("2026-10-01")?.id).toBe("quiet-time");
    // The northern winter check is not sent south: December is the middle of their maternity season.
    expect(south("2026-12-01")).toBeNull();
    expect(on("2026-06-01")).toBeNull();
  });

  it("shifts the calendar by six months and keeps the tasks", () => {
    const calendar = upkeepCalendarFor("south");
    expect(calendar.map((s) => [s.id, s.months])).toEqual([
      ["winter", "June to August"],
      ["spring", "September"],
      ["maternity", "October to mid-February"],
      ["autumn", "Mid-February to May"],
    ]);
    expect(getUpkeepSeason({ id: "spring", hemisphere: "south" }).tasks.join(" ")).toMatch(/end of September/);
    expect(upkeepCalendarFor("north")[2]?.months).toBe("April to mid-August");
  });

  it("words the maternity caution for the site's hemisphere", () => {
    const text = (h: "north" | "south") => cautionsFor({ hemisphere: h }).find((c) => c.id === "maternity-season")?.text ?? "";
    expect(text("north")).toMatch(/April to mid-August/);
    expect(text("south")).toMatch(/October to mid-February/);
    expect(text("south")).toMatch(/June to August/);
    expect(text("south")).not.toMatch(/April/);
  });

  it("starts the winter check, in either hemisphere, by making sure the house is empty, and leaves an occupied one alone whatever the month", () => {
    for (const h of ["north", "south"] as const) {
      const first = getUpkeepSeason({ id: "winter", hemisphere: h }).tasks[0] ?? "";
      expect(first).toMatch(/^First make sure the house is empty: at dusk, watch it from the ground/);
      expect(first).toMatch(/warmest areas some colonies stay all year/);
      expect(first).toMatch(/leave it alone, whatever the month/);
    }
  });
});
