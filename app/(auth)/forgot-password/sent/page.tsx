import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader, PageShell } from "@/components/page-header";
import { Alert } from "@/components/ui/alert";
import { RESET_REQUESTED_MESSAGE } from "@/lib/mail/password-reset-schemas";

export const metadata: Metadata = { title: "Check your inbox" };

// Where a reset request posted without script lands (lib/mail/actions.ts): a page of its own, so
// it is prerendered whole and needs no script to show.
export default function ResetRequestedPage() {
  return (
    <PageShell narrow>
      <PageHeader title="Forgot your password?" />
      <Alert tone="good" title="Check your inbox" live>
        {RESET_REQUESTED_MESSAGE}
      </Alert>
      <p className="mt-6 text-ink-soft">
        <Link className="font-bold text-moss-800 underline" href="/sign-in">
          Back to sign in
        </Link>
      </p>
    </PageShell>
  );
}
