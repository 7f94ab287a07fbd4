import type { Metadata } from "next";
import { PageHeader, PageShell } from "@/components/page-header";
import { StopQuestionsButton } from "@/components/roost-reports/stop-questions-button";
import { Alert } from "@/components/ui/alert";
import { checkStopLink } from "@/lib/roost-reports/link-answers";

// A private page, opened by its own link or token: rendered per request, and it may wait for its data.
export const instant = false;

export const metadata: Metadata = {
  title: "Stop end-of-season questions",
  referrer: "no-referrer",
  robots: { index: false, follow: false },
};

export default async function StopQuestionsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { token } = await searchParams;
  const value = typeof token === "string" ? token : "";
  const good = value ? checkStopLink({ token: value }) : false;
  return (
    <PageShell narrow>
      <PageHeader title="Stop end-of-season questions" />
      {good ? (
        <div className="flex flex-col gap-4">
          <p>After each summer we ask whether bats moved into your house. One click stops these questions for your e-mail address; no sign-in needed.</p>
          <StopQuestionsButton token={value} />
        </div>
      ) : (
        <Alert tone="poor" title="This link does not work">
          It is not one we sent, or it was cut short. Reply to any of our e-mails and we will stop the questions.
        </Alert>
      )}
    </PageShell>
  );
}
