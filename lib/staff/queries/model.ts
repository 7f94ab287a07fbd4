import "server-only";
import { asc, count, desc, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { getDb } from "@/db/client";
import {
  houseModels,
  inspections,
  modelPhotos,
  stockMovements,
  users,
  type HouseModelRow,
} from "@/db/schema";
import { certificationFor, type Certification } from "@/lib/catalog/queries";
import {
  evaluateInspection,
  inspectionMeasurementsSchema,
  type InspectionResult,
} from "@/lib/catalog/certification";
import { houseSpecSchema, type HouseSpec } from "@/lib/catalog/spec";
import { getLatestInspections, type LatestInspectionRow } from "@/lib/inspections/queries";
import type { ModelInput } from "../model-input";
import { publishRefusals } from "../publishing";

export type StaffModel = {
  row: HouseModelRow;
  spec: HouseSpec;
  input: ModelInput;
  latestInspection: LatestInspectionRow | null;
  certification: Certification;
  publishRefusals: string[];
};

/** One model for the staff pages, drafts and retired included; null when there is none. */
export async function getStaffModelBySlug({
  slug,
  now = new Date(),
}: {
  slug: string;
  now?: Date;
}): Promise<StaffModel | null> {
  const db = await getDb();
  const [row] = await db.select().from(houseModels).where(eq(houseModels.slug, slug)).limit(1);
  if (!row) return null;
  const spec = houseSpecSchema.parse(row.spec);
  const latest = (await getLatestInspections({ db, modelIds: [row.id] })).get(row.id) ?? null;
  return {
    row,
    spec,
    input: {
      name: row.name,
      tagline: row.tagline,
      description: row.description,
      priceCents: row.priceCents,
      builderName: row.builderName,
      mounts: row.mounts.filter((m): m is "pole" | "building" => m === "pole" || m === "building"),
      backToBackKit: row.backToBackKit,
      carton: {
        lengthIn: row.cartonLengthIn,
        widthIn: row.cartonWidthIn,
        heightIn: row.cartonHeightIn,
        weightLb: row.cartonWeightLb,
      },
      lowStockThreshold: row.lowStockThreshold,
      spec,
    },
    latestInspection: latest,
    certification: certificationFor(spec, latest ?? undefined, now),
    publishRefusals: publishRefusals({ spec, latestInspection: latest, now }),
  };
}

export type InspectionEntry = {
  id: string;
  inspectedOn: Date;
  inspector: string;
  passed: boolean;
  notes: string;
  recordedBy: string | null;
  createdAt: Date;
  /** Re-evaluated against today's listing, to show what was measured beside what is listed. */
  result: InspectionResult;
};

export async function listInspections({
  modelId,
  spec,
}: {
  modelId: string;
  spec: HouseSpec;
}): Promise<InspectionEntry[]> {
  const db = await getDb();
  const rows = await db
    .select({ i: inspections, recordedBy: users.name })
    .from(inspections)
    .leftJoin(users, eq(users.id, inspections.recordedById))
    .where(eq(inspections.modelId, modelId))
    .orderBy(desc(inspections.inspectedOn), desc(inspections.createdAt));
  return rows.map(({ i, recordedBy }) => ({
    id: i.id,
    inspectedOn: i.inspectedOn,
    inspector: i.inspector,
    passed: i.passed,
    notes: i.notes,
    recordedBy,
    createdAt: i.createdAt,
    result: evaluateInspection({ spec, measured: inspectionMeasurementsSchema.parse(i.measured) }),
  }));
}

export type LedgerEntry = {
  id: string;
  kind: "received" | "adjusted" | "reserved" | "sold" | "released";
  delta: number;
  stockAfter: number;
  reason: string;
  batch: string | null;
  builderName: string | null;
  orderId: string | null;
  actor: string | null;
  createdAt: string;
};

/** A model's stock ledger, newest first. */
export async function listStockMovements({
  modelId,
  limit = 200,
}: {
  modelId: string;
  limit?: number;
}): Promise<LedgerEntry[]> {
  const db = await getDb();
  const actor = alias(users, "actor");
  const rows = await db
    .select({ m: stockMovements, actor: actor.name })
    .from(stockMovements)
    .leftJoin(actor, eq(actor.id, stockMovements.actorId))
    .where(eq(stockMovements.modelId, modelId))
    .orderBy(desc(stockMovements.createdAt), desc(stockMovements.id))
    .limit(limit);
  return rows.map(({ m, actor: who }) => ({
    id: m.id,
    kind: m.kind,
    delta: m.delta,
    stockAfter: m.stockAfter,
    reason: m.reason,
    batch: m.batch,
    builderName: m.builderName,
    orderId: m.orderId,
    actor: who,
    createdAt: m.createdAt.toISOString(),
  }));
}

export type StaffPhoto = {
  id: string;
  modelId: string;
  altText: string;
  keyBase: string;
  widths: number[];
  width: number;
  height: number;
  position: number;
};

export async function listModelPhotos({ modelId }: { modelId: string }): Promise<StaffPhoto[]> {
  const db = await getDb();
  const rows = await db
    .select()
    .from(modelPhotos)
    .where(eq(modelPhotos.modelId, modelId))
    .orderBy(asc(modelPhotos.position), asc(modelPhotos.createdAt));
  return rows.map((r) => ({
    id: r.id,
    modelId: r.modelId,
    altText: r.altText,
    keyBase: r.keyBase,
    widths: r.widths,
    width: r.width,
    height: r.height,
    position: r.position,
  }));
}

/** The numbers on a model's section tabs. */
export async function getModelTabCounts({
  modelId,
}: {
  modelId: string;
}): Promise<{ photos: number; inspections: number }> {
  const db = await getDb();
  const [[photos], [checks]] = await Promise.all([
    db.select({ n: count() }).from(modelPhotos).where(eq(modelPhotos.modelId, modelId)),
    db.select({ n: count() }).from(inspections).where(eq(inspections.modelId, modelId)),
  ]);
  return { photos: photos?.n ?? 0, inspections: checks?.n ?? 0 };
}
