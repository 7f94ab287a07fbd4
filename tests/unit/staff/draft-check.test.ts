import { describe, expect, it } from "vitest";
import { checkDesign } from "@/lib/catalog/design-check";
import { checkDraftDesign } from "@/lib/staff/draft-check";
import { SOUND_SPEC, withSpec } from "../catalog/sample-spec";

// The live check must be the server's check: with every field valid its results are exactly
// checkDesign()'s (product brief §1 rules live there, with their sources).

describe("checkDraftDesign", () => {
  it("equals checkDesign for a complete spec, passing or failing", () => {
    for (const spec of [
      SOUND_SPEC,
      withSpec({ chamberGapIn: 1.5 }),
      withSpec({ interiorSurface: "smooth", chamberCount: 1 }),
    ]) {
      const draft = checkDraftDesign(spec);
      const server = checkDesign(spec);
      expect(draft.results).toEqual(server.results);
      expect(draft.publishable).toBe(server.publishable);
      expect(draft.notes).toBe(server.notes);
    }
  });

  it("changes with the gap as it is typed, at the 3/4 and 1 in edges (D1, both ends included)", () => {
    const d1 = (gap: unknown) =>
      checkDraftDesign({ ...SOUND_SPEC, chamberGapIn: gap }).results.find((r) => r.id === "D1")!;
    expect(d1(undefined).status).toBe("waiting");
    expect(d1(Number.NaN).status).toBe("waiting");
    expect(d1(0.74).status).toBe("fail");
    expect(d1(0.75).status).toBe("pass");
    expect(d1(1).status).toBe("pass");
    expect(d1(1.01).status).toBe("fail");
  });

  it("waits on criteria whose inputs are missing and checks the rest", () => {
    const { results, publishable } = checkDraftDesign({
      chamberGapIn: 1.5,
      wood: "pressure-treated",
    });
    const byId = Object.fromEntries(results.map((r) => [r.id, r.status]));
    expect(byId).toMatchObject({
      D1: "fail",
      D9: "fail",
      D2: "waiting",
      D3: "waiting",
      D6: "waiting",
      D10: "waiting",
    });
    // A required criterion is still waiting, so whether it could be published is not known yet.
    expect(publishable).toBeNull();
    expect(results.find((r) => r.id === "D2")!.reason).toBe("Waiting for the chamber height.");
  });

  it("fails a grooved surface with no groove sizes, as the server does, but waits on a mistyped one", () => {
    const empty = checkDraftDesign({ ...SOUND_SPEC, grooveSpacingIn: undefined });
    expect(empty.results.find((r) => r.id === "D6")!.status).toBe("fail");
    const typo = checkDraftDesign({ ...SOUND_SPEC, grooveSpacingIn: Number.NaN });
    expect(typo.results.find((r) => r.id === "D6")!.status).toBe("waiting");
  });
});
