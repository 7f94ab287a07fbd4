import type { Metadata } from "next";
import { PageHeader, PageShell } from "@/components/page-header";
import { Card } from "@/components/ui/card";
import { requirePageUser } from "@/lib/auth/guard";
import { countOrdersByStatus } from "@/lib/fulfillment/queries";

export const metadata: Metadata = { title: "Shipping desk" };

const WAITING = [
  ["paid", "Waiting to pack"],
  ["packing", "Being packed"],
  ["packed", "Packed, not shipped"],
  ["ready_for_pickup", "Waiting for pickup"],
] as const;

export default async function FulfillmentHomePage() {
  await requirePageUser("fulfillment:orders", "/fulfillment");
  const counts = await countOrdersByStatus();
  return (
    <PageShell>
      <PageHeader title="Shipping desk" lead="Paid orders waiting for packing, shipping or pickup." />
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        {WAITING.map(([status, label]) => (
          <Card key={status}>
            <p className="text-ink-soft">{label}</p>
            <p className="font-display text-3xl font-semibold text-moss-900">{counts[status] ?? 0}</p>
          </Card>
        ))}
      </div>
    </PageShell>
  );
}
