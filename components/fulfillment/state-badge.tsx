import { Badge, type BadgeTone } from "@/components/ui/badge";
import { ORDER_STATUS_LABELS, isFulfillmentState } from "@/lib/orders/statuses";

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
  const label = isFulfillmentState(status) ? ORDER_STATUS_LABELS[status].label : status;
  return <Badge tone={TONES[status] ?? "neutral"}>{label}</Badge>;
}
