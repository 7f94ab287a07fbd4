import { count, eq } from "drizzle-orm";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { signInAttempts } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import { authenticate, clientAddress } from "@/lib/auth/credentials";
import { env } from "@/lib/config/env";
import { recordSignInAttempt } from "@/lib/auth/commands";
import { MAX_FAILURES_PER_ADDRESS } from "@/lib/auth/throttle";
import { resetDb } from "../../support/db";

// Sign-in throttling counts failures per address; a client that changes its X-Forwarded-For on
// every try must still be counted as the same address.

const globalForEnv = globalThis as unknown as { __roostwrightEnv?: ReturnType<typeof env> };
const saved = env();
function useProxies(n: number) {
  globalForEnv.__roostwrightEnv = { ...saved, TRUSTED_PROXY_COUNT: n };
}

// A failed try as authenticate() records it, under the address the headers resolve to (the
// password check itself is skipped: thirty bcrypt rounds would only slow the suite down).
async function failFrom(headers: Headers, i: number) {
  await recordSignInAttempt({ email: `nobody-${i}@example.org`, ip: clientAddress(headers), succeeded: false });
}

describe("the per-address sign-in count", () => {
  beforeEach(async () => {
    const db = await resetDb();
    await seedDemo(db);
  });
  afterEach(() => {
    globalForEnv.__roostwrightEnv = saved;
  });

  it("is not reset by a forged X-Forwarded-For with no trusted proxy (the default)", async () => {
    useProxies(0);
    expect(saved.TRUSTED_PROXY_COUNT).toBe(0);
    for (let i = 0; i < MAX_FAILURES_PER_ADDRESS; i++) await failFrom(new Headers({ "x-forwarded-for": `10.9.${i}.1` }), i);
    await expect(
      authenticate({ email: "another@example.org", password: "wrong-password-here" }, clientAddress(new Headers({ "x-forwarded-for": "192.0.2.200" }))),
    ).rejects.toThrow("Too many sign-in tries from your network");
  });

  it("is not reset by a forged entry in front of what our one proxy wrote", async () => {
    useProxies(1);
    // The proxy appends the real client (203.0.113.9); the client makes up everything before it.
    for (let i = 0; i < MAX_FAILURES_PER_ADDRESS; i++) await failFrom(new Headers({ "x-forwarded-for": `10.9.${i}.1, 203.0.113.9` }), i);
    await expect(
      authenticate({ email: "another@example.org", password: "wrong-password-here" }, clientAddress(new Headers({ "x-forwarded-for": "192.0.2.200, 203.0.113.9" }))),
    ).rejects.toThrow("Too many sign-in tries from your network");
    // A different real client behind the same proxy is not affected.
    await expect(
      authenticate({ email: "third@example.org", password: "wrong-password-here" }, clientAddress(new Headers({ "x-forwarded-for": "203.0.113.10" }))),
    ).rejects.toThrow("don't match an account");
  });

  it("records the attempts under the resolved address, not the header's first entry", async () => {
    useProxies(1);
    await expect(
      authenticate({ email: "nobody@example.org", password: "wrong-password-here" }, clientAddress(new Headers({ "x-forwarded-for": "6.6.6.6, 203.0.113.9" }))),
    ).rejects.toThrow("don't match");
    const db = await getDb();
    const rows = await db.select({ ip: signInAttempts.ip, n: count() }).from(signInAttempts).groupBy(signInAttempts.ip);
    expect(rows).toEqual([{ ip: "203.0.113.9", n: 1 }]);
    expect(await db.select().from(signInAttempts).where(eq(signInAttempts.ip, "6.6.6.6"))).toEqual([]);
  });
});
