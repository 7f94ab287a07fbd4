import "server-only";
import { asc, eq, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { users } from "@/db/schema";
import { hashPassword } from "@/lib/auth/passwords";
import type { SignUp } from "@/lib/auth/password-policy";
import type { Role } from "@/lib/auth/roles";
import { AppError } from "@/lib/http/errors";

export type UserSummary = { id: string; email: string; name: string; role: Role; createdAt: Date };

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

export async function listUsers(): Promise<UserSummary[]> {
  const db = await getDb();
  return db
    .select({ id: users.id, email: users.email, name: users.name, role: users.role, createdAt: users.createdAt })
    .from(users)
    .orderBy(asc(users.email));
}

export async function getUserById({ id }: { id: string }): Promise<UserSummary | null> {
  const db = await getDb();
  const [row] = await db
    .select({ id: users.id, email: users.email, name: users.name, role: users.role, createdAt: users.createdAt })
    .from(users)
    .where(eq(users.id, id))
    .limit(1);
  return row ?? null;
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
