import { ROLE_LABELS, type Role } from "@/lib/auth/roles";
import type { ShippingMethod } from "@/lib/checkout/pricing";
import {
  FULFILLMENT_STATE_LABELS,
  isFulfillmentState,
  type FulfillmentState,
} from "./state-labels";

export { FULFILLMENT_STATES, FULFILLMENT_STATE_LABELS, isFulfillmentState } from "./state-labels";
export type { FulfillmentState } from "./state-labels";

// The order fulfillment state machine. Common practice, no source: the usual order lifecycle of
// a small shop, fitted to PRODUCT.md's roles (fulfillment packs and ships, admin cancels and
// refunds). Parcel: paid → packing → packed → shipped → delivered. Pickup: paid → packing →
// ready_for_pickup → picked_up. No skipping and no going back, except an admin correction, with a
// reason, to the state just before.

/** Who moves an order: a signed-in role, or "system" (the payment webhook, a carrier update). */
export type TransitionActor = Role | "system";
export type TransitionKind = "advance" | "cancel" | "refund" | "correction";

export type Transition = {
  from: FulfillmentState;
  to: FulfillmentState;
  methods: readonly ShippingMethod[];
  actors: readonly TransitionActor[];
  kind: TransitionKind;
};

const BOTH: readonly ShippingMethod[] = ["parcel", "pickup"];
const PARCEL: readonly ShippingMethod[] = ["parcel"];
const PICKUP: readonly ShippingMethod[] = ["pickup"];
const WORKERS: readonly TransitionActor[] = ["fulfillment", "admin"];
const ADMIN: readonly TransitionActor[] = ["admin"];

function edge(
  from: FulfillmentState,
  to: FulfillmentState,
  methods: readonly ShippingMethod[],
  actors: readonly TransitionActor[],
  kind: TransitionKind,
): Transition {
  return { from, to, methods, actors, kind };
}

/** Every allowed transition. Anything not listed here is refused. */
export const FULFILLMENT_TRANSITIONS: readonly Transition[] = [
  // Only the payment processor's confirmation marks an order paid.
  edge("pending_payment", "paid", BOTH, ["system"], "advance"),
  edge("paid", "packing", BOTH, WORKERS, "advance"),
  edge("packing", "packed", PARCEL, WORKERS, "advance"),
  edge("packed", "shipped", PARCEL, WORKERS, "advance"),
  // A carrier update may report delivery as well as a volunteer.
  edge("shipped", "delivered", PARCEL, [...WORKERS, "system"], "advance"),
  edge("packing", "ready_for_pickup", PICKUP, WORKERS, "advance"),
  edge("ready_for_pickup", "picked_up", PICKUP, WORKERS, "advance"),

  // Cancel only before anything has left the building; the system may drop an unpaid checkout.
  edge("pending_payment", "cancelled", BOTH, [...ADMIN, "system"], "cancel"),
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
  from: FulfillmentState;
  to: FulfillmentState;
  method: ShippingMethod;
  role: TransitionActor;
  /** Required for an admin correction. */
  reason?: string;
  /**
   * Required to move to packed (at least one box recorded) and to shipped (the order counts as
   * shipped only once every box has tracking).
   */
  parcels?: { total: number; tracked: number };
};

function label(state: FulfillmentState): string {
  return `"${FULFILLMENT_STATE_LABELS[state].label}"`;
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
  from: FulfillmentState;
  method: ShippingMethod;
  role: TransitionActor;
}): Transition[] {
  return FULFILLMENT_TRANSITIONS.filter(
    (t) => t.from === from && t.methods.includes(method) && t.actors.includes(role),
  );
}

/** Whether `role` may move an order from `from` to `to`; a refusal says why in words an operator can act on. */
export function canTransition(request: TransitionRequest): TransitionCheck {
  const { from, to, method, role } = request;
  if (!isFulfillmentState(from) || !isFulfillmentState(to))
    return refuse("unknown_state", "That is not an order state.");
  if (from === to) return refuse("same_state", `The order is already ${label(to)}.`);
  const transition = FULFILLMENT_TRANSITIONS.find(
    (t) => t.from === from && t.to === to && t.methods.includes(method),
  );
  if (!transition) {
    if (FULFILLMENT_TRANSITIONS.some((t) => t.from === from && t.to === to)) {
      const other = method === "parcel" ? "local pickup" : "parcel delivery";
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
