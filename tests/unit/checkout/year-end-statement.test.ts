import { describe, expect, it } from "vitest";
import { yearEndStatement, type GiftRecord } from "@/lib/checkout/receipts";

// PRODUCT.md §6: a donor's gifts in one calendar year, totalled. Common practice, no source: the
// year is read in UTC unless the center passes its own time zone.

const gifts: GiftRecord[] = [
  { date: "2025-06-01T15:00:00Z", amountCents: 5_000, orderId: "ord-june" },
  { date: "2024-12-31T23:59:59Z", amountCents: 1_000, orderId: "ord-last-2024" },
  { date: new Date("2025-01-01T00:00:00Z"), amountCents: 2_500, orderId: "ord-first-2025" },
  { date: "2025-12-31T23:59:59.999Z", amountCents: 30_000, orderId: "ord-last-2025" },
  { date: "2026-01-01T00:00:00Z", amountCents: 7_500, orderId: "ord-first-2026" },
  // 10 p.m. on December 31 in Chicago, already January 1 in UTC.
  { date: "2026-01-01T04:00:00Z", amountCents: 1_200, orderId: "ord-chicago-eve" },
];

describe("yearEndStatement", () => {
  it("totals one UTC calendar year, edges included, oldest first", () => {
    const statement = yearEndStatement({ gifts, year: 2025 });
    expect(statement.gifts.map((gift) => gift.orderId)).toEqual([
      "ord-first-2025",
      "ord-june",
      "ord-last-2025",
    ]);
    expect(statement).toMatchObject({ year: 2025, timeZone: "UTC", count: 3, totalCents: 37_500 });
    expect(statement.statements[0]).toBe("Your gifts in 2025: 3 gifts, $375.00 in all.");
  });

  it("puts a New Year's Eve gift in the local year when given the center's time zone", () => {
    expect(yearEndStatement({ gifts, year: 2026 }).totalCents).toBe(8_700);
    const local = yearEndStatement({ gifts, year: 2025, timeZone: "America/Chicago" });
    expect(local.gifts.map((gift) => gift.orderId)).toContain("ord-chicago-eve");
    // 2025-12-31T23:59:59.999Z is still the afternoon of the 31st in Chicago; 2025-01-01T00:00Z is
    // the evening of 2024-12-31 there.
    expect(local.gifts.map((gift) => gift.orderId)).toEqual([
      "ord-june",
      "ord-last-2025",
      "ord-first-2026",
      "ord-chicago-eve",
    ]);
    expect(local.totalCents).toBe(5_000 + 30_000 + 7_500 + 1_200);
  });

  it("says so when there were no gifts that year, in the singular for one", () => {
    expect(yearEndStatement({ gifts, year: 2023 })).toMatchObject({
      count: 0,
      totalCents: 0,
      statements: ["We have no gifts from you on record for 2023."],
    });
    expect(yearEndStatement({ gifts, year: 2024 }).statements[0]).toBe(
      "Your gifts in 2024: 1 gift, $10.00 in all.",
    );
  });

  it("refuses a bad date, amount or year", () => {
    expect(() =>
      yearEndStatement({
        gifts: [{ date: "not a date", amountCents: 100, orderId: "x" }],
        year: 2025,
      }),
    ).toThrow(RangeError);
    expect(() =>
      yearEndStatement({
        gifts: [{ date: "2025-01-02", amountCents: 0, orderId: "x" }],
        year: 2025,
      }),
    ).toThrow(RangeError);
    expect(() => yearEndStatement({ gifts, year: 2025.5 })).toThrow(RangeError);
  });
});
