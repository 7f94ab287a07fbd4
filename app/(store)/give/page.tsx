import type { Metadata } from "next";
import { GivingForm } from "@/components/giving/giving-form";
import { PageHeader, PageShell } from "@/components/page-header";
import { getCenterProfile } from "@/lib/admin/queries";
import { getSessionUser } from "@/lib/auth/session";
import { getGivingSettings } from "@/lib/giving/queries";

export const metadata: Metadata = { title: "Give" };

export default async function GivePage() {
  const [user, settings, center] = await Promise.all([getSessionUser(), getGivingSettings(), getCenterProfile()]);
  return (
    <PageShell>
      <div className="grid gap-10 lg:grid-cols-[1fr_1.1fr]">
        <div>
          <PageHeader
            title="Give to the rescue"
            lead={`${center.configured ? center.name : "The rescue"} cares for injured and orphaned bats and returns them to the wild. Your gift pays for their food, medicine and flight cages.`}
          />
          <p className="text-ink-soft">
            No goods or services are given in exchange for a gift on its own, so all of it is tax-deductible as the law allows; your
            receipt says so.
          </p>
        </div>
        <div className="rounded-xl border border-paper-200 bg-white p-6 shadow-card">
          <GivingForm defaultContact={user ? { name: user.name, email: user.email } : null} fee={{ basisPoints: settings.feeBasisPoints, fixedCents: settings.feeFixedCents }} />
        </div>
      </div>
    </PageShell>
  );
}
