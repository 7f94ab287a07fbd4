import { eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { getDb } from "@/db/client";
import { emailPreferences, outbox, users } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import { DEMO_ORGANIZATION, DEMO_USERS } from "@/lib/demo/seed-data";
import type { SessionUser } from "@/lib/auth/session";
import { listGiftsForUser } from "@/lib/mail/queries/donor-gifts";
import { requestPasswordReset } from "@/lib/mail/commands/password-reset";
import { getEmailPreferences } from "@/lib/mail/queries/preferences";
import { queueSeasonalReminders } from "@/lib/mail/commands/seasonal-reminders";
import { deliverPendingMail } from "@/lib/mail/commands/sender";
import type { MailStandIn } from "@/stand-ins/mail/server";
import { resetDb } from "../../support/db";
import { startTestPayments } from "../../support/payments";
import { checkoutInput, pay, startCheckout } from "../checkout/helpers";
import { clearInbox, startTestMail } from "./helpers";

const session = vi.hoisted(() => ({ user: null as SessionUser | null }));
vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => session.user }));

const { savePreferencesAction } = await import("@/lib/mail/actions");
const { emailYearEndStatementAction } = await import("@/lib/mail/actions");
const { unsubscribeAction } = await import("@/lib/mail/actions");
const { resendMailAction } = await import("@/lib/mail/actions");
const { POST: oneClickPost } = await import("@/app/api/account/unsubscribe/route");

let payments: Awaited<ReturnType<typeof startTestPayments>>;
let mail: MailStandIn;

async function demoUser(role: SessionUser["role"]): Promise<SessionUser> {
  const account = DEMO_USERS.find((u) => u.role === role)!;
  const db = await getDb();
  const [row] = await db.select().from(users).where(eq(users.email, account.email));
  return { id: row!.id, name: row!.name, email: row!.email, role };
}

beforeAll(async () => {
  payments = await startTestPayments();
  mail = await startTestMail();
});
afterAll(async () => {
  await payments.close();
  await mail.close();
});
beforeEach(async () => {
  await seedDemo(await resetDb());
  await clearInbox(mail);
  session.user = null;
});

const DECEMBER = new Date("2030-12-03T09:00:00Z");

describe("seasonal reminders", () => {
  it("are off until asked for; then one per season, with one-click unsubscribe headers that work without signing in", async () => {
    const supporter = await demoUser("customer");
    expect(await queueSeasonalReminders({ now: DECEMBER })).toMatchObject({ queued: 0 });

    session.user = supporter;
    expect(await savePreferencesAction({ seasonalReminders: true })).toEqual({
      ok: true,
      data: { seasonalReminders: true },
    });
    expect(await queueSeasonalReminders({ now: DECEMBER })).toEqual({
      reminder: { id: "winter-check", season: "winter", hemisphere: "north", seasonKey: "winter-check-2030" },
      queued: 1,
    });
    // The next day's run, or a second app instance, adds nothing.
    expect(await queueSeasonalReminders({ now: new Date("2030-12-04T09:00:00Z") })).toMatchObject({
      queued: 0,
    });
    await deliverPendingMail();
    const [message] = mail.messages();
    expect(message?.subject).toBe("Winter check for your bat house (December to February)");
    expect(message?.to).toEqual([supporter.email]);
    expect(message?.text).toMatch(/Re-caulk any seam/);
    expect(message?.text).toMatch(/Never touch a bat with bare hands/);
    const header = message?.headers?.["List-Unsubscribe"] ?? "";
    expect(message?.headers?.["List-Unsubscribe-Post"]).toBe("List-Unsubscribe=One-Click");
    const url = /^<(.+)>$/.exec(header)?.[1];
    expect(url).toMatch(/\/api\/account\/unsubscribe\?token=[A-Za-z0-9_-]{32}$/);
    expect(message?.text).toContain(
      `/unsubscribe?token=${new URL(url!).searchParams.get("token")}`,
    );

    // What a mail program does on "unsubscribe": POST the header's URL, no cookies.
    session.user = null;
    const response = await oneClickPost(
      new Request(url!, {
        method: "POST",
        body: "List-Unsubscribe=One-Click",
        headers: { "content-type": "application/x-www-form-urlencoded" },
      }),
      { params: Promise.resolve({}) },
    );
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual({ unsubscribed: true });
    expect(await getEmailPreferences({ userId: supporter.id })).toEqual({
      seasonalReminders: false,
    });
    expect(await queueSeasonalReminders({ now: new Date("2031-03-02T09:00:00Z") })).toMatchObject({
      queued: 0,
    });
  });

  it("are not sent to someone who unsubscribed after they were queued", async () => {
    const supporter = await demoUser("customer");
    session.user = supporter;
    await savePreferencesAction({ seasonalReminders: true });
    await queueSeasonalReminders({ now: DECEMBER });
    const db = await getDb();
    const [prefs] = await db
      .select()
      .from(emailPreferences)
      .where(eq(emailPreferences.userId, supporter.id));
    session.user = null;
    expect(await unsubscribeAction({ token: prefs!.unsubscribeToken })).toEqual({
      ok: true,
      data: { result: "unsubscribed" },
    });
    expect(await deliverPendingMail()).toEqual({ sent: 0, retrying: 0, failed: 1 });
    const [row] = await db.select().from(outbox);
    expect(row?.lastError).toMatch(/turned seasonal reminders off/);
    expect(mail.messages()).toHaveLength(0);
  });

  it("refuse unknown tokens", async () => {
    expect(await unsubscribeAction({ token: "x".repeat(32) })).toEqual({
      ok: true,
      data: { result: "unknown" },
    });
    const response = await oneClickPost(
      new Request(`http://localhost/api/account/unsubscribe?token=${"y".repeat(32)}`, {
        method: "POST",
      }),
      { params: Promise.resolve({}) },
    );
    expect(response.status).toBe(404);
  });

  it("need a signed-in account to change preferences", async () => {
    expect(await savePreferencesAction({ seasonalReminders: true })).toMatchObject({
      ok: false,
      error: { code: "unauthenticated" },
    });
  });
});

