import { ROLE_LABELS, type Role } from "@/lib/auth/roles";
import { isOrderStatus, ORDER_STATUS_LABELS, PAID_STATES, type OrderStatus, type PaidState } from "./statuses";

// The order state machine. Common practice, no source: the usual order lifecycle of a small
// shop, fitted to PRODUCT.md's roles (fulfillment packs and ships, admin cancels and refunds).
// Checkout: pending_payment → paid, or → expired when the 30-minute hold runs out. Parcel:
// paid → packing → packed → shipped → delivered. Pickup: paid → packing → ready_for_pickup →
// picked_up. No skipping and no going back, except an admin correction, with a reason, to the
// state just before. Every status change goes through changeOrderStatus (lib/orders/commands.ts),
// which asks canTransition first.

/** Who moves an order: a signed-in role, or "system" (the payment webhook, a carrier update). */
export type TransitionActor = Role | "system";
export type TransitionKind = "advance" | "expire" | "cancel" | "refund" | "correction";
/** How the order leaves the center; "none" is a gift-only order, which is paid and nothing more. */
export type OrderMethod = "parcel" | "pickup" | "none";

export type Transition = {
  from: OrderStatus;
  to: OrderStatus;
  methods: readonly OrderMethod[];
  actors: readonly TransitionActor[];
  kind: TransitionKind;
};

const ANY: readonly OrderMethod[] = ["parcel", "pickup", "none"];
const BOTH: readonly OrderMethod[] = ["parcel", "pickup"];
const PARCEL: readonly OrderMethod[] = ["parcel"];
const PICKUP: readonly OrderMethod[] = ["pickup"];
const WORKERS: readonly TransitionActor[] = ["fulfillment", "admin"];
const ADMIN: readonly TransitionActor[] = ["admin"];

function edge(
  from: OrderStatus,
  to: OrderStatus,
  methods: readonly OrderMethod[],
  actors: readonly TransitionActor[],
  kind: TransitionKind,
): Transition {
  return { from, to, methods, actors, kind };
}

/** Every allowed transition. Anything not listed here is refused. */
export const FULFILLMENT_TRANSITIONS: readonly Transition[] = [
  // Only the payment processor's confirmation marks an order paid, and only while its checkout is
  // open: a payment that arrives after the hold ran out is refunded, never taken.
  edge("pending_payment", "paid", ANY, ["system"], "advance"),
  edge("pending_payment", "expired", ANY, ["system"], "expire"),
  edge("paid", "packing", BOTH, WORKERS, "advance"),
  edge("packing", "packed", PARCEL, WORKERS, "advance"),
  edge("packed", "shipped", PARCEL, WORKERS, "advance"),
  // A carrier update may report delivery as well as a volunteer.
  edge("shipped", "delivered", PARCEL, [...WORKERS, "system"], "advance"),
  edge("packing", "ready_for_pickup", PICKUP, WORKERS, "advance"),
  edge("ready_for_pickup", "picked_up", PICKUP, WORKERS, "advance"),

  // Cancel only before anything has left the building; the system may drop an unpaid checkout.
  edge("pending_payment", "cancelled", ANY, [...ADMIN, "system"], "cancel"),
  edge("paid", "cancelled", BOTH, ADMIN, "cancel"),
  edge("packing", "cancelled", BOTH, ADMIN, "cancel"),
  edge("packed", "cancelled", PARCEL, ADMIN, "cancel"),
  edge("ready_for_pickup", "cancelled", PICKUP, ADMIN, "cancel"),

  // Refunds: a cancelled order whose payment was taken (the caller checks the payment), a lost
  // parcel, or a house sent back. A refund is final.
  edge("cancelled", "refunded", BOTH, ADMIN, "refund"),
  edge("shipped", "refunded", PARCEL, ADMIN, "refund"),
  edge("delivered", "refunded", PARCEL, ADMIN, "refund"),
  edge("picked_up", "refunded", PICKUP, ADMIN, "refund"),

  // Admin corrections, one step back, always with a reason. Payment is the processor's fact, so
  // paid never goes back to pending_payment.
  edge("packing", "paid", BOTH, ADMIN, "correction"),
  edge("packed", "packing", PARCEL, ADMIN, "correction"),
  edge("shipped", "packed", PARCEL, ADMIN, "correction"),
  edge("delivered", "shipped", PARCEL, ADMIN, "correction"),
  edge("ready_for_pickup", "packing", PICKUP, ADMIN, "correction"),
  edge("picked_up", "ready_for_pickup", PICKUP, ADMIN, "correction"),
];

export type TransitionRefusal =
  | "unknown_state"
  | "same_state"
  | "final_state"
  | "wrong_method"
  | "not_allowed"
  | "role_not_allowed"
  | "reason_required"
  | "no_parcels"
  | "parcels_not_shipped";

