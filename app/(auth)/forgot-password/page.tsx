import type { Metadata } from "next";
import Link from "next/link";
import { ForgotPasswordForm } from "@/components/account/forgot-password-form";
import { PageHeader, PageShell } from "@/components/page-header";

export const metadata: Metadata = { title: "Forgot your password?" };

export default function ForgotPasswordPage() {
  return (
    <PageShell narrow>
      <PageHeader
        title="Forgot your password?"
        lead="Tell us the e-mail address of your account and we will send a link to choose a new password."
      />
      <ForgotPasswordForm />
      <p className="mt-6 text-ink-soft">
        Remembered it?{" "}
        <Link className="font-bold text-moss-800 underline" href="/sign-in">
          Sign in
        </Link>
      </p>
    </PageShell>
  );
}
