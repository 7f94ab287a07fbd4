import Link from "next/link";
import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { PageShell } from "@/components/page-header";
import { ModelTabs } from "@/components/staff/model-tabs";
import { CertificationBadge, ModelStatusBadge } from "@/components/staff/status-badges";
import { requirePageUser } from "@/lib/auth/guard";
import { getModelTabCounts, getStaffModelBySlug } from "@/lib/staff/queries/model";

// The frame of one model's pages: its name, where it stands, and its sections.
export default async function StaffModelLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ slug: string }>;
}) {
  const { slug } = await params;
  await requirePageUser("staff:models", `/staff/models/${slug}`);
  const model = await getStaffModelBySlug({ slug });
  if (!model) notFound();
  const counts = await getModelTabCounts({ modelId: model.row.id });
  return (
    <PageShell>
      <p className="mb-3 text-sm">
        <Link href="/staff/models" className="font-bold text-moss-800 underline">
          ← All models
        </Link>
      </p>
      <header className="mb-6 flex flex-col gap-3">
        <h1 className="font-display text-3xl font-semibold text-moss-900 sm:text-4xl">
          {model.row.name}
        </h1>
        <div className="flex flex-wrap items-center gap-2">
          <ModelStatusBadge status={model.row.status} />
          <CertificationBadge
            state={model.certification.state}
            words={model.certification.words}
            expiringSoon={model.certification.expiresWithin30Days}
          />
          <span className="text-sm text-ink-soft">Built by {model.row.builderName || "—"}</span>
        </div>
      </header>
      <ModelTabs slug={slug} counts={{ ...counts, stock: model.row.stock }} />
      {children}
    </PageShell>
  );
}
