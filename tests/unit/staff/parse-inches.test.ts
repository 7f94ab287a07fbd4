import { describe, expect, it } from "vitest";
import { inchesForInput, parseInches, parseWholeNumber } from "@/lib/staff/parse-inches";

// Source: common practice, no source (shop fractions as read off a tape). Outside check: NIST
// SP 811 (2008), 1 in = 25.4 mm exactly, so 3/4 in = 19.05 mm and 1/16 in = 1.5875 mm.

describe("parseInches", () => {
  it("reads decimals and whole inches", () => {
    expect(parseInches("0.75")).toBe(0.75);
    expect(parseInches(".875")).toBe(0.875);
    expect(parseInches("22")).toBe(22);
    expect(parseInches(" 24.5 ")).toBe(24.5);
  });

  it("reads shop fractions and mixed numbers, with or without a unit", () => {
    expect(parseInches("3/4")).toBe(0.75);
    expect(parseInches("1 1/2")).toBe(1.5);
    expect(parseInches("1-1/2")).toBe(1.5);
    expect(parseInches('22"')).toBe(22);
    expect(parseInches("3/4 in")).toBe(0.75);
    expect(parseInches("1/32")).toBe(0.03125);
  });

  it("agrees with NIST's exact inch: 3/4 in is 19.05 mm and 1/16 in is 1.5875 mm", () => {
    expect(parseInches("3/4")! * 25.4).toBeCloseTo(19.05, 10);
    expect(parseInches("1/16")! * 25.4).toBeCloseTo(1.5875, 10);
  });

  it("gives undefined for an empty box and NaN for anything that is not a length", () => {
    expect(parseInches("")).toBeUndefined();
    expect(parseInches("   ")).toBeUndefined();
    for (const bad of ["abc", "3/0", "1 3/2", "-1", "1/2/3", "2 ft", "0,75"])
      expect(parseInches(bad), bad).toBeNaN();
  });
});

describe("inchesForInput", () => {
  it("shows values on a sixteenth or a thirty-second as shop fractions", () => {
    expect(inchesForInput(0.75)).toBe("3/4");
    expect(inchesForInput(1.5)).toBe("1 1/2");
    expect(inchesForInput(24)).toBe("24");
    expect(inchesForInput(1 / 32)).toBe("1/32");
    expect(inchesForInput(0.8125)).toBe("13/16");
  });

  it("keeps other values as decimals so nothing is rounded away", () => {
    expect(inchesForInput(0.74)).toBe("0.74");
    expect(inchesForInput(undefined)).toBe("");
  });

  it("round-trips through parseInches", () => {
    for (const v of [0.75, 0.875, 1, 1.5, 22.25, 0.0625, 0.74, 13.3])
      expect(parseInches(inchesForInput(v))).toBe(v);
  });
});

describe("parseWholeNumber", () => {
  it("reads signed whole numbers, including a typographic minus", () => {
    expect(parseWholeNumber("3")).toBe(3);
    expect(parseWholeNumber("+3")).toBe(3);
    expect(parseWholeNumber("-2")).toBe(-2);
    expect(parseWholeNumber("\u22122")).toBe(-2);
    expect(parseWholeNumber("")).toBeUndefined();
    expect(parseWholeNumber("2.5")).toBeNaN();
  });
});
