import "server-only";
import { desc, inArray } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { inspections } from "@/db/schema";
import { inspectionMeasurementsSchema } from "@/lib/catalog/certification";
import type { LatestInspection } from "./publishing";

export type LatestInspectionRow = LatestInspection & {
  id: string;
  modelId: string;
  inspector: string;
};

/** The latest inspection of each model (by inspection day, then by when it was recorded). */
export async function getLatestInspections({
  db,
  modelIds,
}: {
  db: DbOrTx;
  modelIds: string[];
}): Promise<Map<string, LatestInspectionRow>> {
  if (modelIds.length === 0) return new Map();
  const rows = await db
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
