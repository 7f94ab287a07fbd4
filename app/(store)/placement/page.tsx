import type { Metadata } from "next";
import { PageHeader, PageShell } from "@/components/page-header";
import { PlacementPlanner } from "@/components/placement/placement-planner";
import { getSessionUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Plan a site" };

export default async function PlacementPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const [user, params] = await Promise.all([getSessionUser(), searchParams]);
  const siteId = typeof params.site === "string" ? params.site : undefined;
  return (
    <PageShell>
      <PageHeader
        title="Will bats like this spot?"
        lead="Most empty bat houses hang in the wrong place. Describe the spot you have in mind and we rate it rule by rule, with the hours of sun on the house worked out for your place, mount and skyline."
      />
      <PlacementPlanner signedIn={user !== null} siteId={siteId} />
    </PageShell>
  );
}
