import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { Suspense } from "react";
import { SignInForm } from "@/components/auth/sign-in-form";
import { PageHeader, PageShell } from "@/components/page-header";
import { formNotice } from "@/lib/auth/form-notices";
import { getSessionUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Sign in" };

function safeNext(next: string | string[] | undefined): string {
  // Only same-site paths: an open redirect would let a link send people elsewhere after sign-in.
  return typeof next === "string" && next.startsWith("/") && !next.startsWith("//") ? next : "/welcome";
}

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

// The heading is the prerendered shell; the form streams in once the address's `next` and the
// session are read (someone already signed in goes straight on).
export default function SignInPage({ searchParams }: { searchParams: SearchParams }) {
  return (
    <PageShell narrow>
      <PageHeader title="Sign in" lead="Staff, volunteers and supporters sign in here." />
      <Suspense fallback={<div className="min-h-96" />}>
        <SignInBody searchParams={searchParams} />
      </Suspense>
    </PageShell>
  );
}

async function SignInBody({ searchParams }: { searchParams: SearchParams }) {
  const params = await searchParams;
  const next = safeNext(params.next);
  if (await getSessionUser()) redirect(next);
  return (
    <>
      <SignInForm next={next} notice={formNotice(params.notice)} />
      <p className="mt-6 text-ink-soft">
        New here?{" "}
        <Link className="font-bold text-moss-800 underline" href={`/sign-up?next=${encodeURIComponent(next)}`}>
          Create a supporter account
        </Link>
        . You can also check out as a guest.
      </p>
      <p className="mt-2 text-ink-soft">
        <Link className="text-moss-800 underline" href="/forgot-password">
          Forgot your password?
        </Link>
      </p>
    </>
  );
}
