import type { Metadata } from "next";
import { PageHeader, PageShell } from "@/components/page-header";
import { ModelsTable } from "@/components/staff/models-table";
import { ButtonLink } from "@/components/ui/button";
import { requirePageUser } from "@/lib/auth/guard";
import { applyModelsQuery, DEFAULT_MODELS_QUERY } from "@/lib/staff/models-table-query";
import { listStaffModelRows } from "@/lib/staff/queries/models-table";

export const metadata: Metadata = { title: "House models" };

export default async function StaffModelsPage() {
  await requirePageUser("staff:models", "/staff/models");
  const initial = applyModelsQuery({
    rows: await listStaffModelRows(),
    query: DEFAULT_MODELS_QUERY,
  });
  return (
    <PageShell>
      <PageHeader
        title="House models"
        lead="Every model the workshop has listed: drafts, those on sale and retired ones, with stock and Sound Build standing."
      >
        <div>
          <ButtonLink href="/staff/models/new">List a new model</ButtonLink>
        </div>
      </PageHeader>
      <ModelsTable initial={initial} />
    </PageShell>
  );
}
