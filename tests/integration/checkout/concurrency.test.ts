import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { orders } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import { resetDb } from "../../support/db";
import { startTestPayments } from "../../support/payments";
import { checkoutInput, pay, setStock, startCheckout, stockOf } from "./helpers";

let payments: Awaited<ReturnType<typeof startTestPayments>>;
beforeAll(async () => {
  payments = await startTestPayments();
  await seedDemo(await resetDb());
});
afterAll(async () => payments.close());

describe("no overselling", () => {
  for (let run = 1; run <= 10; run++) {
    it(`50 checkouts at once for 5 in stock → exactly 5 paid, stock 0 (run ${run})`, async () => {
      const db = await getDb();
      await db.delete(orders).where(eq(orders.status, "paid")).catch(() => undefined);
      await setStock("canyon-four-light", 5);
      const attempts = await Promise.allSettled(
        Array.from({ length: 50 }, (_, i) =>
          startCheckout(checkoutInput({ items: [{ slug: "canyon-four-light", quantity: 1 }], contact: { name: `Buyer ${i}`, email: `b${i}@example.org` } }), null),
        ),
      );
      const started = attempts.filter((a) => a.status === "fulfilled").map((a) => (a as PromiseFulfilledResult<{ orderId: string }>).value);
      const refused = attempts.filter((a) => a.status === "rejected").map((a) => (a as PromiseRejectedResult).reason);
      expect(started).toHaveLength(5);
      expect(refused.every((r) => r.code === "out_of_stock")).toBe(true);
      expect(await stockOf("canyon-four-light")).toBe(0);
      await Promise.all(started.map((s) => pay(s.orderId)));
      await payments.standIn.webhooksIdle();
      const paid = await db.select().from(orders).where(eq(orders.status, "paid"));
      expect(paid.filter((o) => started.some((s) => s.orderId === o.id))).toHaveLength(5);
      expect(await stockOf("canyon-four-light")).toBe(0);
    });
  }
});
