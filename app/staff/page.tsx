import type { Metadata } from "next";
import Link from "next/link";
import { RateCoverageAlert } from "@/components/admin/rate-coverage-alert";
import { PageHeader, PageShell } from "@/components/page-header";
import { formatDay } from "@/components/staff/status-badges";
import { Badge } from "@/components/ui/badge";
import { ButtonLink } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { getRateCoverage } from "@/lib/admin/queries";
import { requirePageUser } from "@/lib/auth/guard";
import { can } from "@/lib/auth/roles";
import {
  countModelsByStatus,
  listCertificationsDue,
  listLowStockModels,
} from "@/lib/staff/queries/models-table";

export const metadata: Metadata = { title: "Workshop" };

const DAY_MS = 24 * 60 * 60 * 1000;

function dueWords(
  m: { certState: string; certWords: string; expiresAt: string | null },
  now: Date,
): string {
  if (m.certState !== "certified" || !m.expiresAt) return m.certWords;
  const days = Math.ceil((Date.parse(m.expiresAt) - now.getTime()) / DAY_MS);
  return days <= 1 ? "Lapses tomorrow" : `Lapses in ${days} days`;
}

export default async function StaffHomePage() {
  const user = await requirePageUser("staff:models", "/staff");
  const now = new Date();
  const [counts, lowStock, due, coverage] = await Promise.all([
    countModelsByStatus(),
    listLowStockModels(),
    listCertificationsDue({ now }),
    getRateCoverage(),
  ]);
  return (
    <PageShell>
      <PageHeader title="Workshop" lead="House models, inspections and stock.">
        <div className="flex flex-wrap gap-2">
          <ButtonLink href="/staff/models">All models</ButtonLink>
          <ButtonLink href="/staff/models/new" variant="secondary">
            List a new model
          </ButtonLink>
          <ButtonLink href="/staff/roost-reports" variant="secondary">
            Roost reports
          </ButtonLink>
          <ButtonLink href="/staff/reports" variant="secondary">
            Stock report
          </ButtonLink>
        </div>
      </PageHeader>
      <RateCoverageAlert coverage={coverage} settingsLink={can(user.role, "admin:settings")} className="mb-6" />
      <div className="grid gap-4 sm:grid-cols-3">
        {(
          [
            ["On sale", counts.published, "published"],
            ["Drafts", counts.draft, "draft"],
            ["Retired", counts.retired, "retired"],
          ] as const
        ).map(([label, n]) => (
          <Card key={label}>
            <p className="text-ink-soft">{label}</p>
            <p className="font-display text-3xl font-semibold text-moss-900">{n}</p>
          </Card>
        ))}
      </div>

      <div className="mt-10 grid gap-10 lg:grid-cols-2">
        <section aria-labelledby="low-stock">
          <h2 id="low-stock" className="font-display text-2xl font-semibold text-moss-900">
            Running low
          </h2>
          <p className="mt-1 text-ink-soft">Models on sale at or under their low-stock mark.</p>
          {lowStock.length === 0 ? (
            <EmptyState
              className="mt-3"
              level={3}
              title="Every house on sale is above its low-stock mark"
            >
              Nothing to rebuild right now.
            </EmptyState>
          ) : (
            <ul
              className="mt-3 divide-y divide-paper-200 rounded-xl border border-paper-300 bg-paper-50 shadow-card"
              data-testid="low-stock-list"
            >
              {lowStock.map((m) => (
                <li
                  key={m.slug}
                  className="flex flex-wrap items-center justify-between gap-2 px-4 py-3"
                >
                  <span className="flex flex-col">
                    <Link
                      href={`/staff/models/${m.slug}/stock`}
                      className="font-bold text-moss-800 underline"
                    >
                      {m.name}
                    </Link>
                    <span className="text-sm text-ink-soft">{m.builderName}</span>
                  </span>
                  <span
                    className={
                      m.stock === 0 ? "font-bold text-berry-700" : "font-bold text-ember-900"
                    }
                  >
                    {m.stock === 0 ? "None left" : `${m.stock} left`}{" "}
                    <span className="font-normal text-ink-soft">(mark {m.lowStockThreshold})</span>
                  </span>
                </li>
              ))}
            </ul>
          )}
        </section>

        <section aria-labelledby="due">
          <h2 id="due" className="font-display text-2xl font-semibold text-moss-900">
            Inspections due
          </h2>
          <p className="mt-1 text-ink-soft">
            Models on sale whose Sound Build lapses within 30 days, or has lapsed.
          </p>
          {due.length === 0 ? (
            <EmptyState
              className="mt-3"
              level={3}
              title="No Sound Build lapses in the next 30 days"
            >
              Every model on sale has a recent passing inspection.
            </EmptyState>
          ) : (
            <ul
              className="mt-3 divide-y divide-paper-200 rounded-xl border border-paper-300 bg-paper-50 shadow-card"
              data-testid="due-list"
            >
              {due.map((m) => (
                <li
                  key={m.slug}
                  className="flex flex-wrap items-center justify-between gap-2 px-4 py-3"
                >
                  <span className="flex flex-col">
                    <Link
                      href={`/staff/models/${m.slug}/inspections`}
                      className="font-bold text-moss-800 underline"
                    >
                      {m.name}
                    </Link>
                    <span className="text-sm text-ink-soft">
                      {m.expiresAt
                        ? `Valid until ${formatDay(m.expiresAt)}`
                        : "No valid inspection"}
                    </span>
                  </span>
                  <Badge tone={m.certState === "certified" ? "warn" : "poor"}>
                    {dueWords(m, now)}
                  </Badge>
                </li>
              ))}
            </ul>
          )}
        </section>
      </div>
    </PageShell>
  );
}
