import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { PageHeader, PageShell } from "@/components/page-header";
import { getSessionUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { next } = await searchParams;
  const target = typeof next === "string" && next.startsWith("/") && !next.startsWith("//") ? next : "/account";
  if (await getSessionUser()) redirect(target);
  return (
    <PageShell narrow>
      <PageHeader
        title="Create a supporter account"
        lead="Keep your orders, saved sites and gift receipts in one place. Guests can buy and give without one."
      />
      <SignUpForm next={target} />
    </PageShell>
  );
}
