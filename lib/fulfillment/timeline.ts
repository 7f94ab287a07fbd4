import { isCorrection } from "@/lib/orders/state-machine";
import { isOrderStatus, ORDER_STATUS_LABELS } from "@/lib/orders/statuses";

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

function wordsFor(state: string): { label: string; buyerNote: string } {
  return isOrderStatus(state) ? ORDER_STATUS_LABELS[state] : { label: "Updated", buyerNote: "" };
}

/** Oldest first; repeated attempts in one state (a declined card) are left out. */
export function buyerTimeline(events: readonly OrderEventForTimeline[]): TimelineEntry[] {
  return [...events]
    .filter((e) => e.fromStatus !== e.toStatus)
    .sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime())
    .map((e) => {
      const words = wordsFor(e.toStatus);
      const corrected = isCorrection(e.fromStatus, e.toStatus);
      return {
        at: e.createdAt,
        state: e.toStatus,
        title: corrected ? `Back to: ${words.label}` : words.label,
        detail: corrected ? "We corrected a step we had recorded too early." : words.buyerNote,
        corrected,
      };
    });
}
