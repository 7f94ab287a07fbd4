import type { Metadata } from "next";
import { ResetPasswordForm } from "@/components/account/reset-password-form";
import { PageHeader, PageShell } from "@/components/page-header";
import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";
import { checkResetToken } from "@/lib/mail/queries/password-reset";

// A private page, opened by its own link or token: rendered per request, and it may wait for its data.
export const instant = false;

// The token is in the URL: keep it out of Referer headers and out of search engines.
export const metadata: Metadata = {
  title: "Choose a new password",
  referrer: "no-referrer",
  robots: { index: false, follow: false },
};

const PROBLEMS = {
  unknown:
    "This link is not one we sent, or it was cut short. Copy the whole link from the e-mail, or ask for a new one.",
  used: "This link was already used. Each link works once; ask for a new one if you need to change your password again.",
  expired: "This link has expired: links work for 30 minutes. Ask for a new one.",
} as const;

export default async function ResetPasswordPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const { token } = await searchParams;
  const value = typeof token === "string" ? token : "";
  const state =
    value.length >= 20 && value.length <= 200 ? await checkResetToken({ token: value }) : "unknown";
  return (
    <PageShell narrow>
      <PageHeader title="Choose a new password" />
      {state === "usable" ? (
        <ResetPasswordForm token={value} />
      ) : (
        <div className="flex flex-col gap-4">
          <Alert tone="poor" title="This link does not work">
            {PROBLEMS[state]}
          </Alert>
          <ButtonLink href="/forgot-password" variant="secondary">
            Ask for a new link
          </ButtonLink>
        </div>
      )}
    </PageShell>
  );
}
