import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader, PageShell } from "@/components/page-header";
import { Card } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { requirePageUser } from "@/lib/auth/guard";
import { countModelsByStatus, listLowStockModels } from "@/lib/staff/queries";

export const metadata: Metadata = { title: "Workshop" };

export default async function StaffHomePage() {
  await requirePageUser("staff:models", "/staff");
  const [counts, lowStock] = await Promise.all([countModelsByStatus(), listLowStockModels()]);
  return (
    <PageShell>
      <PageHeader title="Workshop" lead="House models, inspections and stock." />
      <div className="grid gap-4 sm:grid-cols-3">
        {(
          [
            ["On sale", counts.published],
            ["Drafts", counts.draft],
            ["Retired", counts.retired],
          ] as const
        ).map(([label, n]) => (
          <Card key={label}>
            <p className="text-ink-soft">{label}</p>
            <p className="font-display text-3xl font-semibold text-moss-900">{n}</p>
          </Card>
        ))}
      </div>
      <section className="mt-10" aria-labelledby="low-stock">
        <h2 id="low-stock" className="font-display text-2xl font-semibold text-moss-900">
          Running low
        </h2>
        {lowStock.length === 0 ? (
          <EmptyState title="Every house on sale is above its low-stock mark" description="Nothing to rebuild right now." />
        ) : (
          <ul className="mt-3 divide-y divide-paper-200 rounded-lg border border-paper-200 bg-white">
            {lowStock.map((m) => (
              <li key={m.slug} className="flex items-center justify-between px-4 py-3">
                <Link href={`/houses/${m.slug}`} className="font-bold text-moss-800 underline">
                  {m.name}
                </Link>
                <span>
                  {m.stock} left (mark: {m.lowStockThreshold})
                </span>
              </li>
            ))}
          </ul>
        )}
      </section>
    </PageShell>
  );
}
