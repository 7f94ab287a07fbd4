import { describe, expect, it } from "vitest";
import { checkDesign, type CriterionId, type CriterionResult } from "@/lib/catalog/design-check";
import type { HouseSpec } from "@/lib/catalog/spec";
import { SOUND_SPEC, withSpec } from "./sample-spec";

// Thresholds from the product brief §1 table: Tuttle, Kiser & Kiser, The Bat House Builder's
// Handbook (2004); 1998 roost-house certification guidelines; Bat Conservation of Wisconsin;
// Shuswap Watershed Project guide; common practice where marked.

function criterion(spec: HouseSpec, id: CriterionId): CriterionResult {
  const found = checkDesign(spec).results.find((r) => r.id === id);
  if (!found) throw new Error(`no result for ${id}`);
  return found;
}
const statusOf = (changes: Partial<HouseSpec>, id: CriterionId) =>
  criterion(withSpec(changes), id).status;

describe("checkDesign on a sound spec", () => {
  const check = checkDesign(SOUND_SPEC);

  it("passes every criterion, in order D1–D11, with the table's kinds", () => {
    expect(check.results.map((r) => `${r.id}:${r.kind}:${r.status}`)).toEqual([
      "D1:required:pass",
      "D2:required:pass",
      "D3:required:pass",
      "D4:advisory:pass",
      "D5:required:pass",
      "D6:required:pass",
      "D7:advisory:pass",
      "D8:required:pass",
      "D9:required:pass",
      "D10:advisory:pass",
      "D11:advisory:pass",
    ]);
    expect(check.publishable).toBe(true);
    expect(check.notes).toBe(0);
  });

  it("gives each result a value, a rule, a one-line reason and a source", () => {
    for (const r of check.results) {
      expect(r.value).not.toBe("");
      expect(r.rule).not.toBe("");
      expect(r.source).not.toBe("");
      expect(r.reason).toMatch(/^[A-Z][^\n]+\.$/);
    }
    expect(criterion(SOUND_SPEC, "D1").value).toBe("3/4 in (1.9 cm)");
  });

  it("describes sources in plain words, naming no people or organizations (they are shown in the UI)", () => {
    for (const r of check.results) {
      expect(r.source).not.toMatch(
        /Tuttle|Kiser|Wisconsin|Shuswap|Kitsap|Downhome|Builder's Handbook/,
      );
    }
    expect(criterion(SOUND_SPEC, "D6").value).toBe(
      "Grooved wood, 3/8 in (1.0 cm) apart, 1/32 in (0.1 cm) deep",
    );
  });
});

describe("D1 chamber gap: 3/4 in ≤ gap ≤ 1 in, both ends included", () => {
  it.each([
    [0.74, "fail"],
    [0.7499, "fail"],
    [0.75, "pass"],
    [1.13 - 0.38, "pass"], // 0.7499999999999999 in floating point: still 3/4 in
    [0.875, "pass"],
    [1.0, "pass"],
    [2.14 - 1.14, "pass"], // 1.0000000000000002: still 1 in
    [1.0001, "fail"],
    [1.01, "fail"],
  ] as const)("%s in → %s", (gap, expected) => {
    expect(statusOf({ chamberGapIn: gap }, "D1")).toBe(expected);
  });

  it("tells too tight apart from too wide", () => {
    expect(criterion(withSpec({ chamberGapIn: 0.5 }), "D1").reason).toMatch(/too tight/);
    expect(criterion(withSpec({ chamberGapIn: 1.25 }), "D1").reason).toMatch(/wasps and birds/);
  });

  it("agrees with metric sizes converted at 25.4 mm per inch (NIST SP 811, 2008)", () => {
    expect(statusOf({ chamberGapIn: 19.05 / 25.4 }, "D1")).toBe("pass"); // exactly 3/4 in
    expect(statusOf({ chamberGapIn: 19 / 25.4 }, "D1")).toBe("fail"); // 0.748 in
    expect(statusOf({ chamberGapIn: 25.4 / 25.4 }, "D1")).toBe("pass");
  });
});

