import { describe, expect, it } from "vitest";
import {
  addMonthsUtc,
  CERTIFICATION_NAME,
  certificationState,
  evaluateInspection,
  inspectionMeasurementsSchema,
  type InspectionMeasurements,
} from "@/lib/catalog/certification";
import { SOUND_SPEC, withSpec } from "./sample-spec";

// Product brief §1: measured values may differ from the listing by at most 1/16 in, inclusive;
// certification lasts 12 months from a passing inspection. The 30-day warning is common
// practice, no source.

const asListed: InspectionMeasurements = {
  chamberGapIn: SOUND_SPEC.chamberGapIn,
  chamberHeightIn: SOUND_SPEC.chamberHeightIn,
  chamberWidthIn: SOUND_SPEC.chamberWidthIn,
  landingAreaIn: SOUND_SPEC.landingAreaIn,
  roughening: "grooved",
  seamsSealed: true,
};
const inspect = (changes: Partial<InspectionMeasurements>, spec = SOUND_SPEC) =>
  evaluateInspection({ spec, measured: { ...asListed, ...changes } });

describe("evaluateInspection", () => {
  it("passes a unit built exactly as listed", () => {
    const result = inspect({});
    expect(result.passed).toBe(true);
    expect(result.measurements.map((m) => m.field)).toEqual([
      "chamberGapIn",
      "chamberHeightIn",
      "chamberWidthIn",
      "landingAreaIn",
      "interiorSurface",
      "seamsSealed",
    ]);
    expect(result.criteria.map((c) => c.id)).toEqual(["D1", "D2", "D3", "D5", "D6", "D8"]);
  });

  it.each([
    ["chamberHeightIn", 24 + 1 / 16, true],
    ["chamberHeightIn", 24 - 1 / 16, true],
    ["chamberHeightIn", 24 + 1 / 16 + 0.001, false],
    ["chamberHeightIn", 24 - 1 / 16 - 0.001, false],
    ["chamberWidthIn", 20.0625, true],
    ["landingAreaIn", 5.0635, false],
    ["chamberGapIn", 0.8125, true],
    ["chamberGapIn", 0.8135, false],
  ] as const)("%s measured %s in → passes: %s", (field, value, expected) => {
    const result = inspect({ [field]: value });
    expect(result.passed).toBe(expected);
    expect(result.measurements.find((m) => m.field === field)?.matches).toBe(expected);
  });

  it("treats exactly 1/16 in as within tolerance despite decimal noise", () => {
    // 0.8 and 0.8625 are not exact in binary; their difference is 0.06250000000000011.
    expect(inspect({ chamberGapIn: 0.8625 }, withSpec({ chamberGapIn: 0.8 })).passed).toBe(true);
  });

  it("agrees with 1/16 in = 1.5875 mm exactly (NIST SP 811, 2008: 1 in = 25.4 mm)", () => {
    const listedMm = 24 * 25.4;
    expect(inspect({ chamberHeightIn: (listedMm + 1.5875) / 25.4 }).passed).toBe(true);
    expect(inspect({ chamberHeightIn: (listedMm + 1.6) / 25.4 }).passed).toBe(false);
  });

  it("applies the required criteria to the measured values", () => {
    // Within tolerance of a 0.78 in listing, but the built gap is under 3/4 in.
    const result = inspect({ chamberGapIn: 0.74 }, withSpec({ chamberGapIn: 0.78 }));
    expect(result.measurements.every((m) => m.matches)).toBe(true);
    expect(result.criteria.find((c) => c.id === "D1")?.status).toBe("fail");
    expect(result.passed).toBe(false);
  });

  it("fails a unit whose roughening or seals differ from the listing", () => {
    const mesh = inspect({ roughening: "plastic-mesh" });
    expect(mesh.measurements.find((m) => m.field === "interiorSurface")).toMatchObject({
      listed: "Grooved wood",
      measured: "Plastic mesh",
      matches: false,
    });
    expect(mesh.passed).toBe(false);
    const unsealed = inspect({ seamsSealed: false });
    expect(unsealed.criteria.find((c) => c.id === "D8")?.status).toBe("fail");
    expect(unsealed.passed).toBe(false);
  });

  it("validates the staff form input with plain messages", () => {
    const parsed = inspectionMeasurementsSchema.safeParse({ ...asListed, chamberHeightIn: 288 });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0]?.message).toMatch(/feet or centimetres/);
  });
});

