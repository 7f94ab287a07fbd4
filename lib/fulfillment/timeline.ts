import { FULFILLMENT_STATE_LABELS, isFulfillmentState } from "./state-labels";

// The buyer's view of an order's history: state changes only, in the store's words. Staff notes
// (an admin's reason, a failed card's message) stay on the staff side; they may name people or
// say things written for colleagues.

export type OrderEventForTimeline = {
  fromStatus: string | null;
  toStatus: string;
  createdAt: Date;
};

export type TimelineEntry = {
  at: Date;
  state: string;
  title: string;
  detail: string;
  /** True when the center stepped the order back to fix a mistake. */
  corrected: boolean;
};

// Our own words for the two states the fulfillment labels leave out (they never reach the desk).
const EXTRA_WORDS: Record<string, { label: string; buyerNote: string }> = {
  expired: {
    label: "Checkout closed",
    buyerNote: "The payment didn't arrive within 30 minutes, so the houses went back on the shelf.",
  },
};

const FORWARD_ORDER = [
  "pending_payment",
  "paid",
  "packing",
  "packed",
  "shipped",
  "delivered",
  "ready_for_pickup",
  "picked_up",
];

function wordsFor(state: string): { label: string; buyerNote: string } {
  if (isFulfillmentState(state)) return FULFILLMENT_STATE_LABELS[state];
  return EXTRA_WORDS[state] ?? { label: "Updated", buyerNote: "" };
}

function isStepBack(from: string | null, to: string): boolean {
  if (!from) return false;
  const a = FORWARD_ORDER.indexOf(from);
  const b = FORWARD_ORDER.indexOf(to);
  return a >= 0 && b >= 0 && b < a;
}

/** Oldest first; repeated attempts in one state (a declined card) are left out. */
export function buyerTimeline(events: readonly OrderEventForTimeline[]): TimelineEntry[] {
  return [...events]
    .filter((e) => e.fromStatus !== e.toStatus)
    .sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime())
    .map((e) => {
      const words = wordsFor(e.toStatus);
      const corrected = isStepBack(e.fromStatus, e.toStatus);
      return {
        at: e.createdAt,
        state: e.toStatus,
        title: corrected ? `Back to: ${words.label}` : words.label,
        detail: corrected ? "We corrected a step we had recorded too early." : words.buyerNote,
        corrected,
      };
    });
}
