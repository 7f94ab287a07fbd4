"use client";

import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { formatUsd } from "@/lib/checkout/money";
import type { StaffModelRow } from "@/lib/staff/models-table-query";
import { CertificationBadge, formatDay, ModelStatusBadge } from "./status-badges";

const column = createColumnHelper<StaffModelRow>();

// Column ids are the server's sort keys, so sorting is done by the JSON route.
export const COLUMNS = [
  column.accessor("name", {
    id: "name",
    header: "Model",
    cell: ({ row }) => (
      <div className="flex flex-col">
        <Link
          href={`/staff/models/${row.original.slug}`}
          className="font-bold text-moss-800 underline"
        >
          {row.original.name}
        </Link>
        <span className="text-sm text-ink-soft">{row.original.builderName}</span>
      </div>
    ),
  }),
  column.accessor("status", {
    id: "status",
    header: "Status",
    cell: ({ row }) => <ModelStatusBadge status={row.original.status} />,
  }),
  column.accessor("stock", {
    id: "stock",
    header: "Stock",
    cell: ({ row }) => {
      const r = row.original;
      const low = r.status === "published" && r.stock <= r.lowStockThreshold;
      return (
        <span className="flex flex-col items-end">
          <span className="tabular-nums">{r.stock}</span>
          {low ? (
            <span className="text-xs font-bold text-ember-900">
              low (mark {r.lowStockThreshold})
            </span>
          ) : null}
        </span>
      );
    },
  }),
  column.accessor("certState", {
    id: "certification",
    header: "Sound Build",
    cell: ({ row }) => {
      const r = row.original;
      return (
        <div className="flex flex-col items-start gap-1">
          <CertificationBadge
            state={r.certState}
            words={r.certWords}
            expiringSoon={r.expiresWithin30Days}
          />
          {r.inspectedOn ? (
            <span className="text-sm text-ink-soft">Inspected {formatDay(r.inspectedOn)}</span>
          ) : null}
        </div>
      );
    },
  }),
  column.accessor("expiresAt", {
    id: "expires",
    header: "Valid until",
    cell: ({ row }) => {
      const r = row.original;
      if (!r.expiresAt) return <span className="text-ink-soft">—</span>;
      return (
        <span className="flex flex-col items-start gap-1">
          <span>{formatDay(r.expiresAt)}</span>
          {r.expiresWithin30Days ? (
            <Badge tone="warn">Within 30 days</Badge>
          ) : r.certState === "expired" ? (
            <Badge tone="warn">Lapsed</Badge>
          ) : null}
        </span>
      );
    },
  }),
  column.accessor("priceCents", {
    id: "price",
    header: "Price",
    cell: ({ getValue }) => <span className="tabular-nums">{formatUsd(getValue())}</span>,
  }),
];

export const NUMERIC = new Set(["stock", "price"]);
