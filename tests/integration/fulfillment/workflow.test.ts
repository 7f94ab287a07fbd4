import { beforeEach, describe, expect, it, vi } from "vitest";
import { seedDemo } from "@/lib/demo/commands";
import type { SessionUser } from "@/lib/auth/session";
import { POST as packPost } from "@/app/api/fulfillment/orders/[id]/pack/route";
import { POST as shipPost } from "@/app/api/fulfillment/orders/[id]/boxes/[boxId]/ship/route";
import { POST as transitionPost } from "@/app/api/fulfillment/orders/[id]/transition/route";
import { GET as detailGet } from "@/app/api/fulfillment/orders/[id]/route";
import { getBuyerParcels, getBuyerTimeline } from "@/lib/fulfillment/queries/buyer-view";
import { resetDb } from "../../support/db";
import { boxesOf, demoUser, eventsOf, insertPaidOrder, orderById, outboxFor, UPS_NUMBER, USPS_NUMBER } from "./support";

// The shipping desk end to end through its route handlers, with a mocked session.
const session = vi.hoisted(() => ({ user: null as SessionUser | null }));
vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => session.user }));

const json = (body: unknown) => ({ method: "POST", body: JSON.stringify(body), headers: { "content-type": "application/json" } });
const at = (path: string, init?: RequestInit) => new Request(`http://localhost${path}`, init);

async function step(orderId: string, version: number, to: string, reason?: string) {
  return transitionPost(at(`/api/fulfillment/orders/${orderId}/transition`, json({ version, to, reason })), { params: Promise.resolve({ id: orderId }) });
}

async function ship(orderId: string, boxId: string, body: Record<string, unknown>) {
  return shipPost(at(`/api/fulfillment/orders/${orderId}/boxes/${boxId}/ship`, json(body)), { params: Promise.resolve({ id: orderId, boxId }) });
}

beforeEach(async () => {
  await seedDemo(await resetDb());
  session.user = await demoUser("fulfillment");
});

