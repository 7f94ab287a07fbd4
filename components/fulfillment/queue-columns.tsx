"use client";

import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { formatOrderNumber } from "@/lib/checkout/order-number";
import type { QueueRow } from "@/lib/fulfillment/queries/queue";
import type { QueueSort } from "@/lib/fulfillment/queue-params";
import { formatStoreDate, formatWaiting } from "@/lib/fulfillment/store-time";
import { StateBadge } from "./state-badge";

const column = createColumnHelper<QueueRow>();

/** Columns whose id is a server sort key can be sorted; the rest show what the row holds. */
export function queueColumns(now: Date) {
  return [
    column.accessor("number", {
      id: "number" satisfies QueueSort,
      header: "Order",
      cell: (info) => (
        <Link href={`/fulfillment/orders/${info.row.original.id}`} className="font-bold whitespace-nowrap">
          {formatOrderNumber(info.getValue())}
        </Link>
      ),
    }),
    column.accessor("name", { id: "name" satisfies QueueSort, header: "Buyer" }),
    column.accessor("status", {
      id: "status" satisfies QueueSort,
      header: "State",
      cell: (info) => <StateBadge status={info.getValue()} />,
    }),
    column.accessor("method", {
      id: "method",
      header: "How it goes",
      enableSorting: false,
      cell: (info) => {
        const row = info.row.original;
        if (row.method === "pickup") return "Local pickup";
        return row.shipTo ? `Parcel to ${row.shipTo.city}, ${row.shipTo.state}` : "Parcel";
      },
    }),
    column.accessor("houses", { id: "houses", header: "Houses", enableSorting: false, meta: { numeric: true } }),
    column.accessor("boxes", {
      id: "boxes",
      header: "Boxes shipped",
      enableSorting: false,
      meta: { numeric: true },
      cell: (info) => (info.row.original.method === "pickup" ? "—" : `${info.row.original.boxesShipped} of ${info.getValue()}`),
    }),
    column.accessor("paidAt", {
      id: "paid" satisfies QueueSort,
      header: "Paid",
      cell: (info) => {
        const paidAt = info.getValue();
        if (!paidAt) return "—";
        return (
          <span className="whitespace-nowrap">
            {formatStoreDate(paidAt)}
            <span className="block text-sm text-ink-soft">waiting {formatWaiting({ since: paidAt, now })}</span>
          </span>
        );
      },
    }),
  ];
}
