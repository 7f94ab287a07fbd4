// P3, facing (PRODUCT.md §4). Source: common practice, no source (south to southeast for
// morning sun). Good 135°–180°, fair 90°–135° or 180°–202.5°, otherwise poor; the north-facing
// half of a back-to-back pair is fine; mirrored in the south as b → (180 − b) mod 360.
import { describe, expect, it } from "vitest";
import { checkFacing, findSunFaceBearing, rateFacing } from "@/lib/placement/facing-rule";
import type { PlacementSite } from "@/lib/placement/types";

const site: PlacementSite = {
  lat: 40,
  lon: -75,
  mount: "pole",
  heightFt: 16,
  facingDeg: 157,
  pairedBackToBack: false,
  stacked: false,
  waterMi: 0.1,
  woodsEdgeFt: 40,
  clearFlightPath: true,
  brightLight: false,
  predators: false,
};

describe("P3 northern hemisphere boundaries", () => {
  it.each([
    [135, "good"],
    [157.5, "good"],
    [180, "good"],
    [134.99, "fair"],
    [90, "fair"],
    [180.01, "fair"],
    [202.5, "fair"],
    [202.6, "poor"],
    [89.99, "poor"],
    [0, "poor"],
    [270, "poor"],
    [360, "poor"],
  ] as const)("%s° → %s", (facingDeg, status) => {
    expect(rateFacing({ lat: 40, facingDeg })).toBe(status);
  });
});

describe("P3 southern hemisphere (mirrored)", () => {
  it.each([
    [45, "good"], // mirror of 135
    [0, "good"], // mirror of 180
    [22.5, "good"],
    [90, "fair"], // east stays east
    [337.5, "fair"], // mirror of 202.5
    [337.4, "poor"], // mirror of 202.6
    [180, "poor"], // due south faces away from the sun there
    [157, "poor"],
  ] as const)("%s° at 34° S → %s", (facingDeg, status) => {
    expect(rateFacing({ lat: -34, facingDeg })).toBe(status);
  });

  it("suggests north-northeast in the south", () => {
    const rule = checkFacing({ ...site, lat: -34, facingDeg: 200 });
    expect(rule.status).toBe("poor");
    expect(rule.change).toMatch(/north-northeast \(about 22.5°\)/);
  });
});

describe("P3 back-to-back pairs", () => {
  it("the north-facing half of a pair is fine: the pair is rated by its south half", () => {
    const rule = checkFacing({ ...site, facingDeg: 0, pairedBackToBack: true });
    expect(rule.status).toBe("good");
    expect(rule.value).toBe("0° (north), back to back with 180° (south)");
    expect(findSunFaceBearing({ lat: 40, facingDeg: 0, pairedBackToBack: true })).toBe(180);
  });

  it("in the south the south-facing half is the fine one", () => {
    const rule = checkFacing({ ...site, lat: -34, facingDeg: 190, pairedBackToBack: true });
    expect(rule.status).toBe("good");
    expect(findSunFaceBearing({ lat: -34, facingDeg: 190, pairedBackToBack: true })).toBe(10);
  });

  it("a single north-facing house is still poor", () => {
    expect(checkFacing({ ...site, facingDeg: 0 }).status).toBe("poor");
  });

  it("a pair turned east–west is only fair", () => {
    const rule = checkFacing({ ...site, facingDeg: 270, pairedBackToBack: true });
    expect(rule.status).toBe("fair");
    expect(rule.change).toMatch(/Turn the pair/);
  });
});