describe("a two-house parcel order", () => {
  it("is packed into two boxes, shipped box by box, delivered, and mailed at each step", async () => {
    const order = await insertPaidOrder({ items: [{ slug: "hollow-four", quantity: 1 }, { slug: "twin-ridge", quantity: 1 }] });
    expect((await step(order.id, 0, "packing")).status).toBe(200);

    // Billable weights come from the server: Hollow Four 32×22×8.5 → 32×22×9/139 = 45.6 → 46 lb;
    // Twin Ridge 27×18×7 = 3402/139 = 24.5 → 25 lb (PRODUCT.md §5 rule, worked by hand).
    const pack = await packPost(
      at(`/api/fulfillment/orders/${order.id}/pack`, json({
        version: 1,
        boxes: [
          { description: "Hollow Four", lengthIn: 32, widthIn: 22, heightIn: 8.5, weightLb: 19, billableLb: 1 },
          { description: "Twin Ridge", lengthIn: 27, widthIn: 18, heightIn: 7, weightLb: 12 },
        ],
      })),
      { params: Promise.resolve({ id: order.id }) },
    );
    expect(pack.status).toBe(200);
    expect(await pack.json()).toMatchObject({ status: "packed", version: 2 });
    const boxes = await boxesOf(order.id);
    expect(boxes.map((b) => [b.description, b.billableLb])).toEqual([["Hollow Four", 46], ["Twin Ridge", 25]]);

    // A mistyped check digit is refused with the reason, and nothing changes.
    const typo = await ship(order.id, boxes[0]!.id, { version: 2, carrier: "ups", service: "Ground", trackingNumber: "1Z5R89390357567128" });
    expect(typo.status).toBe(400);
    expect((await typo.json()).error.fields.trackingNumber).toMatch(/check for a typo/);

    const first = await ship(order.id, boxes[0]!.id, { version: 2, carrier: "ups", service: "Ground", trackingNumber: "1z 5r8 939 0357567127" });
    expect(await first.json()).toMatchObject({ status: "packed", version: 3, orderShipped: false, box: { trackingNumber: UPS_NUMBER } });
    expect(await outboxFor(order.id)).toEqual([]);

    // The same number on a second box is a slip of the scanner.
    const twin = await ship(order.id, boxes[1]!.id, { version: 3, carrier: "ups", service: "Ground", trackingNumber: UPS_NUMBER });
    expect(twin.status).toBe(400);

    const second = await ship(order.id, boxes[1]!.id, { version: 3, carrier: "usps", service: "Ground Advantage", trackingNumber: USPS_NUMBER });
    expect(await second.json()).toMatchObject({ status: "shipped", version: 4, orderShipped: true });
    expect((await outboxFor(order.id)).map((m) => [m.kind, m.dedupeKey])).toEqual([["shipped", `shipped:${order.id}`]]);

    // The buyer sees both boxes with links to the carriers' pages.
    const buyer = await getBuyerParcels({ orderId: order.id });
    expect(buyer?.boxes.map((b) => b.trackingUrl)).toEqual([
      `https://www.ups.com/track?tracknum=${UPS_NUMBER}`,
      `https://tools.usps.com/go/TrackConfirmAction?tLabels=${USPS_NUMBER}`,
    ]);

    expect((await step(order.id, 4, "delivered")).status).toBe(200);
    const mail = await outboxFor(order.id);
    expect(mail.map((m) => m.dedupeKey).sort()).toEqual(
      [`delivered:${order.id}`, `install-guide:delivered:${order.id}`, `shipped:${order.id}`].sort(),
    );
    expect(mail.find((m) => m.kind === "install-guide")?.payload).toEqual({ orderId: order.id, occasion: "delivered" });
    expect(mail.every((m) => m.toAddress === order.email)).toBe(true);

    const events = await eventsOf(order.id);
    expect(events.map((e) => `${e.fromStatus}>${e.toStatus}`)).toEqual([
      "pending_payment>paid",
      "paid>packing",
      "packing>packed",
      "packed>packed",
      "packed>shipped",
      "shipped>delivered",
    ]);
    expect(events.slice(1).every((e) => e.actorId === session.user!.id)).toBe(true);
    expect(events[3]!.note).toBe(`Box 1 of 2 handed to UPS (${UPS_NUMBER})`);

    const timeline = await getBuyerTimeline({ orderId: order.id });
    expect(timeline?.entries.map((e) => e.title)).toEqual(["In the workshop queue", "On the packing bench", "Boxed and weighed", "With the carrier", "Arrived"]);
  });

  it("refuses to skip ahead, and to go back without being an admin with a reason", async () => {
    const order = await insertPaidOrder();
    const skip = await step(order.id, 0, "shipped");
    expect(skip.status).toBe(409);
    expect((await skip.json()).error.message).toMatch(/can't go to "With the carrier"/);
    await step(order.id, 0, "packing");
    const back = await step(order.id, 1, "paid", "Picked the wrong order");
    expect(back.status).toBe(403);
    session.user = await demoUser("admin");
    const noReason = await step(order.id, 1, "paid");
    expect(noReason.status).toBe(400);
    expect((await noReason.json()).error.fields.reason).toMatch(/Say why/);
    const corrected = await step(order.id, 1, "paid", "Picked the wrong order");
    expect(corrected.status).toBe(200);
    expect((await eventsOf(order.id)).at(-1)).toMatchObject({ fromStatus: "packing", toStatus: "paid", note: "Correction: Picked the wrong order" });
    // Going back never mails the buyer.
    expect(await outboxFor(order.id)).toEqual([]);
  });

  it("will not mark an order packed with no boxes, nor shipped before every box has tracking", async () => {
    const order = await insertPaidOrder({ items: [{ slug: "hollow-four", quantity: 2 }] });
    await step(order.id, 0, "packing");
    const bare = await step(order.id, 1, "packed");
    expect(bare.status).toBe(409);
    expect((await bare.json()).error.message).toMatch(/Record at least one box/);
    const empty = await packPost(at("/x", json({ version: 1, boxes: [] })), { params: Promise.resolve({ id: order.id }) });
    expect(empty.status).toBe(400);
    await packPost(
      at("/x", json({ version: 1, boxes: [1, 2].map((n) => ({ description: `Hollow Four (${n} of 2)`, lengthIn: 32, widthIn: 22, heightIn: 8.5, weightLb: 19 })) })),
      { params: Promise.resolve({ id: order.id }) },
    );
    const early = await step(order.id, 2, "shipped");
    expect(early.status).toBe(409);
    expect((await early.json()).error.message).toBe("Add a tracking number to every box first (0 of 2 done).");
  });
});

describe("a pickup order", () => {
  it("goes paid → packing → ready (mailed) → picked up, with no boxes", async () => {
    const order = await insertPaidOrder({ method: "pickup", items: [{ slug: "twin-ridge", quantity: 1 }] });
    await step(order.id, 0, "packing");
    const parcelOnly = await step(order.id, 1, "packed");
    expect(parcelOnly.status).toBe(409);
    expect((await step(order.id, 1, "ready_for_pickup")).status).toBe(200);
    expect((await outboxFor(order.id)).map((m) => m.dedupeKey)).toEqual([`ready-for-pickup:${order.id}`]);
    expect((await step(order.id, 2, "picked_up")).status).toBe(200);
    expect((await orderById(order.id)).status).toBe("picked_up");
    const buyer = await getBuyerParcels({ orderId: order.id });
    expect(buyer).toMatchObject({ method: "pickup", boxes: [], pickupAddress: { name: "Cedar Hollow Wildlife Rescue" } });
  });
});

describe("orders that are not the desk's", () => {
  it("answers 404 for a gift-only order, an unpaid one and a malformed id", async () => {
    const gift = await insertPaidOrder({ method: "none", items: [] });
    const unpaid = await insertPaidOrder({ status: "pending_payment" });
    for (const id of [gift.id, unpaid.id, "not-a-uuid"]) {
      expect((await detailGet(at(`/api/fulfillment/orders/${id}`), { params: Promise.resolve({ id }) })).status).toBe(404);
      expect((await step(id, 0, "packing")).status).toBe(404);
    }
  });
});
