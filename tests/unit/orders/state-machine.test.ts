import { describe, expect, it } from "vitest";
import {
  allowedTransitions,
  canTransition,
  FULFILLMENT_TRANSITIONS,
  isCorrection,
  OPEN_STATES,
  type OrderMethod,
  type TransitionActor,
} from "@/lib/orders/state-machine";
import { ORDER_STATUS_LABELS, ORDER_STATUSES, type OrderStatus } from "@/lib/orders/statuses";

// Common practice, no source: the order lifecycle in the brief. The matrix below is the spec,
// written out by hand; the code's table must equal it and canTransition must follow it for every
// (from, to, method, actor) combination: 11 × 11 × 3 × 5 = 1,815 cases.

const METHODS: OrderMethod[] = ["parcel", "pickup", "none"];
const METHOD_CODES: Record<OrderMethod, string> = { parcel: "P", pickup: "K", none: "N" };
const ACTORS: TransitionActor[] = ["system", "customer", "staff", "fulfillment", "admin"];

// from → to | methods (P parcel, K pickup, N gift only) | actors (S system, F fulfillment, A admin) | kind
const SPEC = `
pending_payment  paid              PKN S    advance
pending_payment  expired           PKN S    expire
paid             packing           PK  FA   advance
packing          packed            P   FA   advance
packed           shipped           P   FA   advance
shipped          delivered         P   FAS  advance
packing          ready_for_pickup  K   FA   advance
ready_for_pickup picked_up         K   FA   advance
pending_payment  cancelled         PKN AS   cancel
paid             cancelled         PK  A    cancel
packing          cancelled         PK  A    cancel
packed           cancelled         P   A    cancel
ready_for_pickup cancelled         K   A    cancel
cancelled        refunded          PK  A    refund
shipped          refunded          P   A    refund
delivered        refunded          P   A    refund
picked_up        refunded          K   A    refund
packing          paid              PK  A    correction
packed           packing           P   A    correction
shipped          packed            P   A    correction
delivered        shipped           P   A    correction
ready_for_pickup packing           K   A    correction
picked_up        ready_for_pickup  K   A    correction
`;

type SpecRow = {
  from: string;
  to: string;
  methods: OrderMethod[];
  actors: TransitionActor[];
  kind: string;
};
const ACTOR_CODES: Record<string, TransitionActor> = { S: "system", F: "fulfillment", A: "admin" };

const spec: SpecRow[] = SPEC.trim()
  .split("\n")
  .map((line) => {
    const [from = "", to = "", methods = "", actors = "", kind = ""] = line.trim().split(/\s+/);
    return {
      from,
      to,
      methods: METHODS.filter((method) => methods.includes(METHOD_CODES[method])),
      actors: [...actors].map((code) => ACTOR_CODES[code] as TransitionActor),
      kind,
    };
  });

function specFor(
  from: OrderStatus,
  to: OrderStatus,
  method: OrderMethod,
): SpecRow | undefined {
  return spec.find((row) => row.from === from && row.to === to && row.methods.includes(method));
}

const sortKey = (row: { from: string; to: string }) => `${row.from}>${row.to}`;

describe("the transition table", () => {
  it("is exactly the hand-written spec", () => {
    const table = FULFILLMENT_TRANSITIONS.map((t) => ({
      from: t.from,
      to: t.to,
      methods: [...t.methods].sort(),
      actors: [...t.actors].sort(),
      kind: t.kind,
    })).sort((a, b) => sortKey(a).localeCompare(sortKey(b)));
    const expected = spec
      .map((row) => ({ ...row, methods: [...row.methods].sort(), actors: [...row.actors].sort() }))
      .sort((a, b) => sortKey(a).localeCompare(sortKey(b)));
    expect(table).toEqual(expected);
    expect(FULFILLMENT_TRANSITIONS).toHaveLength(23);
  });

  it("gives every state its own label and buyer note", () => {
    const labels = ORDER_STATUSES.map((state) => ORDER_STATUS_LABELS[state].label);
    expect(new Set(labels).size).toBe(ORDER_STATUSES.length);
    for (const state of ORDER_STATUSES)
      expect(ORDER_STATUS_LABELS[state].buyerNote.length).toBeGreaterThan(10);
  });

  it("derives the desk's open states and the timeline's step backs from the table", () => {
    expect(OPEN_STATES).toEqual(["paid", "packing", "packed", "shipped", "ready_for_pickup"]);
    expect(isCorrection("shipped", "packed")).toBe(true);
    expect(isCorrection("packed", "shipped")).toBe(false);
    expect(isCorrection(null, "pending_payment")).toBe(false);
  });
});

