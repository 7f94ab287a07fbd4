import "server-only";
import { and, eq, gte, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { houseModels, stockMovements } from "@/db/schema";
import { AppError } from "@/lib/http/errors";
import { crossesLowStock } from "@/lib/mail/low-stock";
import { queueLowStockAlert } from "@/lib/mail/commands/low-stock-alert";

export type StockMovementKind = "received" | "adjusted" | "reserved" | "sold" | "released";

export type StockMovementInput = {
  modelId: string;
  kind: StockMovementKind;
  /** Change in units on hand: + for received/released, − for reserved, any sign for adjusted, 0 for sold. */
  delta: number;
  reason?: string;
  actorId?: string | null;
  orderId?: string | null;
  batch?: string | null;
  builderName?: string | null;
};

/**
 * The only way stock changes: one conditional UPDATE that never takes stock below zero
 * (`WHERE stock + delta >= 0`, backed by a CHECK constraint), plus a ledger row in the same
 * transaction. Correct on PGlite and on a PostgreSQL server alike (no SELECT … FOR UPDATE needed).
 * Call it inside the caller's transaction so the movement and its cause commit together.
 */
export async function moveStock(tx: DbOrTx, input: StockMovementInput): Promise<{ stockAfter: number }> {
  if (!Number.isInteger(input.delta)) throw new AppError("bad_request", "Stock moves in whole units.");
  const [row] = await tx
    .update(houseModels)
    .set({ stock: sql`${houseModels.stock} + ${input.delta}` })
    .where(and(eq(houseModels.id, input.modelId), gte(sql`${houseModels.stock} + ${input.delta}`, 0)))
    .returning({ stock: houseModels.stock, threshold: houseModels.lowStockThreshold, name: houseModels.name });
  if (!row) {
    const [exists] = await tx.select({ stock: houseModels.stock }).from(houseModels).where(eq(houseModels.id, input.modelId));
    if (!exists) throw new AppError("not_found", "No house model has that id.");
    throw new AppError(
      "out_of_stock",
      `Only ${exists.stock} in stock; that change would take it below zero.`,
      { delta: `Only ${exists.stock} in stock.` },
    );
  }
  await tx.insert(stockMovements).values({
    modelId: input.modelId,
    kind: input.kind,
    delta: input.delta,
    stockAfter: row.stock,
    reason: input.reason ?? "",
    actorId: input.actorId ?? null,
    orderId: input.orderId ?? null,
    batch: input.batch ?? null,
    builderName: input.builderName ?? null,
  });
  // The staff alert rides in the same transaction: it exists exactly when the movement does.
  if (crossesLowStock({ before: row.stock - input.delta, after: row.stock, threshold: row.threshold })) {
    await queueLowStockAlert(tx, { modelId: input.modelId, modelName: row.name, stockAfter: row.stock, threshold: row.threshold });
  }
  return { stockAfter: row.stock };
}
