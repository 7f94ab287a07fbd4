import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader, PageShell } from "@/components/page-header";
import { Card } from "@/components/ui/card";
import { requirePageUser } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "Admin" };

const SECTIONS = [
  { href: "/admin/users", title: "Accounts and roles", text: "Who can use the workshop, the shipping desk and this page." },
  { href: "/admin/mail", title: "Mail", text: "Messages the store sent or is waiting to send, failures, and sending again." },
  { href: "/admin/settings", title: "Center settings", text: "Receipt details, parcel rates and sales tax." },
  { href: "/admin/statements", title: "Year-end statements", text: "Preview a donor's statement for a year and send it again." },
  { href: "/admin/reports", title: "Reports", text: "Sales and gifts by month, monthly donors, stock value and the build plan, with CSV files." },
];

export default async function AdminHomePage() {
  await requirePageUser("admin:users", "/admin");
  return (
    <PageShell>
      <PageHeader title="Admin" lead="Accounts, the center's details, rates and refunds." />
      <div className="grid gap-4 md:grid-cols-2">
        {SECTIONS.map((s) => (
          <Card key={s.href}>
            <h2 className="font-display text-xl font-semibold">
              <Link href={s.href} className="text-moss-800 underline">
                {s.title}
              </Link>
            </h2>
            <p className="mt-1 text-ink-soft">{s.text}</p>
          </Card>
        ))}
      </div>
    </PageShell>
  );
}
