import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { InspectionForm } from "@/components/staff/inspection-form";
import { MeasurementTable } from "@/components/staff/measurement-table";
import { formatDay } from "@/components/staff/status-badges";
import { Badge } from "@/components/ui/badge";
import { EmptyState } from "@/components/ui/empty-state";
import { requirePageUser } from "@/lib/auth/guard";
import { CERTIFICATION_NAME } from "@/lib/catalog/certification";
import { getStaffModelBySlug, listInspections } from "@/lib/staff/queries/model";

export const metadata: Metadata = { title: "Inspections" };

export default async function StaffModelInspectionsPage({
  params,
}: {
  params: Promise<{ slug: string }>;
}) {
  const { slug } = await params;
  const user = await requirePageUser("staff:inspections", `/staff/models/${slug}/inspections`);
  const model = await getStaffModelBySlug({ slug });
  if (!model) notFound();
  const history = await listInspections({ modelId: model.row.id, spec: model.spec });
  const cert = model.certification;
  return (
    <div className="grid gap-8 lg:grid-cols-[minmax(0,1.2fr)_minmax(0,1fr)] lg:items-start">
      <section
        aria-labelledby="record"
        className="rounded-2xl border border-paper-300 bg-paper-50 p-5 shadow-card sm:p-6"
      >
        <h2 id="record" className="font-display text-2xl font-semibold text-moss-900">
          Record an inspection
        </h2>
        <p className="mt-1 mb-5 text-ink-soft">
          Measure a finished unit from the workshop floor. Each length must be within 1/16 in of the
          listing, and the unit must meet every measured criterion. A pass makes the model{" "}
          {CERTIFICATION_NAME} for 12 months.
        </p>
        <InspectionForm modelId={model.row.id} spec={model.spec} inspectorName={user.name} />
      </section>
      <section aria-labelledby="history" className="flex flex-col gap-4">
        <h2 id="history" className="font-display text-2xl font-semibold text-moss-900">
          History
        </h2>
        <p className="text-ink-soft">
          {cert.expiresAt
            ? `${cert.words}. The latest passing inspection is valid until ${formatDay(cert.expiresAt)}.`
            : `${cert.words}.`}
        </p>
        {history.length === 0 ? (
          <EmptyState
            level={3}
            title="No inspections yet"
            description="The first passing inspection gives the model its Sound Build."
          />
        ) : (
          <ol className="flex flex-col gap-4">
            {history.map((i, index) => (
              <li
                key={i.id}
                className="flex flex-col gap-3 rounded-xl border border-paper-300 bg-paper-50 p-4 shadow-card"
              >
                <div className="flex flex-wrap items-center justify-between gap-2">
                  <h3 className="font-display text-lg font-semibold text-moss-900">
                    {formatDay(i.inspectedOn)}
                    {index === 0 ? (
                      <span className="ml-2 text-sm font-normal text-ink-soft">(latest)</span>
                    ) : null}
                  </h3>
                  <Badge tone={i.passed ? "good" : "poor"}>
                    {i.passed ? "Passed" : "Did not pass"}
                  </Badge>
                </div>
                <p className="text-sm text-ink-soft">
                  Measured by {i.inspector}
                  {i.recordedBy && i.recordedBy !== i.inspector
                    ? `, recorded by ${i.recordedBy}`
                    : ""}
                  .
                </p>
                {i.notes ? <p className="text-ink">{i.notes}</p> : null}
                <details>
                  <summary className="cursor-pointer font-bold text-moss-800">
                    Measurements against today&apos;s listing
                  </summary>
                  <div className="mt-3">
                    <MeasurementTable
                      caption={`Measurements of ${formatDay(i.inspectedOn)}`}
                      measurements={i.result.measurements}
                    />
                  </div>
                </details>
              </li>
            ))}
          </ol>
        )}
      </section>
    </div>
  );
}
