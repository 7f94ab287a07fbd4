// P4, sun on the house by mount (PRODUCT.md §4). Source: published guidance keyed to the average
// July high (Tuttle, Kiser & Kiser, "The Bat House Builder's Handbook", 2004, as quoted in agency
// guides: at least 6 h where July highs are under 100 °F, at least 10 h where they are 80 °F or
// less); 6–8 h of morning sun is common practice; fair bands and the 60% rule are the store's own.
// "July high" is the warmest month's value (PRODUCT.md §2).
import { describe, expect, it } from "vitest";
import { checkSun, getSunRegime, rateSun } from "@/lib/placement/sun-rule";
import type { SunOnHouseSummary } from "@/lib/placement/types";

const sun = (hours: number, morningShare = 0.7) => ({ hours, morningShare });

function summary(partial: Partial<SunOnHouseSummary> = {}): SunOnHouseSummary {
  return {
    mount: "pole",
    pairedBackToBack: false,
    house: sun(15, 0.5),
    face: { ...sun(9.7, 0.62), deg: 160 },
    bestWall: { deg: 152, hours: 9.84 },
    openPoleHours: 15.2,
    skyline: { described: false, lostHours: 0, mainDirection: null },
    ...partial,
  };
}

describe("temperature regimes", () => {
  it.each([
    [80, "mild"],
    [80.01, "warm"],
    [99.99, "warm"],
    [100, "very hot"],
  ] as const)("warmest-month high %s °F → %s", (julyHighF, regime) => {
    expect(getSunRegime(julyHighF)).toBe(regime);
  });
});

describe("P4 thresholds on the house figure", () => {
  it.each([
    [75, 10, "good"],
    [80, 10, "good"],
    [80, 9.99, "fair"],
    [80, 6, "fair"],
    [80, 5.99, "poor"],
    [80.01, 6, "good"],
    [85, 6, "good"],
    [85, 5.99, "fair"],
    [99.9, 4, "fair"],
    [99.9, 3.99, "poor"],
  ] as const)("%s °F, %s h → %s", (julyHighF, hours, status) => {
    expect(rateSun({ julyHighF, sun: sun(hours) })).toBe(status);
  });

  it("100 °F and above: good needs 4 h with at least 60% before solar noon, else fair", () => {
    expect(rateSun({ julyHighF: 100, sun: sun(4, 0.6) })).toBe("good");
    expect(rateSun({ julyHighF: 105, sun: sun(9, 0.8) })).toBe("good");
    expect(rateSun({ julyHighF: 100, sun: sun(4, 0.59) })).toBe("fair");
    expect(rateSun({ julyHighF: 100, sun: sun(3.99, 1) })).toBe("fair");
    expect(rateSun({ julyHighF: 110, sun: sun(0, 0) })).toBe("fair");
  });

  it("rates the house, not the face: a pole with a 9.7 h face is good in a cool summer", () => {
    const pole = checkSun({ julyHighF: 75, sun: summary() });
    expect(pole.status).toBe("good");
    const wall = checkSun({
      julyHighF: 75,
      sun: summary({ mount: "building", house: sun(9.7, 0.62) }),
    });
    expect(wall.status).toBe("fair");
  });
});

