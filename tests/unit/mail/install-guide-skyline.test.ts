// The install guide carries the saved site's skyline in plain words (PRODUCT.md §4), worded by
// lib/placement/skyline-words.ts from the minutes the saved check measured.
import { describe, expect, it } from "vitest";
import { buildInstallGuide } from "@/lib/mail/install-guide-content";
import type { SkylineEffect } from "@/lib/placement/skyline-words";

const zeros = () => new Array<number>(16).fill(0);
const site = {
  name: "Orchard pole",
  label: "fair" as const,
  rules: [{ name: "Sun on the house", status: "fair" as const, reason: "Short of 10 h." }],
};
const guideFor = (skylineEffect?: SkylineEffect | null) =>
  buildInstallGuide({
    houses: [],
    climate: { known: false, reason: "test" },
    site: { ...site, skylineEffect },
    hemisphere: "north",
  });

describe("the guide's skyline sentence", () => {
  it("names where the skyline takes sun and how much", () => {
    const lostMorning = zeros();
    [lostMorning[3], lostMorning[4], lostMorning[5]] = [30, 50, 20];
    const guide = guideFor({
      described: true,
      lostMorning,
      lostAfternoon: zeros(),
      openSkyHours: 15,
      hours: 13.3,
    });
    expect(guide.site?.skyline).toBe(
      "The skyline you described takes about 1 h 40 min of sun a day from the house over the season. The trees or buildings to the east take about 1 h 40 min of morning sun a day.",
    );
  });

  it("says plainly that an open sky was assumed for a site checked without one", () => {
    expect(guideFor(null).site?.skyline).toMatch(/^An open sky was assumed: trees and buildings/);
    expect(guideFor(undefined).site?.skyline).toMatch(/^An open sky was assumed/);
  });
});
