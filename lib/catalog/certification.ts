import { z } from "zod";
import { checkDesign, type CriterionId, type CriterionResult } from "./design-check";
import { formatInches } from "./format-inches";
import { INTERIOR_SURFACES, INTERIOR_SURFACE_LABELS, type HouseSpec } from "./spec";

// The store's own certification (product brief §1): every required design criterion passes on
// the listed spec, and a built unit measured by staff passed within the last 12 months.

export const CERTIFICATION_NAME = "Roostwright Sound Build";
export const CERTIFICATION_SUMMARY =
  "Built to our roost-design criteria and measured by our staff on a finished house within the last 12 months.";

// Listed and measured sizes may differ by 1/16 in, inclusive (product brief §1; a sixteenth is
// the finest mark on a shop tape, common practice). The extra billionth absorbs decimal noise.
export const TOLERANCE_IN = 1 / 16;
const EPSILON_IN = 1e-9;
export const VALID_MONTHS = 12;
export const WARNING_DAYS = 30;
const DAY_MS = 24 * 60 * 60 * 1000;

const measuredLength = (label: string) =>
  z
    .number({ error: `Enter the measured ${label} in inches.` })
    .min(0, `The measured ${label} cannot be negative.`)
    .max(72, `The measured ${label} must be at most 72 in. Was it typed in feet or centimetres?`);

export const inspectionMeasurementsSchema = z.object({
  chamberGapIn: measuredLength("chamber gap"),
  chamberHeightIn: measuredLength("chamber height"),
  chamberWidthIn: measuredLength("chamber width"),
  landingAreaIn: measuredLength("landing area"),
  roughening: z.enum(INTERIOR_SURFACES, { error: "Choose what the inside surface is." }),
  seamsSealed: z.boolean({ error: "Answer yes or no: are the seams sealed?" }),
});
export type InspectionMeasurements = z.infer<typeof inspectionMeasurementsSchema>;

type LengthKey = "chamberGapIn" | "chamberHeightIn" | "chamberWidthIn" | "landingAreaIn";
const LENGTH_LABELS: Record<LengthKey, string> = {
  chamberGapIn: "Chamber gap",
  chamberHeightIn: "Chamber height",
  chamberWidthIn: "Chamber width",
  landingAreaIn: "Landing area",
};

export type MeasurementCheck = {
  field: LengthKey | "interiorSurface" | "seamsSealed";
  label: string;
  listed: string;
  measured: string;
  /** Measured minus listed, inches; lengths only. */
  differenceIn?: number;
  matches: boolean;
};

export type InspectionResult = {
  measurements: MeasurementCheck[];
  /** The required criteria that a measurement can test, run on the measured values. */
  criteria: CriterionResult[];
  passed: boolean;
};

// Criteria whose inputs the inspector measures; wood (D9) is taken from the listing.
const MEASURED_CRITERIA: readonly CriterionId[] = ["D1", "D2", "D3", "D5", "D6", "D8"];

export function evaluateInspection({
  spec,
  measured,
}: {
  spec: HouseSpec;
  measured: InspectionMeasurements;
}): InspectionResult {
  const lengths = (Object.keys(LENGTH_LABELS) as LengthKey[]).map((field): MeasurementCheck => {
    const differenceIn = measured[field] - spec[field];
    return {
      field,
      label: LENGTH_LABELS[field],
      listed: formatInches(spec[field]),
      measured: formatInches(measured[field]),
      differenceIn,
      matches: Math.abs(differenceIn) <= TOLERANCE_IN + EPSILON_IN,
    };
  });
  const surface: MeasurementCheck = {
    field: "interiorSurface",
    label: "Inside surface",
    listed: INTERIOR_SURFACE_LABELS[spec.interiorSurface],
    measured: INTERIOR_SURFACE_LABELS[measured.roughening],
    matches: spec.interiorSurface === measured.roughening,
  };
  const seams: MeasurementCheck = {
    field: "seamsSealed",
    label: "Seams sealed",
    listed: spec.seamsSealed ? "Yes" : "No",
    measured: measured.seamsSealed ? "Yes" : "No",
    matches: spec.seamsSealed === measured.seamsSealed,
  };
  const asBuilt: HouseSpec = {
    ...spec,
    chamberGapIn: measured.chamberGapIn,
    chamberHeightIn: measured.chamberHeightIn,
    chamberWidthIn: measured.chamberWidthIn,
    landingAreaIn: measured.landingAreaIn,
    interiorSurface: measured.roughening,
    seamsSealed: measured.seamsSealed,
  };
  const criteria = checkDesign(asBuilt).results.filter((r) => MEASURED_CRITERIA.includes(r.id));
  const measurements = [...lengths, surface, seams];
  return {
    measurements,
    criteria,
    passed: measurements.every((m) => m.matches) && criteria.every((c) => c.status === "pass"),
  };
}

export type CertificationStateId =
  "certified" | "expired" | "failed" | "not-inspected" | "design-fails";

export type CertificationState = {
  state: CertificationStateId;
  certified: boolean;
  expiresAt?: Date;
  expiresWithin30Days: boolean;
};

/** Our own words for each state, for badges and the staff list. */
export const CERTIFICATION_STATE_WORDS: Record<CertificationStateId, string> = {
  certified: CERTIFICATION_NAME,
  expired: "Due for a fresh check",
  failed: "Did not pass its last check",
  "not-inspected": "Waiting for its first check",
  "design-fails": "Design does not meet our criteria",
};

/**
 * Calendar months in UTC, clamped to the month's last day: a check on 29 Feb 2024 lapses on
 * 28 Feb 2025, not 1 Mar (the same rule as date-fns addMonths; common practice).
 */
export function addMonthsUtc(date: Date, months: number): Date {
  const target = new Date(date.getTime());
  const day = target.getUTCDate();
  target.setUTCDate(1);
  target.setUTCMonth(target.getUTCMonth() + months);
  const lastDay = new Date(
    Date.UTC(target.getUTCFullYear(), target.getUTCMonth() + 1, 0),
  ).getUTCDate();
  target.setUTCDate(Math.min(day, lastDay));
  return target;
}

export function certificationState({
  spec,
  latestInspection,
  now,
}: {
  spec: HouseSpec;
  latestInspection: { inspectedAt: Date; passed: boolean } | null;
  now: Date;
}): CertificationState {
  if (!checkDesign(spec).publishable) {
    return { state: "design-fails", certified: false, expiresWithin30Days: false };
  }
  if (!latestInspection) {
    return { state: "not-inspected", certified: false, expiresWithin30Days: false };
  }
  if (!latestInspection.passed) {
    return { state: "failed", certified: false, expiresWithin30Days: false };
  }
  // Valid until the same moment 12 calendar months later, exclusive.
  const expiresAt = addMonthsUtc(latestInspection.inspectedAt, VALID_MONTHS);
  const msLeft = expiresAt.getTime() - now.getTime();
  if (msLeft <= 0) {
    return { state: "expired", certified: false, expiresAt, expiresWithin30Days: false };
  }
  return {
    state: "certified",
    certified: true,
    expiresAt,
    expiresWithin30Days: msLeft <= WARNING_DAYS * DAY_MS,
  };
}
