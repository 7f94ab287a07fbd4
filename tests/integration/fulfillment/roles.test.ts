import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { seedDemo } from "@/lib/demo/commands";
import type { SessionUser } from "@/lib/auth/session";
import type { Role } from "@/lib/auth/roles";
import { GET as csvGet } from "@/app/api/fulfillment/orders.csv/route";
import { POST as cancelPost } from "@/app/api/fulfillment/orders/[id]/cancel/route";
import { POST as packPost } from "@/app/api/fulfillment/orders/[id]/pack/route";
import { POST as refundPost } from "@/app/api/fulfillment/orders/[id]/refund/route";
import { GET as detailGet } from "@/app/api/fulfillment/orders/[id]/route";
import { POST as shipPost } from "@/app/api/fulfillment/orders/[id]/boxes/[boxId]/ship/route";
import { POST as transitionPost } from "@/app/api/fulfillment/orders/[id]/transition/route";
import { GET as queueGet } from "@/app/api/fulfillment/orders/route";
import { packOrder, shipBox, transitionOrder } from "@/lib/fulfillment/commands/transitions";
import { resetDb } from "../../support/db";
import { startTestPayments } from "../../support/payments";
import { boxesOf, checkoutPaidOrder, demoUser, insertPaidOrder, orderById, UPS_NUMBER } from "./support";

// The role matrix of every fulfillment route: signed out → 401, buyer and workshop staff → 403,
// shipping volunteers → everything but money, admins → everything. Each allowed call is a real,
// successful action on an order prepared for it; each refused call leaves its order untouched.

// Our own stand-in port, so this file can run while another area's tests hold the default one.
vi.hoisted(() => {
  // The suite's payments port plus 30 (12341 by default), so a run on other ports moves it too.
  const base = new URL(process.env.STRIPE_API_BASE ?? "http://localhost:12311");
  process.env.STRIPE_API_BASE = `http://localhost:${Number(base.port) + 30}`;
  const g = globalThis as Record<string, unknown>;
  delete g.__roostwrightEnv;
  delete g.__roostwrightStripe;
});
const session = vi.hoisted(() => ({ user: null as SessionUser | null }));
vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => session.user }));

let payments: Awaited<ReturnType<typeof startTestPayments>>;
beforeAll(async () => {
  payments = await startTestPayments();
});
afterAll(async () => payments.close());

const json = (body: unknown): RequestInit => ({ method: "POST", body: JSON.stringify(body), headers: { "content-type": "application/json" } });
const req = (path: string, init?: RequestInit) => new Request(`http://localhost${path}`, init);
type Call = { name: string; money: boolean; run: () => Promise<Response>; orderId?: string };

async function packedOrder(admin: SessionUser, viaCheckout: boolean) {
  const order = viaCheckout
    ? await checkoutPaidOrder({ items: [{ slug: "twin-ridge", quantity: 1 }], method: "parcel", idle: () => payments.standIn.webhooksIdle() })
    : await insertPaidOrder();
  const actor = { id: admin.id, role: admin.role };
  await transitionOrder({ orderId: order.id, version: order.version, to: "packing", actor });
  const packed = await packOrder({ orderId: order.id, version: order.version + 1, boxes: [{ description: "Box", lengthIn: 27, widthIn: 18, heightIn: 7, weightLb: 12 }], actor });
  return packed;
}

/** Fresh orders in the right state for each route, so an allowed call can succeed for real. */
async function callsFor(): Promise<Call[]> {
  const admin = await demoUser("admin");
  const paid = await insertPaidOrder();
  const packing = await insertPaidOrder();
  await transitionOrder({ orderId: packing.id, version: 0, to: "packing", actor: admin });
  const packed = await packedOrder(admin, false);
  const [box] = await boxesOf(packed.id);
  const toCancel = await checkoutPaidOrder({ items: [{ slug: "twin-ridge", quantity: 1 }], method: "pickup", idle: () => payments.standIn.webhooksIdle() });
  const shipped = await packedOrder(admin, true);
  const [shippedBox] = await boxesOf(shipped.id);
  await shipBox({ orderId: shipped.id, parcelId: shippedBox!.id, version: shipped.version, carrier: "ups", service: "Ground", trackingNumber: UPS_NUMBER, actor: admin });
  const shippedNow = await orderById(shipped.id);
  const id = (orderId: string) => ({ params: Promise.resolve({ id: orderId }) });
  return [
    { name: "GET /api/fulfillment/orders", money: false, run: () => queueGet(req("/api/fulfillment/orders?state=all"), { params: Promise.resolve({}) }) },
    { name: "GET /api/fulfillment/orders?format=csv", money: false, run: () => queueGet(req("/api/fulfillment/orders?format=csv"), { params: Promise.resolve({}) }) },
    { name: "GET /api/fulfillment/orders.csv", money: false, run: () => csvGet(req("/api/fulfillment/orders.csv"), { params: Promise.resolve({}) }) },
    { name: "GET /api/fulfillment/orders/[id]", money: false, run: () => detailGet(req("/x"), id(paid.id)) },
    { name: "POST …/transition", money: false, orderId: paid.id, run: () => transitionPost(req("/x", json({ version: 0, to: "packing" })), id(paid.id)) },
    {
      name: "POST …/pack",
      money: false,
      orderId: packing.id,
      run: () => packPost(req("/x", json({ version: 1, boxes: [{ description: "Hollow Four", lengthIn: 32, widthIn: 22, heightIn: 8.5, weightLb: 19 }] })), id(packing.id)),
    },
    {
      name: "POST …/boxes/[boxId]/ship",
      money: false,
      orderId: packed.id,
      run: () =>
        shipPost(req("/x", json({ version: packed.version, carrier: "ups", service: "Ground", trackingNumber: UPS_NUMBER })), {
          params: Promise.resolve({ id: packed.id, boxId: box!.id }),
        }),
    },
    { name: "POST …/cancel", money: true, orderId: toCancel.id, run: () => cancelPost(req("/x", json({ version: toCancel.version, reason: "Buyer asked to cancel" })), id(toCancel.id)) },
    {
      name: "POST …/refund",
      money: true,
      orderId: shipped.id,
      run: () => refundPost(req("/x", json({ version: shippedNow.version, amount: "10.00", reason: "Box arrived dented" })), id(shipped.id)),
    },
  ];
}

const SESSIONS: (Role | null)[] = [null, "customer", "staff", "fulfillment", "admin"];

describe("every fulfillment route answers each role", () => {
  for (const role of SESSIONS) {
    it(`as ${role ?? "a signed-out visitor"}`, async () => {
      await seedDemo(await resetDb());
      const calls = await callsFor();
      session.user = role ? await demoUser(role) : null;
      for (const call of calls) {
        const before = call.orderId ? await orderById(call.orderId) : null;
        const res = await call.run();
        const allowed = role === "admin" || (role === "fulfillment" && !call.money);
        if (allowed) {
          expect(res.status, `${call.name} as ${role}`).toBe(200);
          if (before) expect((await orderById(call.orderId!)).version, call.name).toBeGreaterThan(before.version);
          continue;
        }
        expect(res.status, `${call.name} as ${role}`).toBe(role ? 403 : 401);
        expect((await res.json()).error.code).toBe(role ? "forbidden" : "unauthenticated");
        if (before) expect(await orderById(call.orderId!), call.name).toEqual(before);
      }
    });
  }
});
