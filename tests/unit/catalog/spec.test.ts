import { describe, expect, it } from "vitest";
import { formatInches, houseSpecSchema, SHADES, SHADE_LABELS } from "@/lib/catalog/spec";
import { SOUND_SPEC, withSpec } from "./sample-spec";

const issuesFor = (input: unknown) => {
  const parsed = houseSpecSchema.safeParse(input);
  return parsed.success
    ? []
    : parsed.error.issues.map((i) => ({ path: i.path.join("."), message: i.message }));
};

describe("houseSpecSchema", () => {
  it("accepts a sound four-chamber spec unchanged", () => {
    expect(houseSpecSchema.parse(SOUND_SPEC)).toEqual(SOUND_SPEC);
  });

  it("accepts values the design check will fail, so staff see the reason there", () => {
    expect(
      issuesFor(withSpec({ chamberGapIn: 1.5, landingAreaIn: 0, interiorSurface: "smooth" })),
    ).toEqual([]);
  });

  it("tells someone who typed 100 ft (1200 in) for the gap to check the units", () => {
    const [issue] = issuesFor(withSpec({ chamberGapIn: 1200 }));
    expect(issue?.path).toBe("chamberGapIn");
    expect(issue?.message).toMatch(/at most 4 in.*feet or centimetres/);
  });

  it("says what is missing, in plain words", () => {
    const { chamberHeightIn: _omit, ...rest } = SOUND_SPEC;
    expect(issuesFor(rest)).toEqual([
      { path: "chamberHeightIn", message: "Enter the chamber height in inches." },
    ]);
  });

  it("rejects text and NaN for lengths, fractional or out-of-range chamber counts", () => {
    expect(issuesFor(withSpec({ chamberWidthIn: Number.NaN }))[0]?.path).toBe("chamberWidthIn");
    expect(issuesFor({ ...SOUND_SPEC, outerWidthIn: "24" })[0]?.message).toMatch(
      /number of inches/,
    );
    expect(issuesFor(withSpec({ chamberCount: 2.5 }))[0]?.message).toBe(
      "The number of chambers is a whole number.",
    );
    expect(issuesFor(withSpec({ chamberCount: 0 }))[0]?.path).toBe("chamberCount");
    expect(issuesFor(withSpec({ chamberCount: 13 }))[0]?.path).toBe("chamberCount");
    expect(issuesFor(withSpec({ chamberCount: 12 }))).toEqual([]);
    expect(issuesFor(withSpec({ landingAreaIn: -1 }))[0]?.path).toBe("landingAreaIn");
  });

  it("refuses chambers larger than the house around them", () => {
    expect(issuesFor(withSpec({ chamberHeightIn: 32, outerHeightIn: 31 }))).toEqual([
      {
        path: "chamberHeightIn",
        message: "The chamber height cannot be more than the outside height.",
      },
    ]);
    expect(issuesFor(withSpec({ chamberWidthIn: 25 }))[0]?.path).toBe("chamberWidthIn");
  });

  it("lets groove sizes be left out (the design check then fails D6)", () => {
    const { grooveSpacingIn: _s, grooveDepthIn: _d, ...rest } = SOUND_SPEC;
    expect(issuesFor(rest)).toEqual([]);
  });

  it("lists shades dark to light with a label for each", () => {
    expect(SHADES).toEqual(["black", "dark", "medium", "light", "white"]);
    expect(Object.keys(SHADE_LABELS)).toEqual([...SHADES]);
  });
});

describe("formatInches", () => {
  it("shows sixteenths as reduced shop fractions with centimetres", () => {
    expect(formatInches(0.875)).toBe("7/8 in (2.2 cm)");
    expect(formatInches(0.75)).toBe("3/4 in (1.9 cm)");
    expect(formatInches(1 / 16)).toBe("1/16 in (0.2 cm)");
    // 1/32 in only when exact: groove depths are specified in 32nds.
    expect(formatInches(1 / 32)).toBe("1/32 in (0.1 cm)");
    expect(formatInches(2 / 32)).toBe("1/16 in (0.2 cm)");
    expect(formatInches(0.04)).toBe("0.04 in (0.1 cm)");
    expect(formatInches(24)).toBe("24 in (61.0 cm)");
    expect(formatInches(14.5)).toBe("14 1/2 in (36.8 cm)");
    expect(formatInches(1.4375)).toBe("1 7/16 in (3.7 cm)");
    expect(formatInches(0)).toBe("0 in (0 cm)");
  });

  it("keeps values off the sixteenth grid as decimals, so 0.74 never reads as 3/4", () => {
    expect(formatInches(0.74)).toBe("0.74 in (1.9 cm)");
    expect(formatInches(1.01)).toBe("1.01 in (2.6 cm)");
    // Decimal noise from arithmetic still lands on the fraction.
    expect(formatInches(0.1 + 0.65)).toBe("3/4 in (1.9 cm)");
  });

  it("converts with the exact inch: 1 in = 2.54 cm (NIST SP 811, 2008, Appendix B)", () => {
    // 7/8 in = 2.2225 cm and 100 in = 254 cm exactly.
    expect(formatInches(100)).toBe("100 in (254.0 cm)");
    expect(formatInches(0.875)).toContain(`${(2.2225).toFixed(1)} cm`);
  });

  it("does not pretend for non-numbers", () => {
    expect(formatInches(Number.NaN)).toBe("—");
  });
});
