import type { Metadata } from "next";
import { PageHeader, PageShell } from "@/components/page-header";
import { SavedSiteList } from "@/components/placement/saved-site-list";
import { ButtonLink } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { requirePageUser } from "@/lib/auth/guard";
import { isBandId } from "@/lib/climate/band-cookie";
import { CLIMATE_BANDS } from "@/lib/catalog/climate-bands";
import { describeSkylineEffect, skylineEffectSchema } from "@/lib/placement/skyline-words";
import { listSitesByUser } from "@/lib/placement/queries";

export const metadata: Metadata = { title: "Your saved sites" };

// A site saved before skylines were kept has none: its check assumed an open sky.
function describeSavedSkyline(stored: unknown): string {
  const effect = skylineEffectSchema.safeParse(stored);
  const words = describeSkylineEffect(effect.success ? effect.data : null);
  return [words.summary, ...words.parts].join(" ");
}

export default async function SavedSitesPage() {
  const user = await requirePageUser("account", "/account/sites");
  const sites = await listSitesByUser({ userId: user.id });
  return (
    <PageShell>
      <PageHeader
        title="Your saved sites"
        lead="The spots you checked for a bat house. Open one to change it, or choose the one that goes with your next order."
      >
        <div>
          <ButtonLink href="/placement" variant="secondary">
            Check a new site
          </ButtonLink>
        </div>
      </PageHeader>
      {sites.length === 0 ? (
        <EmptyState
          title="No saved sites yet"
          description="Check a spot with the site planner and save it: it goes with your order and the install guide is written for it."
          action={<ButtonLink href="/placement">Plan a site</ButtonLink>}
        />
      ) : (
        <SavedSiteList
          sites={sites.map((s) => ({
            id: s.id,
            name: s.name,
            label: s.label === "good" || s.label === "fair" ? s.label : "poor",
            bandId: s.bandId,
            bandLabel: isBandId(s.bandId) ? CLIMATE_BANDS[s.bandId].label : s.bandId,
            savedOn: s.createdAt.toISOString(),
            orderCount: s.orderCount,
            skyline: describeSavedSkyline(s.skylineEffect),
          }))}
        />
      )}
    </PageShell>
  );
}
