/**
 * Checkout latency over 200 orders on loopback, in one process: the quote, the checkout (order +
 * stock reservation + PaymentIntent through the SDK) and webhook-to-paid (card confirmed at the
 * payments stand-in → signed webhook → order paid). Prints p50 and p95 of each.
 *   npx tsx --conditions=react-server bench/checkout-latency.ts [orders=200]
 */
process.env.DATABASE_URL = "memory://";
process.env.STRIPE_SECRET_KEY = "sk_test_bench";
process.env.STRIPE_PUBLISHABLE_KEY = "pk_test_bench";
process.env.STRIPE_WEBHOOK_SECRET = "whsec_bench_secret_0123456789";
process.env.STRIPE_API_BASE = "http://127.0.0.1:12411";

const { createServer } = await import("node:http");
const { eq } = await import("drizzle-orm");
const { getDb, closeDb } = await import("@/db/client");
const { houseModels, orders } = await import("@/db/schema");
const { seedDemo } = await import("@/lib/demo/commands");
const { quoteFromDatabase } = await import("@/lib/checkout/queries/quote");
const { startCheckout } = await import("@/lib/checkout/commands/orders");
const { getPayments } = await import("@/lib/checkout/payments");
const { verifyWebhook } = await import("@/lib/checkout/payments");
const { processPaymentEvent } = await import("@/lib/checkout/commands/webhooks");
const { startPaymentsStandIn } = await import("@/stand-ins/payments/server");

const N = Number(process.argv[2] ?? 200);
const db = await getDb();
await seedDemo(db);
await db.update(houseModels).set({ stock: 100_000 });

const paidAt = new Map<string, number>();
const receiver = createServer(async (req, res) => {
  const chunks: Buffer[] = [];
  for await (const c of req) chunks.push(c as Buffer);
  const event = verifyWebhook(Buffer.concat(chunks).toString("utf8"), req.headers["stripe-signature"] as string);
  await processPaymentEvent(event);
  if (event.type === "payment_intent.succeeded") paidAt.set((event.data.object as { id: string }).id, performance.now());
  res.writeHead(200).end("{}");
});
await new Promise<void>((r) => receiver.listen(12412, "127.0.0.1", r));
const standIn = await startPaymentsStandIn({
  port: 12411,
  webhookUrl: "http://127.0.0.1:12412/",
  webhookSecret: process.env.STRIPE_WEBHOOK_SECRET!,
  secretKey: process.env.STRIPE_SECRET_KEY,
});

const quote: number[] = [];
const checkout: number[] = [];
const toPaid: number[] = [];
const items = [{ slug: "hollow-four", quantity: 1 }, { slug: "twin-ridge", quantity: 2 }];
const address = { name: "Bench Buyer", line1: "1 Loop Rd", line2: "", city: "Tempe", state: "AZ" as const, zip: "85281" };
for (let i = 0; i < N; i++) {
  let t = performance.now();
  await quoteFromDatabase(db, { items, method: "parcel", state: "AZ", giftCents: 2500 });
  quote.push(performance.now() - t);
  t = performance.now();
  const started = await startCheckout({ items, method: "parcel", giftCents: 2500, contact: { name: "Bench Buyer", email: `b${i}@example.org` }, address }, null);
  checkout.push(performance.now() - t);
  const [row] = await db.select({ pi: orders.paymentIntentId }).from(orders).where(eq(orders.id, started.orderId));
  t = performance.now();
  await getPayments().paymentIntents.confirm(row!.pi!, { payment_method: "pm_card_visa" });
  await standIn.webhooksIdle();
  const done = paidAt.get(row!.pi!);
  if (done === undefined) throw new Error(`order ${started.orderId} was not paid`);
  toPaid.push(done - t);
}

const pct = (xs: number[], p: number) => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor((p / 100) * xs.length))]!.toFixed(1);
console.log(`checkout latency over ${N} orders (ms, in-memory PGlite, payments stand-in on loopback)`);
for (const [name, xs] of [["quote", quote], ["checkout", checkout], ["webhook-to-paid", toPaid]] as const) {
  console.log(`  ${name.padEnd(16)} p50 ${pct(xs, 50).padStart(7)}   p95 ${pct(xs, 95).padStart(7)}`);
}
await standIn.close();
receiver.close();
await closeDb();
export {};
