import "server-only";
import { asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { users } from "@/db/schema";
import type { Role } from "@/lib/auth/roles";

export type UserSummary = { id: string; email: string; name: string; role: Role; createdAt: Date };

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
