import type { Metadata } from "next";
import { SignOutButton } from "@/components/auth/sign-out-button";
import { PageHeader, PageShell } from "@/components/page-header";
import { Card } from "@/components/ui/card";
import { requirePageUser } from "@/lib/auth/guard";
import { ROLE_LABELS } from "@/lib/auth/roles";

export const metadata: Metadata = { title: "My account" };

export default async function AccountPage() {
  const user = await requirePageUser("account", "/account");
  return (
    <PageShell>
      <PageHeader title={`Hello, ${user.name}`} lead="Your orders, gifts and saved sites live here." />
      <div className="grid gap-6 md:grid-cols-2">
        <Card>
          <h2 className="font-display text-xl font-semibold text-moss-900">Your details</h2>
          <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
            <dt className="text-ink-soft">Name</dt>
            <dd>{user.name}</dd>
            <dt className="text-ink-soft">E-mail</dt>
            <dd>{user.email}</dd>
            <dt className="text-ink-soft">Account</dt>
            <dd>{ROLE_LABELS[user.role]}</dd>
          </dl>
          <div className="mt-5">
            <SignOutButton />
          </div>
        </Card>
      </div>
    </PageShell>
  );
}
