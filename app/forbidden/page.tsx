import type { Metadata } from "next";
import { PageHeader, PageShell } from "@/components/page-header";
import { ButtonLink } from "@/components/ui/button";
import { getSessionUser } from "@/lib/auth/session";
import { ROLE_HOME, ROLE_LABELS } from "@/lib/auth/roles";

// A private page, opened by its own link or token: rendered per request, and it may wait for its data.
export const instant = false;

export const metadata: Metadata = { title: "Not for this account" };

export default async function ForbiddenPage() {
  const user = await getSessionUser();
  return (
    <PageShell narrow>
      <PageHeader
        title="This part of the store is not open to your account"
        lead={
          user
            ? `You are signed in as ${user.name} (${ROLE_LABELS[user.role]}). If you need access, ask an administrator at the center.`
            : "Sign in with an account that has access."
        }
      />
      <ButtonLink href={user ? ROLE_HOME[user.role] : "/sign-in"}>{user ? "Go to your area" : "Sign in"}</ButtonLink>
    </PageShell>
  );
}
