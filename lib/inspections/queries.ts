import "server-only";
import { desc, inArray } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db/client";
import { inspections } from "@/db/schema";
import { inspectionMeasurementsSchema, type InspectionMeasurements } from "@/lib/catalog/certification";

// The one query for "the latest inspection of each model": the catalog's certification, the
// staff pages and the publish checks all read it here, so they can never disagree on which
// inspection counts.

export type LatestInspectionRow = {
  id: string;
  modelId: string;
  inspector: string;
  inspectedOn: Date;
  passed: boolean;
  measured: InspectionMeasurements;
};

/** The latest inspection of each model (by inspection day, then by when it was recorded). */
export async function getLatestInspections({
  db,
  modelIds,
}: {
  /** The caller's transaction when the answer must agree with its other reads; else the app's database. */
  db?: DbOrTx;
  modelIds: string[];
}): Promise<Map<string, LatestInspectionRow>> {
  if (modelIds.length === 0) return new Map();
  const reader = db ?? (await getDb());
  const rows = await reader
    .selectDistinctOn([inspections.modelId])
    .from(inspections)
    .where(inArray(inspections.modelId, modelIds))
    .orderBy(inspections.modelId, desc(inspections.inspectedOn), desc(inspections.createdAt));
  return new Map(
    rows.map((r) => [
      r.modelId,
      {
        id: r.id,
        modelId: r.modelId,
        inspector: r.inspector,
        inspectedOn: r.inspectedOn,
        passed: r.passed,
        measured: inspectionMeasurementsSchema.parse(r.measured),
      },
    ]),
  );
}
