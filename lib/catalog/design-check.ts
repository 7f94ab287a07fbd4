import { DESIGN_CRITERIA, type CriterionId, type CriterionKind } from "./design-criteria";
import {
  checkChamberCount,
  checkChamberHeight,
  checkChamberWidth,
  checkFinish,
  checkGap,
  checkGrip,
  checkHouseSize,
  checkLanding,
  checkOpenBottom,
  checkSeams,
  checkWood,
  type CriterionStatus,
  type Outcome,
} from "./design-rules";
import type { HouseSpec } from "./spec";

export type { CriterionId, CriterionKind } from "./design-criteria";
export type { CriterionStatus } from "./design-rules";

export type CriterionResult = {
  id: CriterionId;
  kind: CriterionKind;
  /** The spec field the staff form shows this result beside. */
  field: keyof HouseSpec;
  status: CriterionStatus;
  value: string;
  rule: string;
  /** One line a buyer can read. */
  reason: string;
  source: string;
};

export type DesignCheck = { results: CriterionResult[]; publishable: boolean; notes: number };

function result(id: CriterionId, field: keyof HouseSpec, outcome: Outcome): CriterionResult {
  const { kind, rule, source } = DESIGN_CRITERIA[id];
  return { id, kind, rule, source, field, ...outcome };
}

/** Runs D1–D11 against a listed spec. Advisory criteria give notes, never failures. */
export function checkDesign(spec: HouseSpec): DesignCheck {
  const results: CriterionResult[] = [
    result("D1", "chamberGapIn", checkGap(spec.chamberGapIn)),
    result("D2", "chamberHeightIn", checkChamberHeight(spec.chamberHeightIn)),
    result("D3", "chamberWidthIn", checkChamberWidth(spec.chamberWidthIn)),
    result("D4", "chamberCount", checkChamberCount(spec.chamberCount)),
    result("D5", "landingAreaIn", checkLanding(spec.landingAreaIn)),
    result("D6", "interiorSurface", checkGrip(spec)),
    result("D7", "interiorFinish", checkFinish(spec.interiorFinish)),
    result("D8", "seamsSealed", checkSeams(spec.seamsSealed)),
    result("D9", "wood", checkWood(spec.wood)),
    result("D10", "outerHeightIn", checkHouseSize(spec.outerHeightIn, spec.outerWidthIn)),
    result("D11", "openBottom", checkOpenBottom(spec.openBottom)),
  ];
  return {
    results,
    publishable: results.every((r) => r.kind !== "required" || r.status !== "fail"),
    notes: results.filter((r) => r.status === "note").length,
  };
}
