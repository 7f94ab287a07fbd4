import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { houseModels, inspections } from "@/db/schema";
import { evaluateInspection, type InspectionResult } from "@/lib/catalog/certification";
import { houseSpecSchema } from "@/lib/catalog/spec";
import { AppError } from "@/lib/http/errors";
import { inspectionMoment, type InspectionInput } from "../inspection-input";

/**
 * Records the measured values of a built unit. The result is computed here from the listed spec
 * (1/16 in tolerance) and the criteria, never taken from the form.
 */
export async function recordInspection({
  input,
  recordedById,
}: {
  input: InspectionInput;
  recordedById: string;
}): Promise<{ id: string; passed: boolean; result: InspectionResult }> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [model] = await tx
      .select({ spec: houseModels.spec })
      .from(houseModels)
      .where(eq(houseModels.id, input.modelId));
    if (!model) throw new AppError("not_found", "There is no house model with that id.");
    const result = evaluateInspection({
      spec: houseSpecSchema.parse(model.spec),
      measured: input.measured,
    });
    const [row] = await tx
      .insert(inspections)
      .values({
        modelId: input.modelId,
        inspectedOn: inspectionMoment(input.inspectedOn),
        inspector: input.inspector,
        measured: input.measured,
        passed: result.passed,
        notes: input.notes,
        recordedById,
      })
      .returning({ id: inspections.id });
    return { id: row!.id, passed: result.passed, result };
  });
}
