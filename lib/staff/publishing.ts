import {
  certificationState,
  evaluateInspection,
  type InspectionMeasurements,
} from "@/lib/catalog/certification";
import { checkDesign } from "@/lib/catalog/design-check";
import { DESIGN_CRITERIA } from "@/lib/catalog/design-criteria";
import type { HouseSpec } from "@/lib/catalog/spec";

// When a model may go on sale (product brief §1): every required design criterion passes on its
// listed spec, and its latest inspection passed within the last 12 months. Beyond the brief, the
// latest inspection must also still match the listing (a spec edited after the inspection is not
// what was measured). Pure: the server refuses with these reasons and the page shows them.

export type LatestInspection = {
  inspectedOn: Date;
  passed: boolean;
  measured: InspectionMeasurements;
};

const day = (d: Date) => d.toISOString().slice(0, 10);

/** Why this model cannot be published, in words staff can act on; empty when it can. */
export function publishRefusals({
  spec,
  latestInspection,
  now,
}: {
  spec: HouseSpec;
  latestInspection: LatestInspection | null;
  now: Date;
}): string[] {
  const failing = checkDesign(spec).results.filter(
    (r) => r.kind === "required" && r.status === "fail",
  );
  if (failing.length > 0) {
    return failing.map((r) => `${DESIGN_CRITERIA[r.id].title} (${r.id}): ${r.reason}`);
  }
  const state = certificationState({
    spec,
    latestInspection: latestInspection
      ? { inspectedAt: latestInspection.inspectedOn, passed: latestInspection.passed }
      : null,
    now,
  });
  switch (state.state) {
    case "not-inspected":
      return [
        "No built unit has been inspected yet. Record an inspection that passes, then publish.",
      ];
    case "failed":
      return [
        `Its latest inspection (${day(latestInspection!.inspectedOn)}) did not pass. Record a passing inspection first.`,
      ];
    case "expired":
      return [
        `Its latest passing inspection (${day(latestInspection!.inspectedOn)}) is more than 12 months old. Inspect a built unit again.`,
      ];
    case "design-fails":
      // Unreachable after the check above; kept so a new state cannot slip through silently.
      return ["The design does not meet a required criterion."];
    case "certified":
      break;
  }
  const recheck = evaluateInspection({ spec, measured: latestInspection!.measured });
  const drifted = recheck.measurements.filter((m) => !m.matches);
  if (drifted.length > 0) {
    return [
      `The listing changed after the latest inspection (${day(latestInspection!.inspectedOn)}): ${drifted
        .map((m) => `${m.label.toLowerCase()} listed ${m.listed}, measured ${m.measured}`)
        .join("; ")}. Inspect a unit built to this listing.`,
    ];
  }
  return [];
}
