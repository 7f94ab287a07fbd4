import "server-only";
import { and, asc, count, eq, inArray, lte } from "drizzle-orm";
import { getDb } from "@/db/client";
import { houseModels, modelPhotos } from "@/db/schema";
import { certificationFor } from "@/lib/catalog/queries";
import { checkDesign } from "@/lib/catalog/design-check";
import { houseSpecSchema } from "@/lib/catalog/spec";
import { getLatestInspections } from "@/lib/inspections/queries";
import type { StaffModelRow } from "../models-table-query";

export async function countModelsByStatus(): Promise<
  Record<"draft" | "published" | "retired", number>
> {
  const db = await getDb();
  const rows = await db
    .select({ status: houseModels.status, n: count() })
    .from(houseModels)
    .groupBy(houseModels.status);
  const counts = { draft: 0, published: 0, retired: 0 };
  for (const r of rows) counts[r.status] = r.n;
  return counts;
}

/**
 * Models on sale at or under their low-stock mark: the mark is the count at which the workshop
 * asks its builders for more (a reorder point; common practice, no source). Drafts and retired
 * models are not sold, so they never run low.
 */
export async function listLowStockModels() {
  const db = await getDb();
  return db
    .select({
      id: houseModels.id,
      slug: houseModels.slug,
      name: houseModels.name,
      stock: houseModels.stock,
      lowStockThreshold: houseModels.lowStockThreshold,
      builderName: houseModels.builderName,
    })
    .from(houseModels)
    .where(
      and(
        eq(houseModels.status, "published"),
        lte(houseModels.stock, houseModels.lowStockThreshold),
      ),
    )
    .orderBy(asc(houseModels.stock), asc(houseModels.name));
}

/** Every model with its certification worked out, for the staff table and the staff home. */
export async function listStaffModelRows({ now = new Date() }: { now?: Date } = {}): Promise<
  StaffModelRow[]
> {
  const db = await getDb();
  const rows = await db.select().from(houseModels).orderBy(asc(houseModels.name));
  const ids = rows.map((r) => r.id);
  const [latest, photoCounts] = await Promise.all([
    getLatestInspections({ db, modelIds: ids }),
    ids.length === 0
      ? Promise.resolve([])
      : db
          .select({ modelId: modelPhotos.modelId, n: count() })
          .from(modelPhotos)
          .where(inArray(modelPhotos.modelId, ids))
          .groupBy(modelPhotos.modelId),
  ]);
  const photos = new Map(photoCounts.map((p) => [p.modelId, p.n]));
  return rows.map((row) => {
    const spec = houseSpecSchema.parse(row.spec);
    const check = checkDesign(spec);
    const l = latest.get(row.id);
    const cert = certificationFor(
      spec,
      l ? { modelId: row.id, inspectedOn: l.inspectedOn, passed: l.passed } : undefined,
      now,
    );
    return {
      id: row.id,
      slug: row.slug,
      name: row.name,
      builderName: row.builderName,
      status: row.status,
      priceCents: row.priceCents,
      stock: row.stock,
      lowStockThreshold: row.lowStockThreshold,
      certState: cert.state,
      certWords: cert.words,
      certified: cert.certified,
      inspectedOn: cert.inspectedOn,
      expiresAt: cert.expiresAt,
      expiresWithin30Days: cert.expiresWithin30Days,
      failing: check.results.filter((r) => r.kind === "required" && r.status === "fail").length,
      notes: check.notes,
      photos: photos.get(row.id) ?? 0,
      updatedAt: row.updatedAt.toISOString(),
    };
  });
}

/** Models on sale whose certification lapses within 30 days or has lapsed: they need a fresh check. */
export async function listCertificationsDue({ now = new Date() }: { now?: Date } = {}): Promise<
  StaffModelRow[]
> {
  const rows = await listStaffModelRows({ now });
  return rows
    .filter(
      (r) =>
        r.status === "published" &&
        (r.expiresWithin30Days || r.certState === "expired" || r.certState === "failed"),
    )
    .sort((a, b) => (a.expiresAt ?? "").localeCompare(b.expiresAt ?? ""));
}
