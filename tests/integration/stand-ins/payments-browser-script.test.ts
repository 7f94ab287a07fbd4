import { readFile } from "node:fs/promises";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startPaymentsStandIn, type PaymentsStandIn } from "@/stand-ins/payments/server";
import { TEST_PUBLISHABLE_KEY, TEST_SECRET_KEY, TEST_WEBHOOK_SECRET } from "./helpers";

// The store's layout loads the browser library from the payments stand-in itself, as the hosted
// service serves its own script; it must answer without an API key and as JavaScript.
let standIn: PaymentsStandIn;

beforeAll(async () => {
  standIn = await startPaymentsStandIn({
    port: 0,
    webhookSecret: TEST_WEBHOOK_SECRET,
    secretKey: TEST_SECRET_KEY,
    publishableKey: TEST_PUBLISHABLE_KEY,
  });
});
afterAll(() => standIn.close());

describe("payments stand-in: browser script", () => {
  it("serves stand-ins/payments/browser/stripe.js at /stripe.js, byte for byte", async () => {
    const response = await fetch(`${standIn.url}/stripe.js`);
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("text/javascript; charset=utf-8");
    const onDisk = await readFile(new URL("../../../stand-ins/payments/browser/stripe.js", import.meta.url), "utf8");
    expect(await response.text()).toBe(onDisk);
  });

  it("still refuses an API call without a key", async () => {
    const response = await fetch(`${standIn.url}/v1/payment_intents`);
    expect(response.status).toBe(401);
  });
});
