import { sql } from "drizzle-orm";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { getDb } from "@/db/client";
import { gifts, orders } from "@/db/schema";
import type { SessionUser } from "@/lib/auth/session";
import { seedDemo } from "@/lib/demo/commands";
import { resetDb } from "../../support/db";

// The reports' CSV routes: the role checked on the server (signed out 401, wrong role 403), and
// the files' figures equal to the database's.
const session = vi.hoisted(() => ({ user: null as SessionUser | null }));
vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => session.user }));

const { GET: salesGet } = await import("@/app/api/admin/reports/sales.csv/route");
const { GET: stockGet } = await import("@/app/api/admin/reports/stock.csv/route");
const { GET: planGet } = await import("@/app/api/admin/reports/build-plan.csv/route");

const as = (role: SessionUser["role"]): SessionUser => ({ id: "00000000-0000-4000-8000-000000000001", name: role, email: `${role}@example.org`, role });
const none = { params: Promise.resolve({}) };
const req = (path: string) => new Request(`http://localhost${path}`);

describe("the reports' CSV routes", () => {
  beforeEach(async () => {
    await seedDemo(await resetDb());
    session.user = null;
  });

  it("let admins have every file, staff the stock files only, nobody else any", async () => {
    const calls = {
      sales: () => salesGet(req("/api/admin/reports/sales.csv?from=2027-01-01&to=2027-01-31"), none),
      stock: () => stockGet(req("/api/admin/reports/stock.csv"), none),
      plan: () => planGet(req("/api/admin/reports/build-plan.csv"), none),
    };
    const allowed: Record<SessionUser["role"] | "signed out", (keyof typeof calls)[]> = {
      "signed out": [],
      customer: [],
      fulfillment: [],
      staff: ["stock", "plan"],
      admin: ["sales", "stock", "plan"],
    };
    for (const [who, may] of Object.entries(allowed)) {
      session.user = who === "signed out" ? null : as(who as SessionUser["role"]);
      for (const [name, call] of Object.entries(calls)) {
        const res = await call();
        if (may.includes(name as keyof typeof calls)) {
          expect(res.status, `${who} ${name}`).toBe(200);
          expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
          expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename=".+\.csv"$/);
        } else {
          expect(res.status, `${who} ${name}`).toBe(who === "signed out" ? 401 : 403);
        }
      }
    }
  });

  it("write the database's figures to the cent", async () => {
    const db = await getDb();
    const [order] = await db
      .insert(orders)
      .values({ email: "d@example.org", name: "D", accessToken: "t", status: "paid", method: "parcel", subtotalCents: 8_900, shippingCents: 1_200, taxCents: 498, giftCents: 2_506, totalCents: 13_104, paidAt: new Date("2027-01-20T18:00:00Z") })
      .returning();
    await db.insert(gifts).values({ orderId: order!.id, email: "d@example.org", amountCents: 2_506, receivedAt: order!.paidAt! });
    session.user = as("admin");
    const sales = await (await salesGet(req("/api/admin/reports/sales.csv?from=2027-01-01&to=2027-01-31"), none)).text();
    expect(sales).toBe("month,orders,sales_usd,one_time_gifts_usd,monthly_gifts_usd\r\n2027-01,1,105.98,25.06,0\r\ntotal,1,105.98,25.06,0\r\n");
    const stock = (await (await stockGet(req("/api/admin/reports/stock.csv"), none)).text()).split("\r\n");
    expect(stock[0]).toBe("model,slug,in_stock,list_price_usd,stock_value_usd");
    const [row] = ((await db.execute(sql`select coalesce(sum(stock * price_cents), 0)::int as v, coalesce(sum(stock), 0)::int as n from house_models`)) as unknown as { rows: { v: number; n: number }[] }).rows;
    expect(row!.v).toBeGreaterThan(0);
    expect(stock.at(-2)).toBe(`total,,${row!.n},,${row!.v / 100}`);
    const plan = (await (await planGet(req("/api/admin/reports/build-plan.csv"), none)).text()).split("\r\n");
    expect(plan[0]).toBe("model,slug,in_stock,sold_same_months_last_year,build");
    expect(plan.length - 2).toBe(stock.length - 3);
  });

  it("refuses a malformed range parameter with a 400", async () => {
    session.user = as("admin");
    const res = await salesGet(req(`/api/admin/reports/sales.csv?from=${"9".repeat(40)}`), none);
    expect(res.status).toBe(400);
  });
});