describe("D2 chamber height ≥ 20 in, generous at ≥ 24 in", () => {
  it.each([
    [19.99, "fail", /under 20 in/],
    [20, "pass", /tall enough/],
    [23.99, "pass", /tall enough/],
    [24, "pass", /Generously tall/],
    [30, "pass", /Generously tall/],
  ] as const)("%s in → %s", (height, expected, wording) => {
    const r = criterion(withSpec({ chamberHeightIn: height }), "D2");
    expect(r.status).toBe(expected);
    expect(r.reason).toMatch(wording);
  });
});

describe("D3 chamber width ≥ 14 in", () => {
  it.each([
    [13.99, "fail"],
    [14, "pass"],
    [14.01, "pass"],
  ] as const)("%s in → %s", (width, expected) => {
    expect(statusOf({ chamberWidthIn: width }, "D3")).toBe(expected);
  });
});

describe("D4 chambers (advisory): ≥ 4 pass, 2–3 note, 1 note with a stronger reason", () => {
  it.each([
    [1, "note"],
    [2, "note"],
    [3, "note"],
    [4, "pass"],
    [12, "pass"],
  ] as const)("%s → %s", (count, expected) => {
    expect(statusOf({ chamberCount: count }, "D4")).toBe(expected);
  });

  it("words the single chamber more strongly than two or three", () => {
    const one = criterion(withSpec({ chamberCount: 1 }), "D4");
    const two = criterion(withSpec({ chamberCount: 2 }), "D4");
    expect(one.reason).toMatch(/single chamber gives bats no/);
    expect(two.reason).not.toBe(one.reason);
    expect(one.value).toBe("1 chamber");
    expect(two.value).toBe("2 chambers");
    expect(checkDesign(withSpec({ chamberCount: 1 })).publishable).toBe(true);
  });
});

describe("D5 landing area ≥ 3 in", () => {
  it.each([
    [0, "fail"],
    [2.99, "fail"],
    [3, "pass"],
    [6, "pass"],
    [10, "pass"],
  ] as const)("%s in → %s", (landing, expected) => {
    expect(statusOf({ landingAreaIn: landing }, "D5")).toBe(expected);
  });

  it("says plainly when there is none", () => {
    expect(criterion(withSpec({ landingAreaIn: 0 }), "D5").reason).toMatch(/no landing area/);
  });
});

describe("D6 grip: grooves 1/4–1/2 in apart and 1/32–1/16 in deep, or plastic mesh", () => {
  it.each([
    [0.24, "fail"],
    [0.29 - 0.04, "pass"], // 0.24999999999999997
    [0.25, "pass"],
    [0.5, "pass"],
    [0.51, "fail"],
  ] as const)("grooves %s in apart → %s", (spacing, expected) => {
    expect(statusOf({ grooveSpacingIn: spacing }, "D6")).toBe(expected);
  });

  it.each([
    [1 / 32 - 0.001, "fail"],
    [1 / 32, "pass"],
    [1 / 16, "pass"],
    [1 / 16 + 0.001, "fail"],
  ] as const)("grooves %s in deep → %s", (depth, expected) => {
    expect(statusOf({ grooveDepthIn: depth }, "D6")).toBe(expected);
  });

  it("shows an out-of-range groove result beside the field at fault", () => {
    expect(criterion(withSpec({ grooveSpacingIn: 1 }), "D6").field).toBe("grooveSpacingIn");
    expect(criterion(withSpec({ grooveDepthIn: 0.25 }), "D6").field).toBe("grooveDepthIn");
    expect(criterion(SOUND_SPEC, "D6").field).toBe("interiorSurface");
  });

  it("fails grooves whose size is not given", () => {
    expect(statusOf({ grooveSpacingIn: undefined }, "D6")).toBe("fail");
    expect(statusOf({ grooveDepthIn: undefined }, "D6")).toBe("fail");
  });

  it("passes plastic mesh and fails metal mesh and smooth wood", () => {
    const noGrooves = { grooveSpacingIn: undefined, grooveDepthIn: undefined };
    expect(statusOf({ ...noGrooves, interiorSurface: "plastic-mesh" }, "D6")).toBe("pass");
    expect(statusOf({ ...noGrooves, interiorSurface: "metal-mesh" }, "D6")).toBe("fail");
    expect(statusOf({ interiorSurface: "smooth" }, "D6")).toBe("fail");
  });
});

