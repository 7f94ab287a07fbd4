// P4, sun hours (PRODUCT.md §4). Source: published guidance keyed to the average July high
// (Tuttle, Kiser & Kiser, "The Bat House Builder's Handbook", 2004, as quoted in agency guides:
// at least 6 h where July highs are under 100 °F, at least 10 h where they are 80 °F or less);
// 6–8 h of morning sun is common practice; fair bands and the 60% rule are the store's own.
import { describe, expect, it } from "vitest";
import { seasonSunHours } from "@/lib/placement/sun";
import { checkSun, getSunRegime, rateSun } from "@/lib/placement/sun-rule";

const sun = (hours: number, morningShare = 0.7) => ({ hours, morningShare });

describe("temperature regimes", () => {
  it.each([
    [80, "mild"],
    [80.01, "warm"],
    [99.99, "warm"],
    [100, "very hot"],
  ] as const)("July high %s °F → %s", (julyHighF, regime) => {
    expect(getSunRegime(julyHighF)).toBe(regime);
  });
});

describe("P4 thresholds", () => {
  it.each([
    [75, 10, "good"],
    [80, 10, "good"],
    [80, 9.99, "fair"],
    [80, 6, "fair"],
    [80, 5.99, "poor"],
    [85, 6, "good"],
    [85, 5.99, "fair"],
    [99.9, 4, "fair"],
    [99.9, 3.99, "poor"],
  ] as const)("July high %s °F, %s h → %s", (julyHighF, hours, status) => {
    expect(rateSun({ julyHighF, sun: sun(hours) })).toBe(status);
  });

  it("100 °F and above: good needs 4 h with at least 60% before solar noon", () => {
    expect(rateSun({ julyHighF: 100, sun: sun(4, 0.6) })).toBe("good");
    expect(rateSun({ julyHighF: 105, sun: sun(9, 0.8) })).toBe("good");
    expect(rateSun({ julyHighF: 100, sun: sun(4, 0.59) })).toBe("fair");
    expect(rateSun({ julyHighF: 100, sun: sun(3.99, 1) })).toBe("fair");
    // "else fair": the table gives the hottest band no poor.
    expect(rateSun({ julyHighF: 110, sun: sun(0, 0) })).toBe("fair");
  });

  it("every result says trees and buildings are not modelled; fair and poor say what to change", () => {
    for (const [julyHighF, hours, share] of [
      [75, 11, 0.7],
      [75, 7, 0.7],
      [75, 3, 0.7],
      [90, 5, 0.7],
      [104, 6, 0.3],
      [104, 2, 1],
    ] as const) {
      const rule = checkSun({ julyHighF, sun: sun(hours, share) });
      expect(rule.reason).toMatch(/trees, buildings and hills .* not modelled/);
      if (rule.status === "good") expect(rule.change).toBeUndefined();
      else expect(rule.change).toBeTruthy();
    }
    expect(checkSun({ julyHighF: 104, sun: sun(6, 0.3) }).change).toMatch(/east to southeast/);
    // Mirrored: morning sun leans north in the southern hemisphere.
    const south = checkSun({ julyHighF: 104, sun: sun(6, 0.3), hemisphere: "south" });
    expect(south.change).toMatch(/east to northeast/);
  });

  it("shows hours and minutes, rounded down, and the morning share", () => {
    expect(checkSun({ julyHighF: 90, sun: sun(7.85, 0.5) }).value).toBe(
      "7 h 51 min of direct sun a day (50% before solar noon)",
    );
    expect(checkSun({ julyHighF: 90, sun: sun(5.999, 0.5) }).value).toMatch(/^5 h 59 min/);
    expect(checkSun({ julyHighF: 90, sun: sun(6, 0.5) }).value).toMatch(/^6 h of/);
  });
});

describe("P4 with computed season sun at 40° N", () => {
  const southeast = seasonSunHours({ lat: 40, lon: -105, facingDeg: 135 });
  const west = seasonSunHours({ lat: 40, lon: -105, facingDeg: 270 });

  it("a southeast face (about 9 h, mostly morning) suits warm and very hot climates", () => {
    expect(southeast.hours).toBeGreaterThan(8.5);
    expect(southeast.hours).toBeLessThan(10);
    expect(rateSun({ julyHighF: 78, sun: southeast })).toBe("fair");
    expect(rateSun({ julyHighF: 90, sun: southeast })).toBe("good");
    expect(rateSun({ julyHighF: 102, sun: southeast })).toBe("good");
  });

  it("a west face gets only afternoon sun: fair where July highs reach 100 °F", () => {
    expect(west.morningShare).toBe(0);
    expect(rateSun({ julyHighF: 102, sun: west })).toBe("fair");
  });
});