describe("canTransition over the full matrix", () => {
  const cases = ORDER_STATUSES.flatMap((from) =>
    ORDER_STATUSES.flatMap((to) =>
      METHODS.flatMap((method) => ACTORS.map((role) => ({ from, to, method, role }))),
    ),
  );

  it("covers 1,815 combinations, 45 of them allowed", () => {
    expect(cases).toHaveLength(1_815);
    const allowed = cases.filter(({ from, to, method, role }) =>
      specFor(from, to, method)?.actors.includes(role),
    );
    expect(allowed).toHaveLength(45);
  });

  it.each(cases)("$from → $to ($method, $role)", ({ from, to, method, role }) => {
    const result = canTransition({
      from,
      to,
      method,
      role,
      reason: "Scanned the wrong order.",
      parcels: { total: 1, tracked: 1 },
    });
    const row = specFor(from, to, method);
    if (row?.actors.includes(role)) {
      expect(result).toEqual({ ok: true, kind: row.kind });
      return;
    }
    expect(result.ok).toBe(false);
    if (result.ok) return;
    const expectedCode =
      from === to
        ? "same_state"
        : row
          ? "role_not_allowed"
          : spec.some((r) => r.from === from && r.to === to)
            ? "wrong_method"
            : spec.some((r) => r.from === from && r.methods.includes(method))
              ? "not_allowed"
              : "final_state";
    expect(result.code).toBe(expectedCode);
    expect(result.message.length).toBeGreaterThan(15);
  });
});

