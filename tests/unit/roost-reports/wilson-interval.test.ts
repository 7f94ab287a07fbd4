import { describe, expect, it } from "vitest";
// wilson-score (npm) computes the Wilson lower bound only; the upper bound of k/n is one minus
// the lower bound of (n − k)/n, by the interval's symmetry.
import wilsonLower from "wilson-score";
import { wilsonInterval, Z_95 } from "@/lib/roost-reports/wilson-interval";

// R. G. Newcombe, Statistics in Medicine 17 (1998) 857–872, Table II, method 3 (score interval
// without continuity correction), to four decimals.
const NEWCOMBE: { k: number; n: number; lower: number; upper: number }[] = [
  { k: 81, n: 263, lower: 0.2553, upper: 0.3662 },
  { k: 15, n: 148, lower: 0.0624, upper: 0.1605 },
  { k: 0, n: 20, lower: 0, upper: 0.1611 },
  { k: 1, n: 29, lower: 0.0061, upper: 0.1718 },
  { k: 29, n: 29, lower: 0.883, upper: 1 },
  { k: 0, n: 10, lower: 0, upper: 0.2775 },
];

describe("wilsonInterval", () => {
  it.each(NEWCOMBE)("matches Newcombe's worked example $k/$n", ({ k, n, lower, upper }) => {
    const interval = wilsonInterval({ successes: k, trials: n });
    expect(interval.lower).toBeCloseTo(lower, 4);
    expect(interval.upper).toBeCloseTo(upper, 4);
  });

  it("agrees with the wilson-score package from the registry across many counts", () => {
    for (const n of [1, 2, 5, 7, 12, 30, 100, 263]) {
      for (let k = 0; k <= n; k += Math.max(1, Math.floor(n / 9))) {
        const ours = wilsonInterval({ successes: k, trials: n });
        expect(ours.lower).toBeCloseTo(Math.max(0, wilsonLower(k, n, Z_95)), 10);
        expect(ours.upper).toBeCloseTo(Math.min(1, 1 - wilsonLower(n - k, n, Z_95)), 10);
      }
    }
  });

  it("uses z = 1.96 for 95% and keeps the interval inside [0, 1] around the observed share", () => {
    expect(Z_95).toBeCloseTo(1.96, 2);
    const i = wilsonInterval({ successes: 3, trials: 5 });
    expect(i.lower).toBeGreaterThan(0);
    expect(i.lower).toBeLessThan(0.6);
    expect(i.upper).toBeGreaterThan(0.6);
    expect(i.upper).toBeLessThan(1);
  });

  it("refuses counts that are not a proportion", () => {
    expect(() => wilsonInterval({ successes: 0, trials: 0 })).toThrow(RangeError);
    expect(() => wilsonInterval({ successes: 6, trials: 5 })).toThrow(RangeError);
    expect(() => wilsonInterval({ successes: -1, trials: 5 })).toThrow(RangeError);
    expect(() => wilsonInterval({ successes: 1.5, trials: 5 })).toThrow(RangeError);
  });
});
