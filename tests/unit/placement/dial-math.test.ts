// The compass dial's keys and geometry (components/placement/dial-math.ts), and the P3 sectors
// it draws (lib/placement/facing-rule.ts). Keys follow the WAI-ARIA slider pattern (W3C, ARIA
// Authoring Practices Guide, 2023): arrows step, Page Up/Down step further, Home/End go to the
// ends; the 5°/15° steps are common practice, no source.
import { describe, expect, it } from "vitest";
import {
  bearingFromOffset,
  describeDialValue,
  pointAt,
  ringSectorPath,
  stepBearing,
} from "@/components/placement/dial-math";
import { listFacingSectors, rateFacing } from "@/lib/placement/facing-rule";

describe("stepBearing", () => {
  it.each([
    [157, "ArrowRight", false, 162],
    [157, "ArrowUp", false, 162],
    [157, "ArrowLeft", false, 152],
    [157, "ArrowDown", true, 142],
    [157, "ArrowRight", true, 172],
    [357, "ArrowRight", false, 2],
    [2, "ArrowLeft", false, 357],
    [350, "ArrowUp", true, 5],
    [100, "PageUp", false, 115],
    [10, "PageDown", false, 355],
    [157, "Home", false, 0],
    [157, "End", false, 359],
    [157.1, "ArrowRight", false, 162.1],
  ])("%s° + %s (shift %s) → %s°", (bearing, key, shiftKey, expected) => {
    expect(stepBearing({ bearing, key, shiftKey })).toBe(expected);
  });

  it("ignores keys that are not the dial's", () => {
    expect(stepBearing({ bearing: 90, key: "Tab" })).toBeNull();
    expect(stepBearing({ bearing: 90, key: "a" })).toBeNull();
  });
});

describe("bearingFromOffset (screen coordinates, y down)", () => {
  it.each([
    [0, -10, 0],
    [10, 0, 90],
    [0, 10, 180],
    [-10, 0, 270],
    [10, -10, 45],
    [-10, -10, 315],
    [-0.001, -10, 0], // a hair west of north rounds to 0°, never 360°
  ])("(%s, %s) → %s°", (dx, dy, expected) => {
    expect(bearingFromOffset({ dx, dy })).toBe(expected);
  });

  it("agrees with Math.atan2 for a drag at 157° (independent check)", () => {
    const rad = (157 * Math.PI) / 180;
    expect(bearingFromOffset({ dx: 100 * Math.sin(rad), dy: -100 * Math.cos(rad) })).toBe(157);
  });
});

describe("dial drawing", () => {
  it("says the bearing in degrees and in words", () => {
    expect(describeDialValue(157)).toBe("157°, south-southeast");
    expect(describeDialValue(0)).toBe("0°, north");
    expect(describeDialValue(202.5)).toBe("202.5°, south-southwest");
  });

  it("places points clockwise from north", () => {
    expect(pointAt({ bearing: 0, radius: 10 })).toEqual({ x: 0, y: -10 });
    expect(pointAt({ bearing: 90, radius: 10 })).toEqual({ x: 10, y: 0 });
    expect(pointAt({ bearing: 180, radius: 10 })).toEqual({ x: 0, y: 10 });
  });

  it("draws a ring sector with the large-arc flag only past 180°", () => {
    expect(ringSectorPath({ from: 135, to: 180, inner: 80, outer: 100 })).toBe(
      "M70.71 70.71 A100 100 0 0 1 0 100 L0 80 A80 80 0 0 0 56.57 56.57 Z",
    );
    expect(ringSectorPath({ from: 0, to: 270, inner: 1, outer: 2 })).toContain("A2 2 0 1 1");
  });
});

describe("listFacingSectors", () => {
  it("gives P3's bands in the north: fair 90–135, good 135–180, fair 180–202.5", () => {
    expect(listFacingSectors({ lat: 40 })).toEqual([
      { from: 90, to: 135, status: "fair" },
      { from: 135, to: 180, status: "good" },
      { from: 180, to: 202.5, status: "fair" },
    ]);
  });

  it("mirrors them in the south: good 0–45 (north to northeast)", () => {
    expect(listFacingSectors({ lat: -34 })).toEqual([
      { from: 45, to: 90, status: "fair" },
      { from: 0, to: 45, status: "good" },
      { from: 337.5, to: 0, status: "fair" },
    ]);
  });

  it("agrees with rateFacing at every sector's middle and just outside", () => {
    for (const lat of [40, -34]) {
      for (const { from, to, status } of listFacingSectors({ lat })) {
        const sweep = (to - from + 360) % 360;
        expect(rateFacing({ lat, facingDeg: (from + sweep / 2) % 360 })).toBe(status);
      }
      expect(rateFacing({ lat, facingDeg: lat > 0 ? 89 : 91 })).toBe("poor");
      expect(rateFacing({ lat, facingDeg: lat > 0 ? 203 : 337 })).toBe("poor");
    }
  });
});
