import { describe, expect, it } from "vitest";
import { BAND_IDS, type BandId } from "@/lib/catalog/climate-bands";
import { FIT_LABEL_WORDS, fitForBand } from "@/lib/catalog/fit";
import { SHADES, type Shade } from "@/lib/catalog/spec";

// Product brief §3, from the handbook's colour-by-July-high guidance (Tuttle, Kiser & Kiser,
// 2004): steps along black → dark → medium → light → white to the nearest suitable shade.
// Expected values worked out by hand from the §2 table, one row per shade.
const EXPECTED: Record<Shade, Record<BandId, [steps: number, repaintTo: Shade | undefined]>> = {
  black: { cool: [0, undefined], warm: [1, "dark"], hot: [2, "medium"], "very-hot": [3, "light"] },
  dark: {
    cool: [0, undefined],
    warm: [0, undefined],
    hot: [1, "medium"],
    "very-hot": [2, "light"],
  },
  medium: {
    cool: [1, "dark"],
    warm: [0, undefined],
    hot: [0, undefined],
    "very-hot": [1, "light"],
  },
  light: {
    cool: [2, "dark"],
    warm: [1, "medium"],
    hot: [0, undefined],
    "very-hot": [0, undefined],
  },
  white: { cool: [3, "dark"], warm: [2, "medium"], hot: [1, "light"], "very-hot": [0, undefined] },
};

describe("fitForBand, every shade in every band", () => {
  for (const shade of SHADES) {
    for (const band of BAND_IDS) {
      const [steps, repaintTo] = EXPECTED[shade][band];
      it(`${shade} in ${band}: ${steps} step(s)`, () => {
        const vented = fitForBand({ exteriorShade: shade, vented: true }, band);
        expect(vented.steps).toBe(steps);
        expect(vented.repaintTo).toBe(repaintTo);
        expect(vented.label).toBe(steps === 0 ? "good" : steps === 1 ? "fair" : "poor");
        // Without vents only the cool band (vents optional) keeps its label.
        const unvented = fitForBand({ exteriorShade: shade, vented: false }, band);
        expect(unvented.steps).toBe(steps);
        expect(unvented.label).toBe(band === "cool" ? vented.label : "poor");
      });
    }
  }
});

describe("fit reasons", () => {
  it("says which shade to repaint to when one step off", () => {
    const fit = fitForBand({ exteriorShade: "medium", vented: true }, "cool");
    expect(fit.reasons[0]).toMatch(/repaint it dark/);
  });

  it("explains too hot and too cool the right way round", () => {
    expect(fitForBand({ exteriorShade: "black", vented: true }, "hot").reasons[0]).toMatch(
      /too hot/,
    );
    expect(fitForBand({ exteriorShade: "white", vented: true }, "cool").reasons[0]).toMatch(
      /too cool/,
    );
  });

  it("names missing vents and afternoon shade where they matter", () => {
    const fit = fitForBand({ exteriorShade: "white", vented: false }, "very-hot");
    expect(fit.label).toBe("poor");
    expect(fit.reasons.join(" ")).toMatch(/no vents/);
    expect(fit.reasons.join(" ")).toMatch(/shade in the afternoon/);
    expect(
      fitForBand({ exteriorShade: "black", vented: false }, "cool").reasons.join(" "),
    ).not.toMatch(/vents/);
  });

  it("has our own words for each label", () => {
    expect(Object.keys(FIT_LABEL_WORDS)).toEqual(["good", "fair", "poor"]);
    expect(new Set(Object.values(FIT_LABEL_WORDS)).size).toBe(3);
  });
});