describe("the year-end statement", () => {
  it("totals a signed-in donor's gifts of one year and e-mails it once a day", async () => {
    const supporter = await demoUser("customer");
    for (const giftCents of [2500, 4000]) {
      const { orderId } = await startCheckout(
        checkoutInput({
          items: [],
          method: "pickup",
          address: undefined,
          giftCents,
          contact: { name: supporter.name, email: supporter.email },
        }),
        supporter,
      );
      await pay(orderId);
    }
    await payments.standIn.webhooksIdle();
    expect(
      (await listGiftsForUser({ userId: supporter.id })).map((g) => g.amountCents).sort(),
    ).toEqual([2500, 4000]);
    await deliverPendingMail();
    await clearInbox(mail);

    const year = new Date().getUTCFullYear();
    session.user = supporter;
    expect(await emailYearEndStatementAction({ year })).toEqual({
      ok: true,
      data: { queued: true },
    });
    expect(await emailYearEndStatementAction({ year })).toEqual({
      ok: true,
      data: { queued: false },
    });
    expect(await emailYearEndStatementAction({ year: 1999 })).toMatchObject({
      ok: false,
      error: { code: "bad_request" },
    });
    await deliverPendingMail();
    const [statement] = mail.messages();
    expect(statement?.subject).toBe(`Your gifts in ${year}: year-end statement`);
    expect(statement?.text).toMatch(new RegExp(`Total for ${year} +\\$65\\.00`));
    expect(statement?.text).toContain(`Your gifts in ${year}: 2 gifts, $65.00 in all.`);
    expect(statement?.text).toContain(
      `${DEMO_ORGANIZATION.legalName} (EIN ${DEMO_ORGANIZATION.taxId})`,
    );
  });
});

describe("the admin's resend", () => {
  it("requeues a failed message, copies a sent one under a new key, and refuses a sent reset link", async () => {
    const admin = await demoUser("admin");
    mail.setDown(true);
    await requestPasswordReset({ email: admin.email });
    const db = await getDb();
    await db
      .update(outbox)
      .set({ status: "failed", attempts: 10, lastError: "application_error (503)" });
    const [failed] = await db.select().from(outbox);

    session.user = await demoUser("customer");
    expect(await resendMailAction({ id: failed!.id })).toMatchObject({
      ok: false,
      error: { code: "forbidden" },
    });

    session.user = admin;
    mail.setDown(false);
    expect(await resendMailAction({ id: failed!.id })).toEqual({
      ok: true,
      data: { mode: "requeued", id: failed!.id },
    });
    expect(await deliverPendingMail()).toEqual({ sent: 1, retrying: 0, failed: 0 });
    expect(await resendMailAction({ id: failed!.id })).toMatchObject({
      ok: false,
      error: { code: "conflict", message: expect.stringMatching(/sent only once/) },
    });

    const supporter = await demoUser("customer");
    session.user = supporter;
    await emailYearEndStatementAction({ year: 2030 });
    await deliverPendingMail();
    const [statement] = await db.select().from(outbox).where(eq(outbox.kind, "year-end-statement"));
    session.user = admin;
    const copied = await resendMailAction({ id: statement!.id });
    expect(copied).toMatchObject({ ok: true, data: { mode: "copied" } });
    await deliverPendingMail();
    expect(mail.messages().filter((m) => m.subject.startsWith("Your gifts in 2030"))).toHaveLength(
      2,
    );
    expect(new Set(mail.messages().map((m) => m.idempotency_key)).size).toBe(
      mail.messages().length,
    );
  });
});
