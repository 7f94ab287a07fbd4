import { count, eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { signInAttempts, users } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import { DEMO_USERS } from "@/lib/demo/seed-data";
import { authenticate, SignInRefused } from "@/lib/auth/credentials";
import { MAX_FAILURES_PER_ACCOUNT } from "@/lib/auth/throttle";
import { resetDb } from "../../support/db";

const customer = DEMO_USERS[0];

describe("sign-in with e-mail and password", () => {
  beforeEach(async () => {
    const db = await resetDb();
    await seedDemo(db);
  });

  it("accepts each demo account with its role", async () => {
    for (const u of DEMO_USERS) {
      const user = await authenticate({ email: u.email, password: u.password }, "10.0.0.1");
      expect(user.role).toBe(u.role);
    }
  });

  it("treats the e-mail case-insensitively", async () => {
    const user = await authenticate({ email: customer.email.toUpperCase(), password: customer.password }, "10.0.0.1");
    expect(user.email).toBe(customer.email);
  });

  it("refuses a wrong password and an unknown account with the same message", async () => {
    const wrong = authenticate({ email: customer.email, password: "not-the-password" }, "10.0.0.2");
    await expect(wrong).rejects.toThrow(SignInRefused);
    await expect(wrong).rejects.toThrow("don't match an account");
    await expect(authenticate({ email: "nobody@example.org", password: "whatever-it-is" }, "10.0.0.2")).rejects.toThrow(
      "don't match an account",
    );
  });

  it("refuses malformed input without touching the database", async () => {
    const db = await resetDb();
    await expect(authenticate({ email: "not an e-mail", password: "" }, "10.0.0.3")).rejects.toThrow(
      "Enter your e-mail address and password.",
    );
    const [row] = await db.select({ n: count() }).from(signInAttempts);
    expect(row?.n).toBe(0);
  });

  it("throttles an account after repeated failures, even with the right password, and writes nothing more", async () => {
    const db = await resetDb();
    await seedDemo(db);
    for (let i = 0; i < MAX_FAILURES_PER_ACCOUNT; i++) {
      await expect(authenticate({ email: customer.email, password: `wrong-${i}-password` }, `10.1.0.${i}`)).rejects.toThrow(
        "don't match",
      );
    }
    const before = await db.select({ n: count() }).from(signInAttempts);
    await expect(authenticate({ email: customer.email, password: customer.password }, "10.1.0.99")).rejects.toThrow(
      "Too many tries for this account",
    );
    const after = await db.select({ n: count() }).from(signInAttempts);
    expect(after[0]?.n).toBe(before[0]?.n);
    // Another account from the same addresses is not affected.
    const staff = DEMO_USERS[1];
    await expect(authenticate({ email: staff.email, password: staff.password }, "10.1.0.1")).resolves.toMatchObject({
      role: "staff",
    });
  });

  it("stores only a bcrypt hash, never the password", async () => {
    const db = await resetDb();
    await seedDemo(db);
    const [row] = await db.select().from(users).where(eq(users.email, customer.email));
    expect(row?.passwordHash).toMatch(/^\$2[aby]\$11\$/);
    expect(row?.passwordHash).not.toContain(customer.password);
  });
});
