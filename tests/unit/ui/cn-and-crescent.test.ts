import { describe, expect, it } from "vitest";

import { getCrescentPath } from "@/components/brand/crescent-path";
import { cn } from "@/components/ui/cn";

describe("cn", () => {
  it("joins truthy parts with single spaces and drops false, null, undefined, 0 and empty strings", () => {
    const active = false;
    expect(cn("px-3", active && "bg-moss-50", null, undefined, 0, "", "py-2")).toBe("px-3 py-2");
    expect(cn()).toBe("");
  });
});

describe("getCrescentPath (circle intersection, common practice, no source)", () => {
  const outer = { cx: 37, cy: 11, r: 7 };
  const inner = { cx: 40.5, cy: 8.5, r: 6 };

  it("starts and turns at points that lie on both circles", () => {
    const numbers =
      getCrescentPath({ outer, inner })
        .match(/-?\d+(\.\d+)?/g)
        ?.map(Number) ?? [];
    // M x1 y1 A r r 0 large 0 x2 y2 ...
    const [x1, y1] = [numbers[0] ?? NaN, numbers[1] ?? NaN];
    const [x2, y2] = [numbers[7] ?? NaN, numbers[8] ?? NaN];
    for (const [x, y] of [
      [x1, y1],
      [x2, y2],
    ] as const) {
      expect(Math.hypot(x - outer.cx, y - outer.cy)).toBeCloseTo(outer.r, 1);
      expect(Math.hypot(x - inner.cx, y - inner.cy)).toBeCloseTo(inner.r, 1);
    }
  });

  it("works for the textbook case of two unit circles one unit apart (crossing at x = 0.5, y = ±√3/2)", () => {
    const path = getCrescentPath({ outer: { cx: 0, cy: 0, r: 1 }, inner: { cx: 1, cy: 0, r: 1 } });
    expect(path).toBe("M0.5 -0.87A1 1 0 1 0 0.5 0.87A1 1 0 0 1 0.5 -0.87Z");
  });

  it("refuses circles that do not cross", () => {
    expect(() => getCrescentPath({ outer, inner: { cx: 60, cy: 11, r: 6 } })).toThrow(/cross/);
    expect(() => getCrescentPath({ outer, inner: { cx: 37, cy: 11, r: 3 } })).toThrow(/cross/);
  });
});
