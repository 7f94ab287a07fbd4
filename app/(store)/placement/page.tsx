import type { Metadata } from "next";
import { Suspense } from "react";
import { Skeleton } from "@/components/ui/skeleton";
import { PageHeader, PageShell } from "@/components/page-header";
import { PlacementPlanner } from "@/components/placement/placement-planner";
import { getSessionUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Plan a site" };

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

// The heading is the prerendered shell; the planner streams in (it needs to know who is signed in
// and which saved site the address names).
export default function PlacementPage({ searchParams }: { searchParams: SearchParams }) {
  return (
    <PageShell>
      <PageHeader
        title="Will bats like this spot?"
        lead="Most empty bat houses hang in the wrong place. Describe the spot you have in mind and we rate it rule by rule, with the hours of sun on the house worked out for your place, mount and skyline."
      />
      <Suspense fallback={<Skeleton className="h-[36rem] w-full" />}>
        <Planner searchParams={searchParams} />
      </Suspense>
    </PageShell>
  );
}

async function Planner({ searchParams }: { searchParams: SearchParams }) {
  const [user, params] = await Promise.all([getSessionUser(), searchParams]);
  const siteId = typeof params.site === "string" ? params.site : undefined;
  return <PlacementPlanner signedIn={user !== null} siteId={siteId} />;
}
