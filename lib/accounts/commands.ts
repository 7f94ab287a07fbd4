import "server-only";
import { eq, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { users } from "@/db/schema";
import { hashPassword } from "@/lib/auth/passwords";
import type { SignUp } from "@/lib/auth/password-policy";
import type { Role } from "@/lib/auth/roles";
import { AppError } from "@/lib/http/errors";
import type { UserSummary } from "./queries";

export async function createCustomer({ name, email, password }: SignUp): Promise<UserSummary> {
  const db = await getDb();
  const [row] = await db
    .insert(users)
    .values({ name, email, passwordHash: await hashPassword(password), role: "customer" })
    .onConflictDoNothing()
    .returning();
  if (!row) {
    throw new AppError("conflict", "An account with that e-mail already exists. Sign in, or reset your password.", {
      email: "An account with that e-mail already exists.",
    });
  }
  return { id: row.id, email: row.email, name: row.name, role: row.role, createdAt: row.createdAt };
}

export async function setUserRole({ id, role, actorId }: { id: string; role: Role; actorId: string }) {
  if (id === actorId && role !== "admin") {
    throw new AppError("conflict", "You cannot take away your own administrator role; ask another administrator.");
  }
  const db = await getDb();
  // A new role ends the account's sessions: it signs in again and gets the role's own pages.
  const [row] = await db
    .update(users)
    .set({ role, sessionVersion: sql`${users.sessionVersion} + 1` })
    .where(eq(users.id, id))
    .returning({ id: users.id });
  if (!row) throw new AppError("not_found", "No account has that id.");
  return row;
}
