import "server-only";
import { getDb } from "@/db/client";
import { moveStock } from "@/lib/stock/commands";
import { ledgerReason, type AdjustStockInput, type ReceiveStockInput } from "../stock-input";

// Staff stock changes, each one movement in the ledger through moveStock (lib/stock/commands.ts):
// a conditional update that never takes stock below zero, backed by a CHECK constraint.

export async function receiveStock({
  input,
  actorId,
}: {
  input: ReceiveStockInput;
  actorId: string;
}): Promise<{ stockAfter: number }> {
  const db = await getDb();
  return db.transaction((tx) =>
    moveStock(tx, {
      modelId: input.modelId,
      kind: "received",
      delta: input.count,
      reason: input.note ? `Received: ${input.note}` : "Received",
      batch: input.batch,
      builderName: input.builderName,
      actorId,
    }),
  );
}

export async function adjustStock({
  input,
  actorId,
}: {
  input: AdjustStockInput;
  actorId: string;
}): Promise<{ stockAfter: number }> {
  const db = await getDb();
  return db.transaction((tx) =>
    moveStock(tx, {
      modelId: input.modelId,
      kind: "adjusted",
      delta: input.change,
      reason: ledgerReason({ reason: input.reason, note: input.note }),
      actorId,
    }),
  );
}
