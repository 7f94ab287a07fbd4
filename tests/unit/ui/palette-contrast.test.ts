import Color from "color";
import { describe, expect, it } from "vitest";

import {
  contrastMinimum,
  getContrastRatio,
  getRelativeLuminance,
} from "@/components/brand/contrast";
import { contrastPairs } from "@/components/brand/contrast-pairs";
import { palette } from "@/components/brand/palette";

// Source of the arithmetic: W3C, WCAG 2.2 (2023), "relative luminance" and "contrast ratio".

describe("getRelativeLuminance", () => {
  it("gives 0 for black and 1 for white (the ends of the WCAG scale)", () => {
    expect(getRelativeLuminance("#000000")).toBe(0);
    expect(getRelativeLuminance("#ffffff")).toBeCloseTo(1, 12);
  });

  it("uses the linear segment at and below 0.04045 and the power curve above it", () => {
    // 10/255 = 0.0392 is on the linear part; 11/255 = 0.0431 is on the curve.
    expect(getRelativeLuminance("#0a0a0a")).toBeCloseTo(10 / 255 / 12.92, 12);
    expect(getRelativeLuminance("#0b0b0b")).toBeCloseTo(((11 / 255 + 0.055) / 1.055) ** 2.4, 12);
  });

  it("rejects anything but #rrggbb", () => {
    expect(() => getRelativeLuminance("#fff")).toThrow(/#rrggbb/);
    expect(() => getRelativeLuminance("moss")).toThrow(/#rrggbb/);
  });
});

describe("getContrastRatio", () => {
  it("is 21:1 for black on white and 1:1 for a colour on itself, in either order", () => {
    expect(getContrastRatio({ foreground: "#000000", background: "#ffffff" })).toBeCloseTo(21, 10);
    expect(getContrastRatio({ foreground: "#ffffff", background: "#000000" })).toBeCloseTo(21, 10);
    expect(getContrastRatio({ foreground: palette.moss[500], background: palette.moss[500] })).toBe(
      1,
    );
  });

  it("matches the published grey-on-white values either side of the 4.5:1 line", () => {
    // WebAIM Contrast Checker and WCAG technique G18 discussions: #767676 on white is 4.54:1,
    // the lightest grey that passes AA for body text; #777777 is 4.48:1 and fails.
    expect(getContrastRatio({ foreground: "#767676", background: "#ffffff" })).toBeCloseTo(4.54, 2);
    expect(getContrastRatio({ foreground: "#777777", background: "#ffffff" })).toBeCloseTo(4.48, 2);
    expect(
      getContrastRatio({ foreground: "#767676", background: "#ffffff" }),
    ).toBeGreaterThanOrEqual(contrastMinimum.text);
    expect(getContrastRatio({ foreground: "#777777", background: "#ffffff" })).toBeLessThan(
      contrastMinimum.text,
    );
  });

  it("agrees with the `color` package from the npm registry on every pair we use", () => {
    for (const pair of contrastPairs) {
      const theirs = Color(pair.foreground).contrast(Color(pair.background));
      expect(getContrastRatio(pair), pair.name).toBeCloseTo(theirs, 6);
    }
  });
});

describe("the palette", () => {
  it("meets WCAG 2.2 AA for every pair the components use", () => {
    const failures = contrastPairs
      .map((pair) => ({ ...pair, ratio: getContrastRatio(pair) }))
      .filter((pair) => pair.ratio < contrastMinimum[pair.use])
      .map((pair) => `${pair.name}: ${pair.ratio.toFixed(2)}:1 < ${contrastMinimum[pair.use]}:1`);
    expect(failures).toEqual([]);
  });

  it("gets darker at every step of each scale, so 700 is always darker than 600", () => {
    for (const [name, scale] of Object.entries(palette)) {
      if (name === "ink") continue;
      const luminances = Object.values(scale).map((hex) => getRelativeLuminance(hex));
      for (let i = 1; i < luminances.length; i += 1) {
        expect(luminances[i], `${name} step ${i}`).toBeLessThan(luminances[i - 1] ?? Infinity);
      }
    }
  });

  it("keeps the key pairs comfortably above the minimum", () => {
    // The numbers quoted in tailwind.config.ts's comment; a palette change must update both.
    const ratio = (foreground: string, background: string) =>
      Number(getContrastRatio({ foreground, background }).toFixed(2));
    expect(ratio(palette.ink.DEFAULT, palette.paper[100])).toBe(13.43);
    expect(ratio(palette.ink.soft, palette.paper[100])).toBe(7.31);
    expect(ratio(palette.bark[900], palette.ember[400])).toBe(7.33);
    expect(ratio(palette.paper[50], palette.berry[600])).toBe(6.95);
    expect(ratio(palette.bark[400], palette.paper[50])).toBe(3.8);
    expect(ratio(palette.dusk[500], palette.paper[100])).toBe(5.17);
  });
});
