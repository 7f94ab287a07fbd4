import "server-only";
import { and, asc, count, eq, lte, ne } from "drizzle-orm";
import { getDb } from "@/db/client";
import { houseModels } from "@/db/schema";

export async function countModelsByStatus(): Promise<Record<"draft" | "published" | "retired", number>> {
  const db = await getDb();
  const rows = await db.select({ status: houseModels.status, n: count() }).from(houseModels).groupBy(houseModels.status);
  const counts = { draft: 0, published: 0, retired: 0 };
  for (const r of rows) counts[r.status] = r.n;
  return counts;
}

/** Models not retired whose stock is at or under their low-stock threshold. */
export async function listLowStockModels() {
  const db = await getDb();
  return db
    .select({
      slug: houseModels.slug,
      name: houseModels.name,
      stock: houseModels.stock,
      lowStockThreshold: houseModels.lowStockThreshold,
    })
    .from(houseModels)
    .where(and(ne(houseModels.status, "retired"), lte(houseModels.stock, houseModels.lowStockThreshold), eq(houseModels.status, "published")))
    .orderBy(asc(houseModels.stock), asc(houseModels.name));
}
