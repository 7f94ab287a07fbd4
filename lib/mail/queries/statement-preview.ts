import "server-only";
import { getDb } from "@/db/client";
import { renderOutboxMessage, type RenderedMessage } from "../render-message";

/** The year-end statement one donor would receive now, rendered from the database as the sender would. */
export async function previewStatement({ userId, year, now = new Date() }: { userId: string; year: number; now?: Date }): Promise<RenderedMessage> {
  const db = await getDb();
  return renderOutboxMessage({ db, row: { kind: "year-end-statement", payload: { userId, year, issuedOn: now.toISOString() } } });
}
