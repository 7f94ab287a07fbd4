import { checkDesign, type CriterionId, type CriterionResult } from "@/lib/catalog/design-check";
import { DESIGN_CRITERIA } from "@/lib/catalog/design-criteria";
import { houseSpecSchema, SPEC_FIELD_LABELS, type HouseSpec } from "@/lib/catalog/spec";

// The design check while staff are still typing: the same checkDesign() the server runs, applied
// to every criterion whose inputs are already valid. A criterion with a missing or unreadable
// input says it is waiting instead of guessing. With every field valid, the results are exactly
// checkDesign()'s.

type SpecField = keyof HouseSpec;

/** The spec fields each criterion reads (see lib/catalog/design-check.ts). */
export const CRITERION_INPUTS: Record<CriterionId, readonly SpecField[]> = {
  D1: ["chamberGapIn"],
  D2: ["chamberHeightIn"],
  D3: ["chamberWidthIn"],
  D4: ["chamberCount"],
  D5: ["landingAreaIn"],
  D6: ["interiorSurface", "grooveSpacingIn", "grooveDepthIn"],
  D7: ["interiorFinish"],
  D8: ["seamsSealed"],
  D9: ["wood"],
  D10: ["outerHeightIn", "outerWidthIn"],
  D11: ["openBottom"],
};

export type WaitingResult = Omit<CriterionResult, "status" | "value"> & {
  status: "waiting";
  value: string;
};
export type DraftResult = CriterionResult | WaitingResult;

export type DraftCheck = {
  results: DraftResult[];
  /** null while a required criterion is still waiting for its input. */
  publishable: boolean | null;
  notes: number;
};

// Stand-ins for inputs not yet valid; the criteria reading them are reported as waiting, so these
// values never reach the screen.
const FILLER: HouseSpec = {
  chamberCount: 4,
  chamberGapIn: 0.75,
  chamberHeightIn: 24,
  chamberWidthIn: 16,
  landingAreaIn: 4,
  interiorSurface: "plastic-mesh",
  interiorFinish: "bare",
  seamsSealed: true,
  wood: "cedar",
  outerHeightIn: 30,
  outerWidthIn: 20,
  openBottom: true,
  exteriorShade: "dark",
  vented: true,
};

const SHAPE = houseSpecSchema.shape;

function validFields(draft: Partial<Record<SpecField, unknown>>): Partial<HouseSpec> {
  const valid: Partial<Record<SpecField, unknown>> = {};
  for (const field of Object.keys(SHAPE) as SpecField[]) {
    const parsed = SHAPE[field].safeParse(draft[field]);
    if (parsed.success && parsed.data !== undefined) valid[field] = parsed.data;
  }
  return valid as Partial<HouseSpec>;
}

function waitingFor(id: CriterionId, missing: SpecField[]): WaitingResult {
  const { kind, rule, source } = DESIGN_CRITERIA[id];
  const names = missing.map((f) => SPEC_FIELD_LABELS[f].toLowerCase());
  return {
    id,
    kind,
    rule,
    source,
    field: missing[0]!,
    status: "waiting",
    value: "—",
    reason: `Waiting for the ${names.join(" and ")}.`,
  };
}

export function checkDraftDesign(draft: Partial<Record<SpecField, unknown>>): DraftCheck {
  const valid = validFields(draft);
  const spec: HouseSpec = { ...FILLER, ...valid };
  // Groove sizes are optional in the schema: left empty on a grooved surface they are a real
  // failure (checkDesign says so), but typed wrong they are only waiting.
  const invalidGroove = (f: "grooveSpacingIn" | "grooveDepthIn") =>
    draft[f] !== undefined && valid[f] === undefined;
  const results = checkDesign(spec).results.map((result): DraftResult => {
    const missing = CRITERION_INPUTS[result.id].filter((field) => {
      if (field === "grooveSpacingIn" || field === "grooveDepthIn") {
        return valid.interiorSurface === "grooved" && invalidGroove(field);
      }
      return valid[field] === undefined;
    });
    return missing.length > 0 ? waitingFor(result.id, missing) : result;
  });
  const requiredWaiting = results.some((r) => r.kind === "required" && r.status === "waiting");
  return {
    results,
    publishable: requiredWaiting
      ? null
      : results.every((r) => r.kind !== "required" || r.status !== "fail"),
    notes: results.filter((r) => r.status === "note").length,
  };
}
