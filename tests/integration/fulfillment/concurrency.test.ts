import { beforeEach, describe, expect, it, vi } from "vitest";
import { seedDemo } from "@/lib/demo/commands";
import type { SessionUser } from "@/lib/auth/session";
import { POST as shipPost } from "@/app/api/fulfillment/orders/[id]/boxes/[boxId]/ship/route";
import { POST as transitionPost } from "@/app/api/fulfillment/orders/[id]/transition/route";
import { packOrder } from "@/lib/fulfillment/commands/transitions";
import { resetDb } from "../../support/db";
import { boxesOf, demoUser, eventsOf, insertPaidOrder, orderById, outboxFor, UPS_NUMBER, USPS_NUMBER } from "./support";

// Two volunteers on one order at the same moment: exactly one wins, the other gets a 409 that
// says what happened.
const session = vi.hoisted(() => ({ user: null as SessionUser | null }));
vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => session.user }));

const json = (body: unknown) => ({ method: "POST", body: JSON.stringify(body), headers: { "content-type": "application/json" } });

beforeEach(async () => {
  await seedDemo(await resetDb());
  session.user = await demoUser("fulfillment");
});

async function packedOneBox() {
  const order = await insertPaidOrder();
  const actor = session.user!;
  await transitionPost(new Request("http://localhost/x", json({ version: 0, to: "packing" })), { params: Promise.resolve({ id: order.id }) });
  await packOrder({ orderId: order.id, version: 1, boxes: [{ description: "Hollow Four", lengthIn: 32, widthIn: 22, heightIn: 8.5, weightLb: 19 }], actor });
  const [box] = await boxesOf(order.id);
  return { order, box: box! };
}

describe("two ship actions at once", () => {
  for (let run = 1; run <= 5; run += 1) {
    it(`one succeeds and one gets a clear conflict (run ${run})`, async () => {
      const { order, box } = await packedOneBox();
      const send = (carrier: string, trackingNumber: string) =>
        shipPost(new Request("http://localhost/x", json({ version: 2, carrier, service: "Ground", trackingNumber })), {
          params: Promise.resolve({ id: order.id, boxId: box.id }),
        });
      const responses = await Promise.all([send("ups", UPS_NUMBER), send("usps", USPS_NUMBER)]);
      const statuses = responses.map((r) => r.status).sort();
      expect(statuses).toEqual([200, 409]);
      const loser = responses.find((r) => r.status === 409)!;
      const body = await loser.json();
      expect(body.error.code).toBe("conflict");
      expect(body.error.message).toMatch(/Someone else updated this order while you had it open; it is now "With the carrier"/);
      const after = await orderById(order.id);
      expect(after).toMatchObject({ status: "shipped", version: 3 });
      // Exactly one shipment recorded, and one e-mail.
      expect((await eventsOf(order.id)).filter((e) => e.toStatus === "shipped")).toHaveLength(1);
      expect(await outboxFor(order.id)).toHaveLength(1);
      const [saved] = await boxesOf(order.id);
      const winner = await responses.find((r) => r.status === 200)!.json();
      expect(saved!.trackingNumber).toBe(winner.box.trackingNumber);
    });
  }

  it("a volunteer acting on a screen opened before a colleague's change is refused too", async () => {
    const order = await insertPaidOrder();
    const start = (version: number) =>
      transitionPost(new Request("http://localhost/x", json({ version, to: "packing" })), { params: Promise.resolve({ id: order.id }) });
    expect((await start(0)).status).toBe(200);
    const late = await start(0);
    expect(late.status).toBe(409);
    expect((await late.json()).error.message).toMatch(/it is now "On the packing bench"/);
  });
});
