import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { getDb } from "@/db/client";
import { gifts, orders, outbox, users } from "@/db/schema";
import type { SessionUser } from "@/lib/auth/session";
import { seedDemo } from "@/lib/demo/commands";
import { previewStatement } from "@/lib/mail/queries/statement-preview";
import { resetDb } from "../../support/db";

// The admin's preview and "send again" of a year-end statement: the role is checked on the
// server, bad input changes nothing, and each confirmed resend queues exactly one more message.
const session = vi.hoisted(() => ({ user: null as SessionUser | null }));
vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => session.user }));

const { resendStatementAction } = await import("@/lib/giving/actions");
const as = (role: SessionUser["role"]): SessionUser => ({ id: "00000000-0000-4000-8000-000000000001", name: role, email: `${role}@example.org`, role });

async function donorWithGift() {
  const db = await getDb();
  const [user] = await db.insert(users).values({ email: "ada@example.org", name: "Ada Fern", passwordHash: "x" }).returning();
  const [order] = await db
    .insert(orders)
    .values({ userId: user!.id, email: user!.email, name: "Ada Fern", accessToken: "t", status: "paid", method: "none", subtotalCents: 0, shippingCents: 0, taxCents: 0, giftCents: 4_321, totalCents: 4_321, paidAt: new Date("2026-03-01T12:00:00Z") })
    .returning();
  await db.insert(gifts).values({ orderId: order!.id, userId: user!.id, email: user!.email, amountCents: 4_321, receivedAt: order!.paidAt! });
  return user!;
}

const statements = async () => (await getDb()).select().from(outbox).where(eq(outbox.kind, "year-end-statement"));

describe("the admin's year-end statements", () => {
  beforeEach(async () => {
    await seedDemo(await resetDb());
    session.user = null;
  });

  it("previews the statement from the database without queueing anything", async () => {
    const ada = await donorWithGift();
    const preview = await previewStatement({ userId: ada.id, year: 2026 });
    expect(preview.text).toContain("2026");
    expect(preview.text).toContain("$43.21");
    expect(await statements()).toHaveLength(0);
  });

  it("lets only admins send it again, refuses bad input, and queues one message per confirmed resend", async () => {
    const ada = await donorWithGift();
    expect(await resendStatementAction({ userId: ada.id, year: 2026 })).toMatchObject({ ok: false, error: { code: "unauthenticated" } });
    for (const role of ["customer", "staff", "fulfillment"] as const) {
      session.user = as(role);
      expect(await resendStatementAction({ userId: ada.id, year: 2026 })).toMatchObject({ ok: false, error: { code: "forbidden" } });
    }
    expect(await statements()).toHaveLength(0);
    session.user = as("admin");
    expect(await resendStatementAction({ userId: "not-a-uuid", year: 2026 })).toMatchObject({ ok: false, error: { code: "bad_request" } });
    expect(await resendStatementAction({ userId: ada.id, year: 26 })).toMatchObject({ ok: false });
    expect(await statements()).toHaveLength(0);
    expect(await resendStatementAction({ userId: ada.id, year: 2026 })).toEqual({ ok: true, data: { queued: true } });
    const queued = await statements();
    expect(queued).toHaveLength(1);
    expect(queued[0]!.toAddress).toBe("ada@example.org");
    expect(queued[0]!.subject).toBe("Your gifts in 2026: year-end statement");
  });
});
