import { describe, expect, it } from "vitest";
import { CAUTION_IDS, CAUTIONS, getCaution, MOVE_IN_PATIENCE } from "@/lib/safety/cautions";

// Source: PRODUCT.md §7, which lists every caution the store must show; the emergency-dig
// number is the one the FCC designated nationwide (Report and Order 05-134, 2005).

describe("the cautions of PRODUCT.md §7", () => {
  it("has exactly one caution per topic, in the order the brief lists them", () => {
    expect(CAUTIONS.map((c) => c.id)).toEqual([...CAUTION_IDS]);
  });

  it("says never to touch a bat with bare hands, names rabies, and says what to do after a bite", () => {
    const { title, text } = getCaution({ id: "bats-bare-hands" });
    expect(title).toMatch(/never touch a bat with bare hands/i);
    expect(text).toMatch(/rabies/);
    expect(text).toMatch(/bite or scratch/);
    expect(text).toMatch(/see a doctor/);
    expect(text).toMatch(/health department/);
  });

  it("asks for two people on ladders and poles, away from power lines", () => {
    const caution = getCaution({ id: "ladders-and-lines" });
    expect(`${caution.title} ${caution.text}`).toMatch(/two people/i);
    expect(caution.text).toMatch(/power lines/);
    // 10 ft is the approach distance for overhead lines up to 50 kV (29 CFR 1910.333(c)(3)).
    expect(caution.text).toContain("10 ft (3 m)");
  });

  it("names 811, the U.S. call-before-you-dig number, before digging a pole hole", () => {
    const caution = getCaution({ id: "call-before-digging" });
    expect(caution.title).toContain("811");
    expect(caution.text).toMatch(/before digging/);
  });

  it("keeps occupied houses closed in the maternity season and sends upkeep to winter", () => {
    const { text } = getCaution({ id: "maternity-season" });
    expect(text).toMatch(/roughly April to mid-August/);
    expect(text).toMatch(/state/);
    expect(text).toMatch(/upkeep in winter/i);
  });

  it("defers to local codes, permits, HOA rules and licensed practice", () => {
    const { text } = getCaution({ id: "local-rules-first" });
    for (const words of [
      /building codes/,
      /permits/,
      /homeowners' association/,
      /licensed professionals/,
    ])
      expect(text).toMatch(words);
  });

  it("tells buyers bats may take up to two years, and what to do after two empty summers", () => {
    expect(MOVE_IN_PATIENCE.text).toMatch(/up to two years/);
    expect(MOVE_IN_PATIENCE.text).toMatch(/two summers/);
    expect(MOVE_IN_PATIENCE.text).toMatch(/sunnier spot or darken/);
  });

  it("refuses an unknown caution id", () => {
    expect(() => getCaution({ id: "nope" as never })).toThrow(RangeError);
  });
});
