import { describe, expect, it } from "vitest";
import { yearEndStatement } from "@/lib/checkout/receipts";
import { centerDate, centerDay, centerMonth, centerYear, formatCenterDate, isTimeZone } from "@/lib/giving/center-time";
import { givingSettingsSchema } from "@/lib/giving/settings-schema";

// Offsets from the IANA time zone database: New York is UTC−5 in winter, Los Angeles UTC−8.
describe("the center's calendar", () => {
  it("counts a gift at 23:30 on December 31 in New York in that year (04:30 UTC on January 1)", () => {
    const instant = new Date("2027-01-01T04:30:00Z");
    expect(centerYear(instant, "America/New_York")).toBe(2026);
    expect(centerDay(instant, "America/New_York")).toBe("2026-12-31");
    expect(centerYear(instant, "UTC")).toBe(2027);
  });

  it("counts a gift at 23:30 on December 31 in Oregon in that year (07:30 UTC on January 1)", () => {
    const instant = new Date("2027-01-01T07:30:00Z");
    expect(centerDate(instant, "America/Los_Angeles")).toEqual({ year: 2026, month: 12, day: 31 });
    expect(formatCenterDate(instant, "America/Los_Angeles")).toBe("December 31, 2026");
    expect(centerMonth(instant, "America/Los_Angeles")).toBe("2026-12");
  });

  it("turns the year at midnight in the zone, not before", () => {
    expect(centerYear(new Date("2027-01-01T07:59:59Z"), "America/Los_Angeles")).toBe(2026);
    expect(centerYear(new Date("2027-01-01T08:00:00Z"), "America/Los_Angeles")).toBe(2027);
  });

  it("puts the late-evening gift in the year-end statement of the year it was made in", () => {
    const gifts = [
      { date: new Date("2027-01-01T04:30:00Z"), amountCents: 5_000, orderId: "a" },
      { date: new Date("2027-01-01T05:30:00Z"), amountCents: 700, orderId: "b" },
    ];
    expect(yearEndStatement({ gifts, year: 2026, timeZone: "America/New_York" }).totalCents).toBe(5_000);
    expect(yearEndStatement({ gifts, year: 2027, timeZone: "America/New_York" }).totalCents).toBe(700);
  });

  it("knows zone names and refuses made-up ones", () => {
    expect(isTimeZone("America/Los_Angeles")).toBe(true);
    expect(isTimeZone("UTC")).toBe(true);
    expect(isTimeZone("Mars/Olympus_Mons")).toBe(false);
    expect(isTimeZone("America/New York; drop")).toBe(false);
    expect(givingSettingsSchema.safeParse({ timeZone: "Nowhere/Else", feeBasisPoints: 290, feeFixedCents: 30, leadTimeWeeks: 6 }).success).toBe(false);
    expect(givingSettingsSchema.safeParse({ timeZone: "America/Chicago", feeBasisPoints: "290", feeFixedCents: "30", leadTimeWeeks: "6" }).success).toBe(true);
  });
});
