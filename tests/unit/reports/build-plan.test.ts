import { describe, expect, it } from "vitest";
import { buildPlan, type BuildPlanInput } from "@/lib/reports/build-plan";

// Hand-computed: in October 2026 the horizon is Oct 2026 – May 2027, so the basis is last
// year's Oct 2025 – May 2026. Hollow Four sold 2 + 1 + 4 + 6 = 13 units in those months (the
// July sale is outside), has 5 in stock: build 8. Twin Ridge sold 3, has 10: build 0.
const models: BuildPlanInput["models"] = [
  { slug: "hollow-four", name: "Hollow Four", stock: 5, sales: { "2025-10": 2, "2025-12": 1, "2026-03": 4, "2026-04": 6, "2026-07": 9 } },
  { slug: "twin-ridge", name: "Twin Ridge", stock: 10, sales: { "2026-04": 3 } },
];

describe("the build plan", () => {
  it("expects last year's sales over the months to the end of next spring, less the stock", () => {
    const plan = buildPlan({ today: { year: 2026, month: 10, day: 15 }, leadTimeWeeks: 6, models });
    expect(plan.horizon).toEqual(["2026-10", "2026-11", "2026-12", "2027-01", "2027-02", "2027-03", "2027-04", "2027-05"]);
    expect(plan.basis[0]).toBe("2025-10");
    expect(plan.lines).toEqual([
      { slug: "hollow-four", name: "Hollow Four", stock: 5, expected: 13, build: 8 },
      { slug: "twin-ridge", name: "Twin Ridge", stock: 10, expected: 3, build: 0 },
    ]);
    // March 1, 2027 less 6 weeks.
    expect(plan.springStarts).toBe("2027-03-01");
    expect(plan.startBy).toBe("2027-01-18");
  });

  it("inside spring plans to the end of this spring, and says start now when the lead time has run out", () => {
    const plan = buildPlan({ today: { year: 2027, month: 4, day: 2 }, leadTimeWeeks: 6, models });
    expect(plan.horizon).toEqual(["2027-04", "2027-05"]);
    expect(plan.lines[0]).toMatchObject({ expected: 6, build: 1 });
    expect(plan.startBy).toBe("2027-04-02");
  });

  it("on June 1 looks to the next year's spring; a zero lead time starts on March 1", () => {
    const plan = buildPlan({ today: { year: 2026, month: 6, day: 1 }, leadTimeWeeks: 0, models });
    expect(plan.horizon).toHaveLength(12);
    // Basis June 2025 – May 2026: the July 2026 sale is not in it.
    expect(plan.lines[0]!.expected).toBe(13);
    expect(plan.startBy).toBe("2027-03-01");
    expect(() => buildPlan({ today: { year: 2026, month: 6, day: 1 }, leadTimeWeeks: -1, models })).toThrow(RangeError);
  });
});
