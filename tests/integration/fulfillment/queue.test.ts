import { beforeAll, describe, expect, it, vi } from "vitest";
import { seedDemo } from "@/lib/demo/commands";
import type { SessionUser } from "@/lib/auth/session";
import { GET as csvGet } from "@/app/api/fulfillment/orders.csv/route";
import { GET as queueGet } from "@/app/api/fulfillment/orders/route";
import { summarizeQueue } from "@/lib/fulfillment/queries/queue";
import { resetDb } from "../../support/db";
import { demoUser, insertPaidOrder } from "./support";

// The queue route over a small, known set of orders: filters, search, sort, pages, CSV.
const session = vi.hoisted(() => ({ user: null as SessionUser | null }));
vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => session.user }));

const day = (iso: string) => new Date(iso);
const names: Record<string, string> = {};

beforeAll(async () => {
  await seedDemo(await resetDb());
  session.user = await demoUser("fulfillment");
  // Paid at known instants. 2026-03-04T07:30Z is still March 3 in Oregon (UTC−8).
  const rows = [
    { name: "Alma Thistlewood", status: "paid", method: "parcel", paidAt: day("2026-03-01T18:00:00Z") },
    { name: "Basil Quarrie", status: "packing", method: "parcel", paidAt: day("2026-03-02T18:00:00Z") },
    { name: "Cora 100% Fenn", status: "packed", method: "parcel", paidAt: day("2026-03-04T07:30:00Z") },
    { name: "Dmitri Osgood", status: "ready_for_pickup", method: "pickup", paidAt: day("2026-03-05T18:00:00Z") },
    { name: "Edda Marsh", status: "delivered", method: "parcel", paidAt: day("2026-02-20T18:00:00Z") },
    { name: "=HYPERLINK(1)", status: "paid", method: "pickup", paidAt: day("2026-03-06T18:00:00Z") },
    { name: "Gift Only", status: "paid", method: "none", paidAt: day("2026-02-01T18:00:00Z") },
    { name: "Unpaid Checkout", status: "pending_payment", method: "parcel", paidAt: day("2026-02-01T18:00:00Z") },
  ] as const;
  for (const row of rows) {
    const order = await insertPaidOrder({ ...row, items: row.method === "none" ? [] : [{ slug: "twin-ridge", quantity: 2 }] });
    names[row.name] = order.id;
  }
});

async function queue(search: string) {
  const res = await queueGet(new Request(`http://localhost/api/fulfillment/orders?${search}`), { params: Promise.resolve({}) });
  return { status: res.status, body: await res.json() };
}
const namesOf = (body: { items: { name: string }[] }) => body.items.map((i) => i.name);

describe("GET /api/fulfillment/orders", () => {
  it("shows open paid orders, oldest first, and never gift-only or unpaid ones", async () => {
    const { body } = await queue("");
    expect(namesOf(body)).toEqual(["Alma Thistlewood", "Basil Quarrie", "Cora 100% Fenn", "Dmitri Osgood", "=HYPERLINK(1)"]);
    expect(body).toMatchObject({ total: 5, page: 1, pageSize: 25, pageCount: 1 });
    expect(body.items[0]).toMatchObject({ houses: 2, boxes: 0, boxesShipped: 0, method: "parcel", shipTo: { city: "Fernbrook", state: "WI" } });
    expect(namesOf((await queue("state=all")).body)).toHaveLength(6);
  });

  it("filters by state, method and the center's calendar days", async () => {
    expect(namesOf((await queue("state=packed")).body)).toEqual(["Cora 100% Fenn"]);
    expect(namesOf((await queue("method=pickup")).body)).toEqual(["Dmitri Osgood", "=HYPERLINK(1)"]);
    // March 3 in Oregon holds the order paid at 07:30 UTC on March 4.
    expect(namesOf((await queue("from=2026-03-03&to=2026-03-03")).body)).toEqual(["Cora 100% Fenn"]);
    expect(namesOf((await queue("state=all&to=2026-02-28")).body)).toEqual(["Edda Marsh"]);
  });

  it("searches by order number or name, with % taken literally", async () => {
    const { body: all } = await queue("state=all");
    const cora = all.items.find((i: { name: string }) => i.name.startsWith("Cora"));
    expect(namesOf((await queue(`q=RW-${String(cora.number).padStart(5, "0")}`)).body)).toEqual(["Cora 100% Fenn"]);
    expect(namesOf((await queue(`q=${cora.number}`)).body)).toEqual(["Cora 100% Fenn"]);
    expect(namesOf((await queue("q=quarr")).body)).toEqual(["Basil Quarrie"]);
    expect(namesOf((await queue("q=100%25")).body)).toEqual(["Cora 100% Fenn"]);
    expect(namesOf((await queue("q=1%25")).body)).toEqual([]);
  });

  it("sorts and pages", async () => {
    expect(namesOf((await queue("sort=name&dir=desc&pageSize=10")).body)).toEqual([
      "Dmitri Osgood",
      "Cora 100% Fenn",
      "Basil Quarrie",
      "Alma Thistlewood",
      "=HYPERLINK(1)",
    ]);
    expect(namesOf((await queue("sort=status")).body)[0]).toBe("Alma Thistlewood");
    const page2 = (await queue("state=all&pageSize=10&page=1&sort=paid&dir=desc")).body;
    expect(page2.items[0].name).toBe("=HYPERLINK(1)");
  });

  it("answers a bad filter with 400 and the field's message", async () => {
    const { status, body } = await queue("from=2026-03-09&to=2026-03-01");
    expect(status).toBe(400);
    expect(body.error.fields.to).toBe("The end date comes before the start date.");
    expect((await queue("pageSize=7")).status).toBe(400);
  });
});

describe("CSV export", () => {
  it("holds the whole current view, with formulas defused", async () => {
    const res = await csvGet(new Request("http://localhost/api/fulfillment/orders.csv?method=pickup"), { params: Promise.resolve({}) });
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="shipping-desk-\d{4}-\d{2}-\d{2}\.csv"$/);
    const lines = (await res.text()).split("\r\n");
    expect(lines[0]).toBe("Order,Buyer,E-mail,State,How it goes,Paid (Pacific time),Houses,Boxes,Boxes with tracking,City,State/ZIP");
    expect(lines).toHaveLength(4); // header, two orders, and the empty string after the last CRLF
    expect(lines[1]).toMatch(/^RW-\d{5},Dmitri Osgood,buyer\d+@example\.org,Waiting at the center,Local pickup,"Mar 5, 2026, 10:00[\s\u202f]AM",2,0,0,,$/);
    expect(lines[2]).toContain(",'=HYPERLINK(1),");
  });
});

describe("summary", () => {
  it("counts open orders per state and names the oldest at the bench", async () => {
    const summary = await summarizeQueue();
    expect(summary.counts).toEqual({ paid: 2, packing: 1, packed: 1, shipped: 0, ready_for_pickup: 1 });
    expect(summary.oldest).toMatchObject({ id: names["Alma Thistlewood"], status: "paid" });
  });
});
