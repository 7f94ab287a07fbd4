import { describe, expect, it } from "vitest";
import { addMonthsUtc } from "@/lib/catalog/certification";
import { publishRefusals, type LatestInspection } from "@/lib/staff/publishing";
import { SOUND_SPEC, withSpec } from "../catalog/sample-spec";

// Product brief §1: a model is certified (and may go on sale) when every required criterion
// passes on its listed spec and its latest inspection passed within the last 12 months.

const NOW = new Date("2026-06-15T12:00:00Z");
const measuredAsListed = {
  chamberGapIn: SOUND_SPEC.chamberGapIn,
  chamberHeightIn: SOUND_SPEC.chamberHeightIn,
  chamberWidthIn: SOUND_SPEC.chamberWidthIn,
  landingAreaIn: SOUND_SPEC.landingAreaIn,
  roughening: SOUND_SPEC.interiorSurface,
  seamsSealed: SOUND_SPEC.seamsSealed,
};
const inspection = (changes: Partial<LatestInspection> = {}): LatestInspection => ({
  inspectedOn: new Date("2026-03-01T12:00:00Z"),
  passed: true,
  measured: measuredAsListed,
  ...changes,
});

describe("publishRefusals", () => {
  it("lets a sound, freshly inspected model go on sale", () => {
    expect(publishRefusals({ spec: SOUND_SPEC, latestInspection: inspection(), now: NOW })).toEqual(
      [],
    );
  });

  it("names every failing required criterion", () => {
    const refusals = publishRefusals({
      spec: withSpec({ chamberGapIn: 1.5, wood: "pressure-treated" }),
      latestInspection: inspection(),
      now: NOW,
    });
    expect(refusals).toHaveLength(2);
    expect(refusals[0]).toMatch(/^Chamber gap \(D1\): Crevices over 1 in/);
    expect(refusals[1]).toMatch(/^Wood \(D9\): Pressure-treated/);
  });

  it("does not count advisory notes against publishing (D4: one chamber is a note)", () => {
    expect(
      publishRefusals({
        spec: withSpec({ chamberCount: 1 }),
        latestInspection: inspection(),
        now: NOW,
      }),
    ).toEqual([]);
  });

  it("refuses a model with no inspection, or whose latest did not pass", () => {
    expect(publishRefusals({ spec: SOUND_SPEC, latestInspection: null, now: NOW })[0]).toMatch(
      /No built unit has been inspected/,
    );
    expect(
      publishRefusals({
        spec: SOUND_SPEC,
        latestInspection: inspection({ passed: false }),
        now: NOW,
      })[0],
    ).toMatch(/latest inspection \(2026-03-01\) did not pass/);
  });

  it("holds at 12 months less a minute and refuses at 12 months exactly", () => {
    const inspectedOn = new Date("2025-06-15T12:00:00Z");
    const lapse = addMonthsUtc(inspectedOn, 12);
    expect(lapse.toISOString()).toBe("2026-06-15T12:00:00.000Z");
    const at = (now: Date) =>
      publishRefusals({ spec: SOUND_SPEC, latestInspection: inspection({ inspectedOn }), now });
    expect(at(new Date(lapse.getTime() - 60_000))).toEqual([]);
    expect(at(lapse)[0]).toMatch(/more than 12 months old/);
  });

  it("refuses when the listing was edited beyond 1/16 in of what was measured", () => {
    const within = withSpec({ chamberGapIn: 0.75 + 1 / 16 });
    expect(publishRefusals({ spec: within, latestInspection: inspection(), now: NOW })).toEqual([]);
    const beyond = withSpec({ chamberGapIn: 0.875 });
    const [reason] = publishRefusals({ spec: beyond, latestInspection: inspection(), now: NOW });
    expect(reason).toMatch(/listing changed after the latest inspection/);
    expect(reason).toContain("chamber gap listed 7/8 in (2.2 cm), measured 3/4 in (1.9 cm)");
  });
});
