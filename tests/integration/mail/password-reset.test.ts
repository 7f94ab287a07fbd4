import { eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { outbox, passwordResetTokens, users } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import { DEMO_USERS } from "@/lib/demo/seed-data";
import { verifyPassword } from "@/lib/auth/passwords";
import { AppError } from "@/lib/http/errors";
import { requestPasswordReset, resetPassword, RESET_REQUESTS_PER_HOUR } from "@/lib/mail/commands/password-reset";
import { checkResetToken } from "@/lib/mail/queries/password-reset";
import { deliverPendingMail } from "@/lib/mail/commands/sender";
import type { MailStandIn } from "@/stand-ins/mail/server";
import { resetDb } from "../../support/db";
import { clearInbox, startTestMail } from "./helpers";

let mail: MailStandIn;
const supporter = DEMO_USERS.find((u) => u.role === "customer")!;
const minutes = (from: Date, n: number) => new Date(from.getTime() + n * 60_000);
// The outbox row's first attempt is stamped by the database clock at insert, a moment after `now`.
const sendAt = (now: Date) =>
  deliverPendingMail({ now: new Date(Math.max(now.getTime(), Date.now())) });

beforeAll(async () => {
  mail = await startTestMail();
});
afterAll(async () => mail.close());
beforeEach(async () => {
  await seedDemo(await resetDb());
  await clearInbox(mail);
});

/** Asks for a reset, sends the mail, and reads the token back out of the link in the inbox. */
async function tokenFromInbox(now: Date): Promise<string> {
  await requestPasswordReset({ email: supporter.email, now });
  await sendAt(now);
  const [message] = mail.messages().filter((m) => m.subject === "Choose a new password");
  const link = /(http\S+\/reset-password\?token=([A-Za-z0-9_-]+))/.exec(message?.text ?? "");
  if (!link?.[2]) throw new Error("no reset link in the message");
  return decodeURIComponent(link[2]);
}

async function refusal(promise: Promise<unknown>): Promise<string> {
  try {
    await promise;
  } catch (error) {
    if (error instanceof AppError) return `${error.code}: ${error.message}`;
    throw error;
  }
  return "accepted";
}

describe("the password reset flow", () => {
  it("e-mails a single-use link that sets the new password, and is refused the second time", async () => {
    const now = new Date();
    const token = await tokenFromInbox(now);
    expect(await checkResetToken({ token, now })).toBe("usable");
    await resetPassword({ token, password: "moth-lantern-orchard", now: minutes(now, 1) });
    const db = await getDb();
    const [user] = await db.select().from(users).where(eq(users.email, supporter.email));
    expect(await verifyPassword("moth-lantern-orchard", user!.passwordHash)).toBe(true);
    expect(await verifyPassword(supporter.password, user!.passwordHash)).toBe(false);

    expect(
      await refusal(
        resetPassword({ token, password: "another-long-phrase", now: minutes(now, 2) }),
      ),
    ).toMatch(/^bad_request: This reset link has expired or was already used/);
    expect(await checkResetToken({ token, now: minutes(now, 2) })).toBe("used");
  });

  it("is refused at 30 minutes, and accepted a second before", async () => {
    const now = new Date();
    const early = await tokenFromInbox(now);
    await clearInbox(mail);
    expect(
      await refusal(
        resetPassword({ token: early, password: "moth-lantern-orchard", now: minutes(now, 30) }),
      ),
    ).toMatch(/^bad_request/);
    expect(await checkResetToken({ token: early, now: minutes(now, 30) })).toBe("expired");
    const later = minutes(now, 31);
    const fresh = await tokenFromInbox(later);
    expect(
      await refusal(
        resetPassword({
          token: fresh,
          password: "moth-lantern-orchard",
          now: new Date(later.getTime() + 30 * 60_000 - 1000),
        }),
      ),
    ).toBe("accepted");
  });

  it("stores only the token's hash, keeps it sealed in the outbox, and removes it once sent", async () => {
    const now = new Date();
    await requestPasswordReset({ email: supporter.email, now });
    const db = await getDb();
    const [queued] = await db.select().from(outbox).where(eq(outbox.kind, "password-reset"));
    const [stored] = await db.select().from(passwordResetTokens);
    await sendAt(now);
    const token = /token=([A-Za-z0-9_-]+)/.exec(mail.messages()[0]?.text ?? "")?.[1] ?? "";
    expect(token).toHaveLength(43);
    expect(JSON.stringify(queued!.payload)).not.toContain(token);
    expect(stored!.tokenHash).not.toBe(token);
    expect(stored!.expiresAt.getTime() - stored!.createdAt.getTime()).toBe(30 * 60_000);
    const [sent] = await db.select().from(outbox).where(eq(outbox.id, queued!.id));
    expect(sent!.status).toBe("sent");
    expect(sent!.payload).toMatchObject({ sealedToken: null });
  });

  it("answers the same for an unknown address and sends nothing", async () => {
    await expect(requestPasswordReset({ email: "nobody@example.org" })).resolves.toBeUndefined();
    const db = await getDb();
    expect(await db.select().from(outbox)).toHaveLength(0);
    expect(await db.select().from(passwordResetTokens)).toHaveLength(0);
  });

  it(`sends at most ${RESET_REQUESTS_PER_HOUR} links an hour to one account`, async () => {
    const now = new Date();
    for (let i = 0; i < RESET_REQUESTS_PER_HOUR + 2; i += 1)
      await requestPasswordReset({ email: supporter.email, now: minutes(now, i) });
    const db = await getDb();
    expect(await db.select().from(outbox)).toHaveLength(RESET_REQUESTS_PER_HOUR);
    await requestPasswordReset({ email: supporter.email, now: minutes(now, 61) });
    expect(await db.select().from(outbox)).toHaveLength(RESET_REQUESTS_PER_HOUR + 1);
  });

  it("spends every other open link of the account with the one used", async () => {
    const now = new Date();
    const first = await tokenFromInbox(now);
    await clearInbox(mail);
    const second = await tokenFromInbox(minutes(now, 1));
    await resetPassword({ token: second, password: "moth-lantern-orchard", now: minutes(now, 2) });
    expect(await checkResetToken({ token: first, now: minutes(now, 2) })).toBe("used");
  });
});
