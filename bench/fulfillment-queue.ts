// The shipping desk's queue query with 10,000 orders in an in-memory PGlite: p50/p95 of the
// first page (the default view) and of a filtered, sorted page, calling the query the JSON route
// calls. Run: npx tsx --conditions=react-server bench/fulfillment-queue.ts
// (react-server lets the query module's `import "server-only"` load outside Next.)
// Set before the database module is loaded, hence the dynamic imports below.
process.env.DATABASE_URL = "memory://";
export {};

const { getDb, closeDb } = await import("@/db/client");
const { seedDemo } = await import("@/lib/demo/commands");
const { houseModels, orderLines, orders, parcels } = await import("@/db/schema");
const { listQueueOrders, summarizeQueue } = await import("@/lib/fulfillment/queries/queue");
const { queueParamsSchema } = await import("@/lib/fulfillment/queue-params");

const ORDERS = 10_000;
const RUNS = 200;
const WARM_UP = 20;

// Seeded (mulberry32; common practice) so every run builds the same orders.
function random(seed: number) {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
const rand = random(7);
const pick = <T>(items: readonly T[]): T => items[Math.floor(rand() * items.length)]!;

// Most orders of a store a few years old are done; a few hundred wait at the desk.
const STATUS_MIX = [
  ...Array(70).fill("delivered"),
  ...Array(8).fill("picked_up"),
  ...Array(4).fill("paid"),
  ...Array(3).fill("packing"),
  ...Array(3).fill("packed"),
  ...Array(5).fill("shipped"),
  ...Array(2).fill("ready_for_pickup"),
  ...Array(3).fill("cancelled"),
  ...Array(2).fill("refunded"),
] as const;
const FIRST = ["Wren", "Alma", "Basil", "Cora", "Dmitri", "Edda", "Fenna", "Gus", "Hollis", "Ivo", "Juno", "Kit"];
const LAST = ["Alcott", "Thistlewood", "Quarrie", "Fenn", "Osgood", "Marsh", "Brannock", "Pell", "Rook", "Sallow"];

let t = performance.now();
const db = await getDb();
await seedDemo(db);
console.log(`open + migrate + demo seed: ${(performance.now() - t).toFixed(0)} ms`);

t = performance.now();
const models = await db.select().from(houseModels);
const now = Date.now();
const DAY = 86_400_000;
for (let start = 0; start < ORDERS; start += 1000) {
  const batch = Array.from({ length: Math.min(1000, ORDERS - start) }, (_, i) => {
    const status = pick(STATUS_MIX);
    const pickup = status === "picked_up" || status === "ready_for_pickup" || rand() < 0.1;
    const name = `${pick(FIRST)} ${pick(LAST)}`;
    const open = ["paid", "packing", "packed", "shipped", "ready_for_pickup"].includes(status);
    const paidAt = new Date(now - (open ? rand() * 14 : 14 + rand() * 1000) * DAY);
    return {
      email: `buyer${start + i}@example.org`,
      name,
      accessToken: `bench-${start + i}`,
      status: status === "picked_up" || status === "ready_for_pickup" ? status : pickup && status === "delivered" ? "picked_up" : status,
      method: pickup ? ("pickup" as const) : ("parcel" as const),
      shipTo: pickup ? null : { name, line1: "1 Bench Road", line2: "", city: pick(["Tempe", "Fernbrook", "Larkspur Falls"]), state: pick(["AZ", "WI", "OR"]), zip: "53703" },
      subtotalCents: 14900,
      shippingCents: 3800,
      taxCents: 0,
      giftCents: 0,
      totalCents: 18700,
      paidAt,
      createdAt: paidAt,
    };
  });
  const inserted = await db.insert(orders).values(batch).returning({ id: orders.id, status: orders.status, method: orders.method });
  await db.insert(orderLines).values(
    inserted.map((o) => {
      const model = pick(models);
      return { orderId: o.id, modelId: model.id, slug: model.slug, name: model.name, unitPriceCents: model.priceCents, quantity: 1 + Math.floor(rand() * 2), billableLb: 30 };
    }),
  );
  const boxed = inserted.filter((o) => o.method === "parcel" && ["packed", "shipped", "delivered"].includes(o.status));
  if (boxed.length > 0) {
    await db.insert(parcels).values(
      boxed.map((o) => ({
        orderId: o.id,
        description: "Bench box",
        lengthIn: 32,
        widthIn: 22,
        heightIn: 9,
        weightLb: 19,
        billableLb: 46,
        carrier: o.status === "packed" ? null : ("ups" as const),
        trackingNumber: o.status === "packed" ? null : "1Z5R89390357567127",
      })),
    );
  }
}
console.log(`insert ${ORDERS.toLocaleString("en-US")} orders with lines and boxes: ${(performance.now() - t).toFixed(0)} ms`);

const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))] ?? NaN;

async function measure(label: string, run: () => Promise<unknown>) {
  for (let i = 0; i < WARM_UP; i += 1) await run();
  const times: number[] = [];
  for (let i = 0; i < RUNS; i += 1) {
    const start = performance.now();
    await run();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  console.log(`${label}: p50 ${percentile(times, 50).toFixed(2)} ms, p95 ${percentile(times, 95).toFixed(2)} ms (${RUNS} runs)`);
}

const firstPage = queueParamsSchema.parse({});
const filtered = queueParamsSchema.parse({
  state: "all",
  method: "parcel",
  from: new Date(now - 400 * DAY).toISOString().slice(0, 10),
  to: new Date(now).toISOString().slice(0, 10),
  q: "ro",
  sort: "name",
  dir: "desc",
  page: "2",
  pageSize: "50",
});
const first = await listQueueOrders({ params: firstPage });
const other = await listQueueOrders({ params: filtered });
console.log(`first page: ${first.items.length} of ${first.total} open orders; filtered view: ${other.items.length} rows on page 2 of ${other.pageCount} (${other.total} match)`);

await measure("queue, first page (open orders, oldest paid first, 25 rows)", () => listQueueOrders({ params: firstPage }));
await measure("queue, filtered and sorted (parcel, 400 days, name search, by name desc, page 2 of 50)", () => listQueueOrders({ params: filtered }));
await measure("counts per state + oldest waiting", () => summarizeQueue());
await closeDb();