describe("P4 words", () => {
  it("shows the house figure with the front face beside it (a wall: the face is the house)", () => {
    expect(checkSun({ julyHighF: 75, sun: summary() }).value).toBe(
      "15 h of direct sun on the house a day (50% before solar noon); front face 9 h 42 min (62% before solar noon)",
    );
    expect(
      checkSun({ julyHighF: 90, sun: summary({ mount: "building", house: sun(7.85, 0.5) }) }).value,
    ).toBe(
      "7 h 51 min of direct sun on the house a day (50% before solar noon), all of it on the front face",
    );
    expect(checkSun({ julyHighF: 90, sun: summary({ house: sun(5.999) }) }).value).toMatch(
      /^5 h 59 min/,
    );
  });

  it("says how the mount is counted", () => {
    expect(checkSun({ julyHighF: 75, sun: summary() }).reason).toMatch(
      /pole .* whenever the sun is up/,
    );
    expect(checkSun({ julyHighF: 75, sun: summary({ pairedBackToBack: true }) }).reason).toMatch(
      /back-to-back pair on a pole/,
    );
    expect(checkSun({ julyHighF: 75, sun: summary({ mount: "building" }) }).reason).toMatch(
      /only while the sun is in front of the wall/,
    );
    expect(checkSun({ julyHighF: 75, sun: summary({ mount: "tree" }) }).reason).toMatch(
      /tree we count the sun as for a pole/,
    );
  });

  it("says plainly that an open sky was assumed, or what the skyline takes", () => {
    expect(checkSun({ julyHighF: 75, sun: summary() }).reason).toMatch(
      /open sky was assumed: trees and buildings are not counted/,
    );
    const shaded = checkSun({
      julyHighF: 75,
      sun: summary({ skyline: { described: true, lostHours: 1.68, mainDirection: "to the east" } }),
    });
    expect(shaded.reason).toMatch(
      /skyline you described, which takes about 1 h 40 min a day, most of it to the east/,
    );
    expect(shaded.reason).not.toMatch(/open sky/);
  });

  it("a cool-summer wall that cannot reach 10 h is told a pole in the open gets more than any wall", () => {
    const rule = checkSun({
      julyHighF: 75,
      sun: summary({ mount: "building", house: sun(9.7, 0.62) }),
    });
    expect(rule.change).toBe(
      "No wall here gets 10 h: even the best, facing about 152° (south-southeast), gets 9 h 50 min. A pole in the open gets more sun than any wall: about 15 h 12 min a day here. Mount the house on a pole, away from trees and buildings.",
    );
  });

  it("a wall that a better bearing would fix is told that bearing", () => {
    const rule = checkSun({
      julyHighF: 90,
      sun: summary({ mount: "building", house: sun(4.5, 0.2), bestWall: { deg: 170, hours: 8.5 } }),
    });
    expect(rule.status).toBe("fair");
    expect(rule.change).toMatch(
      /^Choose a wall facing about 170° \(south\), which gets 8 h 30 min here\./,
    );
  });

  it("a shaded pole is told to move to the open, naming where the skyline takes most", () => {
    const rule = checkSun({
      julyHighF: 75,
      sun: summary({
        house: sun(8, 0.3),
        skyline: { described: true, lostHours: 7, mainDirection: "to the east" },
      }),
    });
    expect(rule.status).toBe("fair");
    expect(rule.change).toMatch(
      /Move the pole to a more open spot.*above all to the east.*15 h 12 min/,
    );
  });

  it("very hot: a pole lit all round is fair, with advice for afternoon shade; mirrored south", () => {
    const rule = checkSun({ julyHighF: 104, sun: summary() });
    expect(rule.status).toBe("fair");
    expect(rule.change).toMatch(/shade after noon .*east to southeast/);
    const south = checkSun({ julyHighF: 104, sun: summary(), hemisphere: "south" });
    expect(south.change).toMatch(/east to northeast/);
    const short = checkSun({ julyHighF: 104, sun: summary({ house: sun(3, 0.9) }) });
    expect(short.change).toMatch(/at least 4 h of sun, most of it in the morning/);
  });

  it("every fair or poor result says what to change; good ones do not", () => {
    for (const [julyHighF, hours, share, mount] of [
      [75, 11, 0.5, "pole"],
      [75, 7, 0.5, "pole"],
      [75, 3, 0.5, "building"],
      [90, 5, 0.7, "tree"],
      [104, 6, 0.3, "building"],
      [104, 2, 1, "pole"],
    ] as const) {
      const rule = checkSun({ julyHighF, sun: summary({ mount, house: sun(hours, share) }) });
      if (rule.status === "good") expect(rule.change).toBeUndefined();
      else expect(rule.change?.length).toBeGreaterThan(20);
    }
  });
});
