import { describe, expect, it } from "vitest";
import { januaryStatementKey, statementYearDue } from "@/lib/giving/january";

describe("when the January statements are due", () => {
  it("is the first seven days of January in the center's zone, for the year just ended", () => {
    // 00:30 on January 1 in Oregon is 08:30 UTC.
    expect(statementYearDue(new Date("2027-01-01T08:30:00Z"), "America/Los_Angeles")).toBe(2026);
    expect(statementYearDue(new Date("2027-01-07T23:00:00Z"), "America/Los_Angeles")).toBe(2026);
    expect(statementYearDue(new Date("2027-01-08T08:00:00Z"), "America/Los_Angeles")).toBeNull();
  });

  it("is not yet due on the evening of December 31 in the center's zone, though UTC has turned the year", () => {
    expect(statementYearDue(new Date("2027-01-01T07:30:00Z"), "America/Los_Angeles")).toBeNull();
    expect(statementYearDue(new Date("2027-01-01T07:30:00Z"), "UTC")).toBe(2026);
  });

  it("keys one statement per donor and year", () => {
    expect(januaryStatementKey({ userId: "u1", year: 2026 })).toBe("year-end-statement:january:u1:2026");
    expect(januaryStatementKey({ userId: "u1", year: 2026 })).not.toBe(januaryStatementKey({ userId: "u1", year: 2025 }));
  });
});
