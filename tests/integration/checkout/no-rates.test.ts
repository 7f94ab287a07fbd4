import { count } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { getDb } from "@/db/client";
import { orders, shippingRates } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import { POST as quotePost } from "@/app/api/cart/quote/route";
import { POST as checkoutPost } from "@/app/api/checkout/route";
import { resetDb } from "../../support/db";
import { startTestPayments } from "../../support/payments";
import { checkoutInput } from "./helpers";

// With no shipping rate that covers the parcel, a parcel order is refused with the missing
// rate named; it never ships for free.
vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => null }));

let payments: Awaited<ReturnType<typeof startTestPayments>>;
beforeAll(async () => {
  payments = await startTestPayments();
});
afterAll(async () => payments.close());

const noParams = { params: Promise.resolve({}) };
const post = (handler: typeof quotePost, body: unknown) =>
  handler(new Request("http://localhost/api", { method: "POST", body: JSON.stringify(body), headers: { "content-type": "application/json" } }), noParams);
const quoteBody = { items: [{ slug: "hollow-four", quantity: 1 }], shipTo: { state: "AZ", zip: "85281" }, method: "parcel", giftCents: 0 };

describe("a parcel with no rate that covers it", () => {
  beforeEach(async () => {
    const db = await resetDb();
    await seedDemo(db);
  });

  it("is refused at the quote and at checkout when the rate table is empty, and no order is made", async () => {
    const db = await getDb();
    await db.delete(shippingRates);
    const quote = await post(quotePost, quoteBody);
    expect(quote.status).toBe(400);
    const body = (await quote.json()) as { error: { code: string; message: string; fields?: Record<string, string> } };
    expect(body.error.code).toBe("bad_request");
    expect(body.error.message).toMatch(/No shipping rate is set up yet, so the .+ parcel \(\d+ lb billable\) can't be priced/);
    expect(body.error.fields?.rateTiers).toBe(body.error.message);

    const checkout = await post(checkoutPost, checkoutInput());
    expect(checkout.status).toBe(400);
    expect(((await checkout.json()) as { error: { message: string } }).error.message).toMatch(/No shipping rate is set up yet/);
    const [row] = await db.select({ n: count() }).from(orders);
    expect(row?.n).toBe(0);
  });

  it("names the heaviest rate when the parcel is heavier than every rate", async () => {
    const db = await getDb();
    await db.delete(shippingRates);
    await db.insert(shippingRates).values({ maxBillableLb: 1, cents: 500 });
    const quote = await post(quotePost, quoteBody);
    expect(quote.status).toBe(400);
    expect(((await quote.json()) as { error: { message: string } }).error.message).toMatch(/more than the heaviest shipping tier \(1 lb\)/);
  });

  it("still prices local pickup, which needs no rate", async () => {
    const db = await getDb();
    await db.delete(shippingRates);
    const quote = await post(quotePost, { ...quoteBody, method: "pickup", shipTo: undefined });
    expect(quote.status).toBe(200);
  });
});
