import { Badge } from "@/components/ui/badge";
import { EmptyState } from "@/components/ui/empty-state";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import type { LedgerEntry } from "@/lib/staff/queries/model";

const KIND_WORDS: Record<LedgerEntry["kind"], string> = {
  received: "Received",
  adjusted: "Adjusted",
  reserved: "Held for an order",
  sold: "Sold",
  released: "Released from an order",
};
const KIND_TONES: Record<LedgerEntry["kind"], "good" | "warn" | "info" | "neutral"> = {
  received: "good",
  adjusted: "warn",
  reserved: "info",
  sold: "neutral",
  released: "info",
};

const when = new Intl.DateTimeFormat("en-US", {
  dateStyle: "medium",
  timeStyle: "short",
  timeZone: "America/Los_Angeles",
});

/** Every movement: who, when, why, and the stock after it. Times are the center's (Pacific). */
export function LedgerTable({ entries }: { entries: LedgerEntry[] }) {
  if (entries.length === 0) {
    return (
      <EmptyState
        level={3}
        title="No movements yet"
        description="Receive the first batch from a builder to start the ledger."
      />
    );
  }
  return (
    <Table caption="Stock ledger, newest first">
      <THead>
        <Tr>
          <Th>When</Th>
          <Th>Movement</Th>
          <Th numeric>Change</Th>
          <Th numeric>In stock after</Th>
          <Th>Why</Th>
          <Th>Who</Th>
        </Tr>
      </THead>
      <TBody>
        {entries.map((e) => (
          <Tr key={e.id}>
            <Td className="whitespace-nowrap">{when.format(new Date(e.createdAt))}</Td>
            <Td>
              <Badge tone={KIND_TONES[e.kind]} icon={false}>
                {KIND_WORDS[e.kind]}
              </Badge>
            </Td>
            <Td
              numeric
              className={e.delta < 0 ? "font-bold text-berry-700" : "font-bold text-moss-800"}
            >
              {e.delta > 0 ? `+${e.delta}` : e.delta === 0 ? "0" : `−${Math.abs(e.delta)}`}
            </Td>
            <Td numeric>{e.stockAfter}</Td>
            <Td>
              <span className="block">{e.reason || "—"}</span>
              {e.batch || e.builderName ? (
                <span className="block text-sm text-ink-soft">
                  {[
                    e.batch ? `Batch ${e.batch}` : null,
                    e.builderName ? `built by ${e.builderName}` : null,
                  ]
                    .filter(Boolean)
                    .join(", ")}
                </span>
              ) : null}
              {e.orderId ? (
                <span className="block text-sm text-ink-soft">Order {e.orderId.slice(0, 8)}</span>
              ) : null}
            </Td>
            <Td>{e.actor ?? (e.orderId ? "Checkout" : "—")}</Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
