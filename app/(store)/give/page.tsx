import type { Metadata } from "next";
import { GiveForm } from "@/components/checkout/give-form";
import { PageHeader, PageShell } from "@/components/page-header";
import { getSessionUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Give" };

export default async function GivePage() {
  const user = await getSessionUser();
  return (
    <PageShell>
      <div className="grid gap-10 lg:grid-cols-[1fr_1.1fr]">
        <div>
          <PageHeader
            title="Give to the rescue"
            lead="Cedar Hollow Wildlife Rescue cares for injured and orphaned bats and returns them to the wild. Your gift pays for their food, medicine and flight cages."
          />
          <p className="text-ink-soft">
            No goods or services are given in exchange for a gift on its own, so all of it is tax-deductible as the law allows; your
            receipt says so.
          </p>
        </div>
        <div className="rounded-xl border border-paper-200 bg-white p-6 shadow-card">
          <GiveForm defaultContact={user ? { name: user.name, email: user.email } : null} />
        </div>
      </div>
    </PageShell>
  );
}
