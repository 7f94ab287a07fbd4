import type { Metadata } from "next";
import { GivingForm } from "@/components/giving/giving-form";
import { PageHeader, PageShell } from "@/components/page-header";
import { connection } from "next/server";
import { Suspense } from "react";
import { Skeleton } from "@/components/ui/skeleton";
import { cachedCenterProfile } from "@/lib/catalog/cached";
import { getSessionUser } from "@/lib/auth/session";
import { getGivingSettings } from "@/lib/giving/queries";

export const metadata: Metadata = { title: "Give" };

// The words are the prerendered shell; the center's name and the form (the signed-in donor's
// contact, the card-fee rate from the settings) stream in.
export default function GivePage() {
  return (
    <PageShell>
      <div className="grid gap-10 lg:grid-cols-[1fr_1.1fr]">
        <div>
          <PageHeader
            title="Give to the rescue"
            lead={
              <>
                <Suspense fallback="The rescue">
                  <CenterNameOr fallback="The rescue" />
                </Suspense>{" "}
                cares for injured and orphaned bats and returns them to the wild. Your gift pays for their food, medicine and flight cages.
              </>
            }
          />
          <p className="text-ink-soft">
            No goods or services are given in exchange for a gift on its own, so all of it is tax-deductible as the law allows; your
            receipt says so.
          </p>
        </div>
        <div className="rounded-xl border border-paper-200 bg-white p-6 shadow-card">
          <Suspense fallback={<Skeleton className="h-[30rem] w-full" />}>
            <Giving />
          </Suspense>
        </div>
      </div>
    </PageShell>
  );
}

async function CenterNameOr({ fallback }: { fallback: string }) {
  await connection(); // at request time only: the build never reads the database
  const center = await cachedCenterProfile();
  return center.configured ? center.name : fallback;
}

async function Giving() {
  await connection(); // at request time only: the build never reads the database
  const [user, settings] = await Promise.all([getSessionUser(), getGivingSettings()]);
  return (
    <GivingForm defaultContact={user ? { name: user.name, email: user.email } : null} fee={{ basisPoints: settings.feeBasisPoints, fixedCents: settings.feeFixedCents }} />
  );
}