describe("certificationState", () => {
  const inspectedAt = new Date("2024-03-15T10:00:00Z");
  const passedCheck = { inspectedAt, passed: true };
  const state = (
    now: string,
    latestInspection: { inspectedAt: Date; passed: boolean } | null = passedCheck,
    spec = SOUND_SPEC,
  ) => certificationState({ spec, latestInspection, now: new Date(now) });

  it("has our own name", () => {
    expect(CERTIFICATION_NAME).toMatch(/^Roostwright /);
  });

  it("is certified for 12 months after a passing inspection, then expired", () => {
    expect(state("2024-03-15T10:00:00Z")).toMatchObject({ state: "certified", certified: true });
    const lastMoment = state("2025-03-15T09:59:59.999Z");
    expect(lastMoment).toMatchObject({
      state: "certified",
      certified: true,
      expiresWithin30Days: true,
    });
    expect(lastMoment.expiresAt?.toISOString()).toBe("2025-03-15T10:00:00.000Z");
    expect(state("2025-03-15T10:00:00Z")).toMatchObject({
      state: "expired",
      certified: false,
      expiresWithin30Days: false,
    });
  });

  it("warns from 30 days before expiry", () => {
    const expiry = Date.parse("2025-03-15T10:00:00Z");
    const day = 24 * 60 * 60 * 1000;
    expect(state(new Date(expiry - 30 * day).toISOString()).expiresWithin30Days).toBe(true);
    expect(state(new Date(expiry - 30 * day - 1).toISOString()).expiresWithin30Days).toBe(false);
    expect(state("2024-09-01T00:00:00Z").expiresWithin30Days).toBe(false);
  });

  it("reports a failed latest inspection, no inspection, and a failing design first", () => {
    expect(state("2024-04-01T00:00:00Z", { inspectedAt, passed: false })).toMatchObject({
      state: "failed",
      certified: false,
    });
    expect(state("2024-04-01T00:00:00Z", null)).toMatchObject({
      state: "not-inspected",
      certified: false,
    });
    expect(
      state("2024-04-01T00:00:00Z", passedCheck, withSpec({ wood: "pressure-treated" })),
    ).toMatchObject({
      state: "design-fails",
      certified: false,
    });
  });

  it("is not blocked by advisory notes", () => {
    expect(
      state("2024-04-01T00:00:00Z", passedCheck, withSpec({ chamberCount: 1, openBottom: false }))
        .certified,
    ).toBe(true);
  });
});

describe("addMonthsUtc", () => {
  it("clamps to the end of a shorter month, as the calendar has it", () => {
    // Date.UTC(2025, 2, 0) is the last day of February 2025 in the engine's own calendar.
    const lastOfFeb2025 = new Date(Date.UTC(2025, 2, 0)).getUTCDate();
    expect(lastOfFeb2025).toBe(28);
    expect(addMonthsUtc(new Date("2024-02-29T12:00:00Z"), 12).toISOString()).toBe(
      "2025-02-28T12:00:00.000Z",
    );
    expect(addMonthsUtc(new Date("2024-01-31T00:00:00Z"), 1).toISOString()).toBe(
      "2024-02-29T00:00:00.000Z",
    );
    expect(addMonthsUtc(new Date("2023-12-31T23:30:00Z"), 12).toISOString()).toBe(
      "2024-12-31T23:30:00.000Z",
    );
  });
});