describe("D7–D11", () => {
  it("D7 notes paint inside and passes bare or stained wood", () => {
    expect(statusOf({ interiorFinish: "painted" }, "D7")).toBe("note");
    expect(statusOf({ interiorFinish: "bare" }, "D7")).toBe("pass");
    expect(statusOf({ interiorFinish: "stained" }, "D7")).toBe("pass");
  });

  it("D8 fails unsealed seams", () => {
    expect(statusOf({ seamsSealed: false }, "D8")).toBe("fail");
  });

  it("D9 passes exterior plywood and cedar only", () => {
    expect(statusOf({ wood: "exterior-plywood" }, "D9")).toBe("pass");
    expect(statusOf({ wood: "cedar" }, "D9")).toBe("pass");
    expect(statusOf({ wood: "pressure-treated" }, "D9")).toBe("fail");
    expect(statusOf({ wood: "other" }, "D9")).toBe("fail");
  });

  it("D10 notes a house under 24 × 14 in, and more mildly one under about 17 in wide", () => {
    const small = criterion(withSpec({ outerHeightIn: 23.99 }), "D10");
    const narrow = criterion(withSpec({ outerWidthIn: 13.99, chamberWidthIn: 13 }), "D10");
    const minimum = criterion(
      withSpec({ outerHeightIn: 24, outerWidthIn: 14, chamberWidthIn: 14 }),
      "D10",
    );
    const almost = criterion(withSpec({ outerWidthIn: 16.99 }), "D10");
    const preferred = criterion(withSpec({ outerHeightIn: 24, outerWidthIn: 17 }), "D10");
    expect([small.status, narrow.status, minimum.status, almost.status, preferred.status]).toEqual([
      "note",
      "note",
      "note",
      "note",
      "pass",
    ]);
    expect([small.field, narrow.field, minimum.field]).toEqual([
      "outerHeightIn",
      "outerWidthIn",
      "outerWidthIn",
    ]);
    expect(minimum.reason).not.toBe(small.reason);
    expect(minimum.reason).toMatch(/17 in/);
    expect(minimum.value).toBe("24 in (61.0 cm) tall × 14 in (35.6 cm) wide");
  });

  it("D11 notes a closed floor", () => {
    expect(statusOf({ openBottom: false }, "D11")).toBe("note");
  });
});

describe("publishable and notes", () => {
  it("counts notes and stays publishable when only advisory criteria are off", () => {
    const check = checkDesign(
      withSpec({
        chamberCount: 2,
        interiorFinish: "painted",
        outerWidthIn: 15,
        chamberWidthIn: 14,
        openBottom: false,
      }),
    );
    expect(check.notes).toBe(4);
    expect(check.publishable).toBe(true);
  });

  it("is not publishable when any single required criterion fails", () => {
    const failures: Partial<HouseSpec>[] = [
      { chamberGapIn: 0.74 },
      { chamberHeightIn: 19.99 },
      { chamberWidthIn: 13.99 },
      { landingAreaIn: 2.99 },
      { interiorSurface: "metal-mesh" },
      { seamsSealed: false },
      { wood: "pressure-treated" },
    ];
    for (const changes of failures) {
      const check = checkDesign(withSpec(changes));
      expect(check.publishable, JSON.stringify(changes)).toBe(false);
      expect(check.results.filter((r) => r.status === "fail")).toHaveLength(1);
    }
  });

  it("never fails an advisory criterion, across a sweep of odd specs", () => {
    for (const chamberCount of [1, 2, 3, 4, 8]) {
      for (const outerHeightIn of [4, 23.99, 24, 40]) {
        for (const outerWidthIn of [4, 13.99, 14, 16.99, 17, 30]) {
          for (const interiorFinish of ["bare", "painted"] as const) {
            const check = checkDesign(
              withSpec({
                chamberCount,
                outerHeightIn,
                outerWidthIn,
                interiorFinish,
                openBottom: false,
              }),
            );
            for (const r of check.results.filter((x) => x.kind === "advisory"))
              expect(r.status).not.toBe("fail");
          }
        }
      }
    }
  });
});