export type TransitionCheck =
  { ok: true; kind: TransitionKind } | { ok: false; code: TransitionRefusal; message: string };

export type TransitionRequest = {
  from: OrderStatus;
  to: OrderStatus;
  method: OrderMethod;
  role: TransitionActor;
  /** Required for an admin correction. */
  reason?: string;
  /**
   * Required to move to packed (at least one box recorded) and to shipped (the order counts as
   * shipped only once every box has tracking).
   */
  parcels?: { total: number; tracked: number };
};

function label(state: OrderStatus): string {
  return `"${ORDER_STATUS_LABELS[state].label}"`;
}

function refuse(code: TransitionRefusal, message: string): TransitionCheck {
  return { ok: false, code, message };
}

/** The transitions open from a state for one order and actor: the buttons a screen should offer. */
export function allowedTransitions({
  from,
  method,
  role,
}: {
  from: OrderStatus;
  method: OrderMethod;
  role: TransitionActor;
}): Transition[] {
  return FULFILLMENT_TRANSITIONS.filter(
    (t) => t.from === from && t.methods.includes(method) && t.actors.includes(role),
  );
}

const METHOD_WORDS: Record<OrderMethod, string> = {
  parcel: "parcel delivery",
  pickup: "local pickup",
  none: "gift-only",
};

/** Whether `role` may move an order from `from` to `to`; a refusal says why in words an operator can act on. */
export function canTransition(request: TransitionRequest): TransitionCheck {
  const { from, to, method, role } = request;
  if (!isOrderStatus(from) || !isOrderStatus(to))
    return refuse("unknown_state", "That is not an order state.");
  if (from === to) return refuse("same_state", `The order is already ${label(to)}.`);
  const transition = FULFILLMENT_TRANSITIONS.find(
    (t) => t.from === from && t.to === to && t.methods.includes(method),
  );
  if (!transition) {
    if (FULFILLMENT_TRANSITIONS.some((t) => t.from === from && t.to === to)) {
      const other = FULFILLMENT_TRANSITIONS.find((t) => t.from === from && t.to === to)!
        .methods.map((m) => METHOD_WORDS[m])
        .join(" or ");
      return refuse(
        "wrong_method",
        `Only ${other} orders can go from ${label(from)} to ${label(to)}.`,
      );
    }
    const next = FULFILLMENT_TRANSITIONS.filter(
      (t) => t.from === from && t.methods.includes(method),
    );
    if (next.length === 0)
      return refuse("final_state", `A ${label(from)} order can't change any more.`);
    const options = [...new Set(next.map((t) => label(t.to)))].join(", ");
    return refuse(
      "not_allowed",
      `A ${label(from)} order can't go to ${label(to)}; it can go to ${options}.`,
    );
  }
  if (!transition.actors.includes(role)) {
    const people = transition.actors.flatMap((actor) =>
      actor === "system" ? [] : [ROLE_LABELS[actor]],
    );
    const article = /^[aeiou]/i.test(people[0] ?? "") ? "an" : "a";
    const who = people.length > 0 ? `${article} ${people.join(" or ")}` : "the payment system";
    return refuse(
      "role_not_allowed",
      `Only ${who} can move an order from ${label(from)} to ${label(to)}.`,
    );
  }
  if (transition.kind === "correction" && !request.reason?.trim()) {
    return refuse(
      "reason_required",
      "Say why this order is going back a step; the reason is kept with the order.",
    );
  }
  // Common practice, no source: a parcel order is boxed and weighed only when its boxes are on
  // record, so the shipping step has something to put tracking numbers on.
  if (to === "packed" && transition.kind === "advance" && (request.parcels?.total ?? 0) < 1) {
    return refuse("no_parcels", "Record at least one box, with its size and weight, first.");
  }
  if (to === "shipped" && transition.kind === "advance") {
    const { total = 0, tracked = 0 } = request.parcels ?? {};
    if (total < 1 || tracked < total) {
      return refuse(
        "parcels_not_shipped",
        `Add a tracking number to every box first (${tracked} of ${total} done).`,
      );
    }
  }
  return { ok: true, kind: transition.kind };
}

/** An admin's step back (the buyer's timeline says so plainly). */
export function isCorrection(from: string | null, to: string): boolean {
  return FULFILLMENT_TRANSITIONS.some((t) => t.from === from && t.to === to && t.kind === "correction");
}

/**
 * States where a volunteer still has a next step: the shipping desk's "open" view. Derived from
 * the table, so a new step shows up in the queue without a second list.
 */
export const OPEN_STATES: readonly PaidState[] = PAID_STATES.filter((state) =>
  FULFILLMENT_TRANSITIONS.some((t) => t.from === state && t.kind === "advance" && t.actors.includes("fulfillment")),
);
