import type { Metadata } from "next";
import { UnsubscribeButton } from "@/components/account/unsubscribe-button";
import { PageHeader, PageShell } from "@/components/page-header";
import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";
import { findSubscriptionByToken } from "@/lib/mail/queries/preferences";

// A private page, opened by its own link or token: rendered per request, and it may wait for its data.
export const instant = false;

// The token is in the URL: keep it out of Referer headers and out of search engines.
export const metadata: Metadata = {
  title: "Stop seasonal reminders",
  referrer: "no-referrer",
  robots: { index: false, follow: false },
};

export default async function UnsubscribePage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const { token } = await searchParams;
  const value = typeof token === "string" ? token : "";
  const subscription = value ? await findSubscriptionByToken({ token: value }) : null;
  return (
    <PageShell narrow>
      <PageHeader title="Stop seasonal reminders" />
      {!subscription ? (
        <Alert tone="poor" title="This link does not work">
          It is not one we sent, or it was cut short. Sign in and change your reminders on your
          e-mail preferences page.
        </Alert>
      ) : subscription.seasonalReminders ? (
        <div className="flex flex-col gap-4">
          <p>
            You get a short upkeep reminder at the start of winter, spring and the maternity season.
            One click stops them; no sign-in needed.
          </p>
          <UnsubscribeButton token={value} />
        </div>
      ) : (
        <Alert tone="good" title="You are not getting seasonal reminders">
          Nothing more to do. Order messages and receipts still come when you buy or give.
        </Alert>
      )}
      <div className="mt-6">
        <ButtonLink href="/account/preferences" variant="ghost">
          E-mail preferences
        </ButtonLink>
      </div>
    </PageShell>
  );
}
