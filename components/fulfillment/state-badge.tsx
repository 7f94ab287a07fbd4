import { Badge, type BadgeTone } from "@/components/ui/badge";
import { FULFILLMENT_STATE_LABELS, isFulfillmentState } from "@/lib/fulfillment/state-labels";

// Warm tones where a volunteer has work to do, green where the order is done.
const TONES: Record<string, BadgeTone> = {
  paid: "warn",
  packing: "info",
  packed: "info",
  shipped: "neutral",
  delivered: "good",
  ready_for_pickup: "fair",
  picked_up: "good",
  cancelled: "poor",
  refunded: "neutral",
};

export function StateBadge({ status }: { status: string }) {
  const label = isFulfillmentState(status) ? FULFILLMENT_STATE_LABELS[status].label : status;
  return <Badge tone={TONES[status] ?? "neutral"}>{label}</Badge>;
}
