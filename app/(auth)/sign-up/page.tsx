import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { Suspense } from "react";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { PageHeader, PageShell } from "@/components/page-header";
import { formNotice } from "@/lib/auth/form-notices";
import { getSessionUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Create an account" };

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

// The heading is the prerendered shell; the form streams in once the session is read.
export default function SignUpPage({ searchParams }: { searchParams: SearchParams }) {
  return (
    <PageShell narrow>
      <PageHeader
        title="Create a supporter account"
        lead="Keep your orders, saved sites and gift receipts in one place. Guests can buy and give without one."
      />
      <Suspense fallback={<div className="min-h-96" />}>
        <SignUpBody searchParams={searchParams} />
      </Suspense>
    </PageShell>
  );
}

async function SignUpBody({ searchParams }: { searchParams: SearchParams }) {
  const { next, notice } = await searchParams;
  const target = typeof next === "string" && next.startsWith("/") && !next.startsWith("//") ? next : "/account";
  if (await getSessionUser()) redirect(target);
  return <SignUpForm next={target} notice={formNotice(notice)} />;
}
