import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { LedgerTable } from "@/components/staff/ledger-table";
import { AdjustStockForm, ReceiveStockForm } from "@/components/staff/stock-forms";
import { Card } from "@/components/ui/card";
import { requirePageUser } from "@/lib/auth/guard";
import { getStaffModelBySlug, listStockMovements } from "@/lib/staff/queries/model";

export const metadata: Metadata = { title: "Stock ledger" };

export default async function StaffModelStockPage({
  params,
}: {
  params: Promise<{ slug: string }>;
}) {
  const { slug } = await params;
  await requirePageUser("staff:stock", `/staff/models/${slug}/stock`);
  const model = await getStaffModelBySlug({ slug });
  if (!model) notFound();
  const entries = await listStockMovements({ modelId: model.row.id });
  const { stock, lowStockThreshold, status } = model.row;
  const low = status === "published" && stock <= lowStockThreshold;
  return (
    <div className="flex flex-col gap-8">
      <div className="grid gap-4 sm:grid-cols-3">
        <Card>
          <p className="text-ink-soft">In stock</p>
          <p
            className="font-display text-3xl font-semibold text-moss-900"
            data-testid="stock-on-hand"
          >
            {stock}
          </p>
        </Card>
        <Card>
          <p className="text-ink-soft">Low-stock mark</p>
          <p className="font-display text-3xl font-semibold text-moss-900">{lowStockThreshold}</p>
        </Card>
        <Card>
          <p className="text-ink-soft">Standing</p>
          <p
            className={`font-display text-xl font-semibold ${low ? "text-ember-900" : "text-moss-900"}`}
          >
            {status !== "published"
              ? "Not on sale"
              : low
                ? "Running low: ask the builders"
                : "Enough on hand"}
          </p>
        </Card>
      </div>
      <div className="grid gap-6 lg:grid-cols-2">
        <ReceiveStockForm modelId={model.row.id} builderName={model.row.builderName} />
        <AdjustStockForm modelId={model.row.id} stock={stock} />
      </div>
      <section aria-labelledby="ledger" className="flex flex-col gap-3">
        <h2 id="ledger" className="font-display text-2xl font-semibold text-moss-900">
          Ledger
        </h2>
        <p className="text-ink-soft">
          Stock changes only through these movements. Sales and holds come from checkout.
        </p>
        <LedgerTable entries={entries} />
      </section>
    </div>
  );
}
