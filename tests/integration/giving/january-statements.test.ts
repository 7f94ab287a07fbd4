import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { gifts, orders, outbox, users } from "@/db/schema";
import { queueJanuaryStatements, resendStatement } from "@/lib/giving/commands/statements";
import { resetDb } from "../../support/db";

async function userWith(email: string) {
  const db = await getDb();
  const [user] = await db.insert(users).values({ email, name: email.split("@")[0]!, passwordHash: "x" }).returning();
  return user!;
}

async function giftAt(userId: string | null, email: string, iso: string, amountCents = 2_000) {
  const db = await getDb();
  const [order] = await db
    .insert(orders)
    .values({ userId, email, name: "Donor", accessToken: "t", status: "paid", method: "none", subtotalCents: 0, shippingCents: 0, taxCents: 0, giftCents: amountCents, totalCents: amountCents, paidAt: new Date(iso) })
    .returning();
  await db.insert(gifts).values({ orderId: order!.id, userId, email, amountCents, receivedAt: new Date(iso) });
}

async function statements() {
  const db = await getDb();
  return db.select().from(outbox).where(eq(outbox.kind, "year-end-statement"));
}

describe("the January statement run", () => {
  beforeEach(async () => {
    await resetDb();
  });

  it("queues one statement per donor with gifts in the year just ended, however often and however many times at once it runs", async () => {
    const ada = await userWith("ada@example.org");
    const ben = await userWith("ben@example.org");
    const cy = await userWith("cy@example.org");
    // 23:30 on December 31, 2026 in Oregon (the default zone) is 07:30 UTC on January 1, 2027.
    await giftAt(ada.id, ada.email, "2027-01-01T07:30:00Z");
    await giftAt(ben.id, ben.email, "2026-06-01T12:00:00Z");
    await giftAt(ben.id, ben.email, "2026-07-01T12:00:00Z");
    await giftAt(cy.id, cy.email, "2027-01-01T08:30:00Z"); // 00:30 on January 1, 2027 in Oregon: next year's
    await giftAt(null, "guest@example.org", "2026-05-01T12:00:00Z");

    const now = new Date("2027-01-02T17:00:00Z");
    const first = await queueJanuaryStatements({ now });
    expect(first).toEqual({ year: 2026, queued: 2 });
    await queueJanuaryStatements({ now });
    // Five instances at the same moment, and a restart the next day.
    await Promise.all(Array.from({ length: 5 }, () => queueJanuaryStatements({ now })));
    await queueJanuaryStatements({ now: new Date("2027-01-03T17:00:00Z") });
    const rows = await statements();
    expect(rows.map((r) => r.toAddress).sort()).toEqual(["ada@example.org", "ben@example.org"]);
    expect(rows.every((r) => (r.payload as { year: number }).year === 2026)).toBe(true);
  });

  it("does nothing outside the first days of January, nor on New Year's Eve in the center's zone", async () => {
    const ada = await userWith("ada@example.org");
    await giftAt(ada.id, ada.email, "2026-03-01T12:00:00Z");
    expect(await queueJanuaryStatements({ now: new Date("2027-01-01T07:30:00Z") })).toEqual({ year: null, queued: 0 });
    expect(await queueJanuaryStatements({ now: new Date("2027-01-09T12:00:00Z") })).toEqual({ year: null, queued: 0 });
    expect(await statements()).toHaveLength(0);
  });

  it("the admin's resend adds a new message beside the January one", async () => {
    const ada = await userWith("ada@example.org");
    await giftAt(ada.id, ada.email, "2026-03-01T12:00:00Z");
    await queueJanuaryStatements({ now: new Date("2027-01-02T17:00:00Z") });
    await resendStatement({ userId: ada.id, year: 2026, now: new Date("2027-02-01T12:00:00Z") });
    expect(await statements()).toHaveLength(2);
  });
});
