import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { ModelForm } from "@/components/staff/model-form";
import { ModelStatusPanel } from "@/components/staff/model-status-panel";
import { formatDay } from "@/components/staff/status-badges";
import { Alert } from "@/components/ui/alert";
import { requirePageUser } from "@/lib/auth/guard";
import { getStaffModelBySlug } from "@/lib/staff/queries/model";

export const metadata: Metadata = { title: "Edit model" };

export default async function StaffModelPage({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  await requirePageUser("staff:models", `/staff/models/${slug}`);
  const model = await getStaffModelBySlug({ slug });
  if (!model) notFound();
  const cert = model.certification;
  return (
    <div className="flex flex-col gap-6">
      <ModelStatusPanel
        id={model.row.id}
        slug={slug}
        name={model.row.name}
        status={model.row.status}
        refusals={model.publishRefusals}
      />
      {cert.expiresWithin30Days && cert.expiresAt ? (
        <Alert tone="warn" title={`Sound Build lapses on ${formatDay(cert.expiresAt)}`}>
          Inspect a built unit before then to keep it on sale with its Sound Build.
        </Alert>
      ) : null}
      <ModelForm model={{ id: model.row.id, input: model.input }} />
    </div>
  );
}
