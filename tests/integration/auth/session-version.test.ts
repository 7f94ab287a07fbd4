import { eq } from "drizzle-orm";
import type { JWT } from "next-auth/jwt";
import { beforeEach, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { passwordResetTokens, users } from "@/db/schema";
import { setUserRole } from "@/lib/accounts/commands";
import { authenticate } from "@/lib/auth/credentials";
import { authOptions } from "@/lib/auth/options";
import { seedDemo } from "@/lib/demo/commands";
import { DEMO_USERS } from "@/lib/demo/seed-data";
import { resetPassword } from "@/lib/mail/commands/password-reset";
import { createToken } from "@/lib/mail/tokens";
import { resetDb } from "../../support/db";

// A session carries the account's session version from sign-in; next-auth's jwt callback runs
// on every request that reads the session (getServerSession) and drops a stale one.

const supporter = DEMO_USERS.find((u) => u.role === "customer")!;
const adminUser = DEMO_USERS.find((u) => u.role === "admin")!;
const jwt = authOptions.callbacks!.jwt!;

async function signIn(email: string, password: string): Promise<JWT> {
  const user = await authenticate({ email, password }, "unknown");
  return jwt({ token: { name: user.name, email: user.email, sub: user.id }, user, account: null, trigger: "signIn" } as Parameters<typeof jwt>[0]);
}

/** The token on a later request: what getSessionUser reads through the same callback. */
async function onNextRequest(token: JWT): Promise<JWT> {
  return jwt({ token } as Parameters<typeof jwt>[0]);
}

async function resetWithLink(userId: string, password: string) {
  const { token, tokenHash } = createToken();
  const db = await getDb();
  await db.insert(passwordResetTokens).values({ userId, tokenHash, expiresAt: new Date(Date.now() + 10 * 60_000) });
  await resetPassword({ token, password });
}

describe("a session version on the account", () => {
  beforeEach(async () => {
    await seedDemo(await resetDb());
  });

  it("keeps a session while nothing changed", async () => {
    const token = await signIn(supporter.email, supporter.password);
    expect(token.sessionVersion).toBe(0);
    const later = await onNextRequest(token);
    expect(later.id).toBe(token.id);
    expect(later.role).toBe("customer");
  });

  it("ends sessions signed in before a password reset, and the new sign-in works", async () => {
    const before = await signIn(supporter.email, supporter.password);
    const otherDevice = await signIn(supporter.email, supporter.password);
    await resetWithLink(before.id!, "new-kestrel-willow-gate");
    const db = await getDb();
    const [row] = await db.select().from(users).where(eq(users.id, before.id!));
    expect(row?.sessionVersion).toBe(1);
    for (const stale of [before, otherDevice]) {
      const later = await onNextRequest(stale);
      expect(later.id).toBeUndefined();
      expect(later.role).toBeUndefined();
    }
    const fresh = await signIn(supporter.email, "new-kestrel-willow-gate");
    expect(fresh.sessionVersion).toBe(1);
    expect((await onNextRequest(fresh)).id).toBe(before.id);
  });

  it("ends the sessions of an account whose role changes", async () => {
    const token = await signIn(supporter.email, supporter.password);
    const admin = await signIn(adminUser.email, adminUser.password);
    await setUserRole({ id: token.id!, role: "staff", actorId: admin.id! });
    expect((await onNextRequest(token)).id).toBeUndefined();
    // The administrator who made the change stays signed in.
    expect((await onNextRequest(admin)).id).toBe(admin.id);
    const again = await signIn(supporter.email, supporter.password);
    expect((await onNextRequest(again)).role).toBe("staff");
  });

  it("treats a token from before session versions existed as version 0", async () => {
    const token = await signIn(supporter.email, supporter.password);
    const legacy: JWT = { ...token };
    delete legacy.sessionVersion;
    expect((await onNextRequest(legacy)).id).toBe(token.id);
  });
});
