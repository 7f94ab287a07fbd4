import { eq, sql } from "drizzle-orm";
import { beforeEach, describe, expect, it, vi } from "vitest";

vi.mock("@/lib/auth/session", () => ({ getSessionUser: vi.fn(async () => null) }));

import { adjustStockAction, receiveStockAction } from "@/lib/staff/actions";
import { GET as getLedger } from "@/app/api/staff/models/[slug]/stock-movements/route";
import { getDb } from "@/db/client";
import { houseModels, stockMovements } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import { getSessionUser } from "@/lib/auth/session";
import { resetDb } from "../../support/db";
import { modelBySlug, params, sessionUserFor } from "./helpers";

const session = vi.mocked(getSessionUser);
let staffId: string;

beforeEach(async () => {
  const db = await resetDb();
  await seedDemo(db);
  const staff = await sessionUserFor(db, "staff");
  staffId = staff.id;
  session.mockResolvedValue(staff);
});

describe("the stock ledger", () => {
  it("never goes below zero when 50 adjustments of -1 race for 20 houses", async () => {
    const db = await getDb();
    const model = await modelBySlug(db, "hollow-four");
    await db.update(houseModels).set({ stock: 20 }).where(eq(houseModels.id, model.id));
    const results = await Promise.all(
      Array.from({ length: 50 }, (_, i) =>
        adjustStockAction({ modelId: model.id, reason: "damaged", change: -1, note: `race ${i}` }),
      ),
    );
    const ok = results.filter((r) => r.ok);
    const refused = results.filter((r) => !r.ok);
    expect(ok).toHaveLength(20);
    expect(refused).toHaveLength(30);
    for (const r of refused)
      expect(r).toMatchObject({ ok: false, error: { code: "out_of_stock" } });
    expect((await modelBySlug(db, "hollow-four")).stock).toBe(0);
    const moves = await db
      .select()
      .from(stockMovements)
      .where(eq(stockMovements.modelId, model.id));
    const raceMoves = moves.filter((m) => m.reason.startsWith("Damaged: race"));
    expect(raceMoves).toHaveLength(20);
    expect(Math.min(...raceMoves.map((m) => m.stockAfter))).toBe(0);
    // Each stock level from 19 down to 0 was reached exactly once.
    expect(raceMoves.map((m) => m.stockAfter).sort((a, b) => a - b)).toEqual(
      Array.from({ length: 20 }, (_, i) => i),
    );
  }, 120_000);

  it("refuses a direct write below zero at the database too (the CHECK constraint)", async () => {
    const db = await getDb();
    const model = await modelBySlug(db, "hollow-four");
    await expect(
      db
        .update(houseModels)
        .set({ stock: sql`-1` })
        .where(eq(houseModels.id, model.id)),
    ).rejects.toThrow();
  });

  it("records who, when, why, the batch and the builder for each movement", async () => {
    const db = await getDb();
    const model = await modelBySlug(db, "ember-five");
    expect(
      await receiveStockAction({
        modelId: model.id,
        count: 6,
        batch: "2026-autumn-2",
        builderName: "Hollow Creek Joinery",
        note: "",
      }),
    ).toMatchObject({
      ok: true,
      data: { stockAfter: 8 },
    });
    expect(
      await adjustStockAction({
        modelId: model.id,
        reason: "damaged",
        change: -1,
        note: "split back board",
      }),
    ).toMatchObject({
      ok: true,
      data: { stockAfter: 7 },
    });
    const over = await adjustStockAction({
      modelId: model.id,
      reason: "recount",
      change: -8,
      note: "counted none",
    });
    expect(over).toMatchObject({
      ok: false,
      error: {
        code: "out_of_stock",
        message: "Only 7 in stock; that change would take it below zero.",
      },
    });

    const res = await getLedger(new Request("http://localhost/x"), params({ slug: "ember-five" }));
    const { items } = (await res.json()) as {
      items: {
        kind: string;
        delta: number;
        stockAfter: number;
        reason: string;
        batch: string | null;
        builderName: string | null;
        actor: string | null;
        createdAt: string;
      }[];
    };
    const [latest, received] = items;
    expect(latest).toMatchObject({
      kind: "adjusted",
      delta: -1,
      stockAfter: 7,
      reason: "Damaged: split back board",
      actor: "Tobias Marlow",
    });
    expect(received).toMatchObject({
      kind: "received",
      delta: 6,
      stockAfter: 8,
      batch: "2026-autumn-2",
      builderName: "Hollow Creek Joinery",
      actor: "Tobias Marlow",
    });
    expect(Date.now() - Date.parse(latest!.createdAt)).toBeLessThan(60_000);
    const rows = await db.select().from(stockMovements).where(eq(stockMovements.modelId, model.id));
    expect(
      rows.filter((r) => r.reason !== "Opening stock").every((r) => r.actorId === staffId),
    ).toBe(true);
    // The ledger adds up: the opening stock plus every movement is the stock on hand.
    const sum = items.reduce((s, m) => s + m.delta, 0);
    expect(sum).toBe((await modelBySlug(db, "ember-five")).stock);
  });
});
