import "server-only";
import { redirect } from "next/navigation";
import { AppError } from "@/lib/http/errors";
import { can, type Permission } from "./roles";
import { getSessionUser, type SessionUser } from "./session";

/**
 * The one role check used by layouts, pages, server actions and route handlers.
 * Signed out → 401 (pages: redirect to sign-in); wrong role → 403 (pages: the refusal page).
 */
export async function requireUser(permission?: Permission): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) throw new AppError("unauthenticated", "Please sign in first.");
  if (permission && !can(user.role, permission)) {
    throw new AppError("forbidden", "Your account does not have access to this.");
  }
  return user;
}

/** For pages and layouts: redirects a signed-out visitor, sends the wrong role to /forbidden. */
export async function requirePageUser(permission: Permission | undefined, returnTo: string): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) redirect(`/sign-in?next=${encodeURIComponent(returnTo)}`);
  if (permission && !can(user.role, permission)) redirect(`/forbidden?from=${encodeURIComponent(returnTo)}`);
  return user;
}
