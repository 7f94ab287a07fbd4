import { describe, expect, it } from "vitest";
import { messagesForArrival, messagesForChange } from "@/lib/orders/messages";
import { refusalError } from "@/lib/orders/refusals";
import { canTransition } from "@/lib/orders/state-machine";
import { buyerTimeline } from "@/lib/fulfillment/timeline";

// Common practice, no source: a shop mails the buyer when the parcel leaves, when it arrives and
// when a pickup is ready; the dedupe keys are the outbox contract (lib/mail/commands/outbox.ts).

const order = { id: "0b0c5a3e-0000-4000-8000-000000000001", number: 42, email: "wren@example.org", method: "parcel", giftCents: 0 };

describe("e-mails on arrival in a state", () => {
  it("queues the shipped, delivered (+ install guide) and ready-for-pickup messages, one key each", () => {
    expect(messagesForArrival({ order, to: "shipped" })).toEqual([
      { kind: "shipped", dedupeKey: `shipped:${order.id}`, to: order.email, subject: "Order RW-00042 is with the carrier", payload: { orderId: order.id } },
    ]);
    expect(messagesForArrival({ order, to: "delivered" }).map((m) => [m.kind, m.dedupeKey, m.payload])).toEqual([
      ["delivered", `delivered:${order.id}`, { orderId: order.id }],
      ["install-guide", `install-guide:delivered:${order.id}`, { orderId: order.id, occasion: "delivered" }],
    ]);
    expect(messagesForArrival({ order, to: "ready_for_pickup" }).map((m) => m.dedupeKey)).toEqual([`ready-for-pickup:${order.id}`]);
  });

  it("sends nothing for the bench steps", () => {
    for (const to of ["packing", "packed", "picked_up", "cancelled"] as const) expect(messagesForArrival({ order, to })).toEqual([]);
  });

  it("confirms a payment with the install guide, and the gift receipt when there is a gift", () => {
    expect(messagesForArrival({ order, to: "paid" }).map((m) => [m.kind, m.dedupeKey, m.subject])).toEqual([
      ["order-confirmation", `order-confirmation:${order.id}`, "Order RW-00042 is in the workshop queue"],
      ["install-guide", `install-guide:paid:${order.id}`, "Your install guide for order RW-00042"],
    ]);
    const giftOnly = { ...order, method: "none", giftCents: 2500 };
    // The center's name comes from its settings, never from the code.
    expect(messagesForArrival({ order: giftOnly, to: "paid", centerName: "Mesa Verde Bat Haven" }).map((m) => [m.kind, m.subject])).toEqual([
      ["order-confirmation", "Thank you for your gift (RW-00042)"],
      ["gift-receipt", "Your gift receipt from Mesa Verde Bat Haven (RW-00042)"],
    ]);
    expect(messagesForArrival({ order: giftOnly, to: "paid" }).map((m) => m.subject)[1]).toBe("Your gift receipt (RW-00042)");
  });

  it("mails only on a step forward: a correction back to a state sends nothing", () => {
    expect(messagesForChange({ order, to: "shipped", kind: "advance" })).toHaveLength(1);
    expect(messagesForChange({ order, to: "shipped", kind: "correction" })).toEqual([]);
    expect(messagesForChange({ order, to: "expired", kind: "expire" })).toEqual([]);
  });
});

describe("refusals as HTTP errors", () => {
  it("maps the wrong role to 403, a missing reason to 400 on its field, and a wrong step to 409", () => {
    const role = canTransition({ from: "paid", to: "cancelled", method: "parcel", role: "fulfillment" });
    const reason = canTransition({ from: "packed", to: "packing", method: "parcel", role: "admin" });
    const step = canTransition({ from: "paid", to: "shipped", method: "parcel", role: "admin" });
    const boxes = canTransition({ from: "packing", to: "packed", method: "parcel", role: "fulfillment", parcels: { total: 0, tracked: 0 } });
    if (role.ok || reason.ok || step.ok || boxes.ok) throw new Error("expected refusals");
    expect(refusalError(role).status).toBe(403);
    expect(refusalError(reason)).toMatchObject({ status: 400, fields: { reason: reason.message } });
    expect(refusalError(step).status).toBe(409);
    expect(boxes.code).toBe("no_parcels");
    expect(refusalError(boxes).status).toBe(409);
  });
});

describe("the buyer's timeline", () => {
  const at = (m: number) => new Date(Date.UTC(2026, 2, 1, 12, m));
  it("shows state changes in order, in our words, and hides repeated attempts", () => {
    const entries = buyerTimeline([
      { fromStatus: "paid", toStatus: "packing", createdAt: at(3) },
      { fromStatus: null, toStatus: "pending_payment", createdAt: at(0) },
      { fromStatus: "pending_payment", toStatus: "pending_payment", createdAt: at(1) },
      { fromStatus: "pending_payment", toStatus: "paid", createdAt: at(2) },
    ]);
    expect(entries.map((e) => e.title)).toEqual(["At the till", "In the workshop queue", "On the packing bench"]);
    expect(entries.at(-1)?.detail).toBe("A volunteer is checking and packing your house now.");
  });

  it("says plainly when the center stepped back, without the staff's reason", () => {
    const entries = buyerTimeline([
      { fromStatus: "packed", toStatus: "shipped", createdAt: at(1) },
      { fromStatus: "shipped", toStatus: "packed", createdAt: at(2) },
      { fromStatus: "pending_payment", toStatus: "expired", createdAt: at(3) },
    ]);
    expect(entries.map((e) => [e.title, e.corrected])).toEqual([
      ["With the carrier", false],
      ["Back to: Boxed and weighed", true],
      ["Hold ran out", false],
    ]);
  });
});
