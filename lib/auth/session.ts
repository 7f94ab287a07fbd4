import "server-only";
import { getServerSession } from "next-auth";
import { connection } from "next/server";
import { authOptions } from "./options";
import { isRole, type Role } from "./roles";

export type SessionUser = { id: string; name: string; email: string; role: Role };

/** The signed-in user from the session cookie, or null. */
export async function getSessionUser(): Promise<SessionUser | null> {
  // Who is asking is known only at request time: without this the session read (which draws a
  // random token before it reads the cookie) would be attempted in the prerender.
  await connection();
  const session = await getServerSession(authOptions);
  const user = session?.user;
  if (!user || !user.id || !isRole(user.role)) return null;
  return { id: user.id, name: user.name ?? "", email: user.email ?? "", role: user.role };
}