describe("canTransition: guards and messages", () => {
  it("walks the parcel path and the pickup path one step at a time", () => {
    const parcel: OrderStatus[] = [
      "pending_payment",
      "paid",
      "packing",
      "packed",
      "shipped",
      "delivered",
    ];
    const pickup: OrderStatus[] = [
      "pending_payment",
      "paid",
      "packing",
      "ready_for_pickup",
      "picked_up",
    ];
    for (const [method, path] of [
      ["parcel", parcel],
      ["pickup", pickup],
    ] as const) {
      path.slice(1).forEach((to, index) => {
        const from = path[index] as OrderStatus;
        const role = from === "pending_payment" ? "system" : "fulfillment";
        expect(
          canTransition({ from, to, method, role, parcels: { total: 2, tracked: 2 } }),
        ).toEqual({ ok: true, kind: "advance" });
      });
    }
  });

  it("refuses skipping and going back without being a correction", () => {
    expect(
      canTransition({ from: "paid", to: "shipped", method: "parcel", role: "admin" }),
    ).toMatchObject({ ok: false, code: "not_allowed" });
    expect(
      canTransition({
        from: "delivered",
        to: "packing",
        method: "parcel",
        role: "admin",
        reason: "oops",
      }),
    ).toMatchObject({
      ok: false,
      code: "not_allowed",
    });
  });

  it("needs a reason, not blank, for an admin correction", () => {
    const back = { from: "packed", to: "packing", method: "parcel", role: "admin" } as const;
    expect(canTransition(back)).toMatchObject({ ok: false, code: "reason_required" });
    expect(canTransition({ ...back, reason: "   " })).toMatchObject({
      ok: false,
      code: "reason_required",
    });
    expect(canTransition({ ...back, reason: "Box was the wrong size." })).toEqual({
      ok: true,
      kind: "correction",
    });
  });

  it("counts an order shipped only when every parcel has tracking", () => {
    const ship = { from: "packed", to: "shipped", method: "parcel", role: "fulfillment" } as const;
    expect(canTransition(ship)).toMatchObject({ ok: false, code: "parcels_not_shipped" });
    expect(canTransition({ ...ship, parcels: { total: 2, tracked: 1 } })).toMatchObject({
      ok: false,
      code: "parcels_not_shipped",
      message: "Add a tracking number to every box first (1 of 2 done).",
    });
    expect(canTransition({ ...ship, parcels: { total: 2, tracked: 2 } })).toEqual({
      ok: true,
      kind: "advance",
    });
    // Correcting delivered back to shipped does not re-check parcels.
    expect(
      canTransition({
        from: "delivered",
        to: "shipped",
        method: "parcel",
        role: "admin",
        reason: "Carrier scan was wrong.",
      }),
    ).toEqual({
      ok: true,
      kind: "correction",
    });
  });

  it("marks a parcel order packed only with at least one box on record", () => {
    const pack = { from: "packing", to: "packed", method: "parcel", role: "fulfillment" } as const;
    expect(canTransition(pack)).toMatchObject({ ok: false, code: "no_parcels" });
    expect(canTransition({ ...pack, parcels: { total: 0, tracked: 0 } })).toMatchObject({
      ok: false,
      code: "no_parcels",
      message: "Record at least one box, with its size and weight, first.",
    });
    expect(canTransition({ ...pack, parcels: { total: 1, tracked: 0 } })).toEqual({ ok: true, kind: "advance" });
    // Stepping back to packed (an admin's correction) keeps the boxes it has; no count needed.
    expect(
      canTransition({ from: "shipped", to: "packed", method: "parcel", role: "admin", reason: "Label misprinted." }),
    ).toEqual({ ok: true, kind: "correction" });
  });

  it("explains refusals in the store's words", () => {
    expect(
      canTransition({ from: "paid", to: "cancelled", method: "parcel", role: "fulfillment" }),
    ).toEqual({
      ok: false,
      code: "role_not_allowed",
      message:
        'Only an Administrator can move an order from "In the workshop queue" to "Cancelled".',
    });
    expect(
      canTransition({ from: "packing", to: "ready_for_pickup", method: "parcel", role: "admin" }),
    ).toMatchObject({
      code: "wrong_method",
      message:
        'Only local pickup orders can go from "On the packing bench" to "Waiting at the center".',
    });
    expect(
      canTransition({ from: "refunded", to: "paid", method: "pickup", role: "admin" }),
    ).toMatchObject({ code: "final_state" });
    // A payment that arrives after the checkout closed, or for a refunded order, is never taken.
    expect(canTransition({ from: "expired", to: "paid", method: "parcel", role: "system" })).toEqual({
      ok: false,
      code: "final_state",
      message: 'A "Hold ran out" order can\'t change any more.',
    });
    expect(canTransition({ from: "refunded", to: "paid", method: "none", role: "system" })).toMatchObject({ ok: false, code: "final_state" });
    expect(canTransition({ from: "paid", to: "paid", method: "parcel", role: "system" })).toMatchObject({ ok: false, code: "same_state" });
    expect(canTransition({ from: "pending_payment", to: "expired", method: "none", role: "admin" })).toMatchObject({
      ok: false,
      code: "role_not_allowed",
      message: 'Only the payment system can move an order from "At the till" to "Hold ran out".',
    });
    // A state name from outside TypeScript's reach (a form post), hence the cast.
    const posted = "lost" as OrderStatus;
    expect(
      canTransition({ from: posted, to: "paid", method: "parcel", role: "admin" }),
    ).toMatchObject({ code: "unknown_state" });
  });
});

describe("allowedTransitions", () => {
  it("offers a volunteer only the next step, and an admin cancel and correction too", () => {
    const next = (role: TransitionActor) =>
      allowedTransitions({ from: "packing", method: "pickup", role })
        .map((t) => t.to)
        .sort();
    expect(next("fulfillment")).toEqual(["ready_for_pickup"]);
    expect(next("admin")).toEqual(["cancelled", "paid", "ready_for_pickup"]);
    expect(next("customer")).toEqual([]);
  });
});
