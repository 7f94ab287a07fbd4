import type { Metadata } from "next";
import { PreferencesForm } from "@/components/account/preferences-form";
import { PageHeader, PageShell } from "@/components/page-header";
import { Card } from "@/components/ui/card";
import { requirePageUser } from "@/lib/auth/guard";
import { getEmailPreferences } from "@/lib/mail/queries/preferences";
import { UPKEEP_CALENDAR } from "@/lib/mail/upkeep-calendar";

export const metadata: Metadata = { title: "E-mail preferences" };

export default async function PreferencesPage() {
  const user = await requirePageUser("account", "/account/preferences");
  const preferences = await getEmailPreferences({ userId: user.id });
  const reminded = UPKEEP_CALENDAR.filter((season) => season.id !== "autumn");
  return (
    <PageShell>
      <PageHeader title="E-mail preferences" lead={`What we send to ${user.email}.`} />
      <div className="grid gap-6 md:grid-cols-2">
        <Card as="section" aria-labelledby="reminders-heading" className="flex flex-col gap-4">
          <h2 id="reminders-heading" className="font-display text-xl font-semibold text-moss-900">
            Seasonal reminders
          </h2>
          <p className="text-ink-soft">
            A short note at the start of each season, so your house gets the right care at the right
            time:
          </p>
          <ul className="flex list-disc flex-col gap-1 pl-5">
            {reminded.map((season) => (
              <li key={season.id}>
                <strong>{season.title}</strong> ({season.months}): {season.summary}
              </li>
            ))}
          </ul>
          <PreferencesForm initial={preferences} />
        </Card>
        <Card as="section" aria-labelledby="always-heading" className="flex flex-col gap-3">
          <h2 id="always-heading" className="font-display text-xl font-semibold text-moss-900">
            Always sent
          </h2>
          <p className="text-ink-soft">
            Messages about something you did are always sent: order confirmations, install guides,
            shipping news, receipts for gifts, refunds and password resets. They are one per event,
            never a newsletter.
          </p>
        </Card>
      </div>
    </PageShell>
  );
}
