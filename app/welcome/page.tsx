import { redirect } from "next/navigation";
import { ROLE_HOME } from "@/lib/auth/roles";
import { getSessionUser } from "@/lib/auth/session";

// A private page, opened by its own link or token: rendered per request, and it may wait for its data.
export const instant = false;

// After sign-in every role lands in its own area.
export default async function WelcomePage() {
  const user = await getSessionUser();
  redirect(user ? ROLE_HOME[user.role] : "/sign-in");
}
