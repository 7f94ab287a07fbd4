import { randomBytes } from "node:crypto";
import { eq } from "drizzle-orm";
import { TestClock } from "pg-boss";
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { getDb } from "@/db/client";
import { emailPreferences, outbox, users } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import { DEMO_USERS } from "@/lib/demo/seed-data";
import { RESERVATION_MS } from "@/lib/checkout/commands/orders";
import { defineJob, listJobs, type JobDefinition } from "@/lib/jobs/registry";
import { startJobs, stopJobs } from "@/lib/jobs/runner";
import { JANUARY_STATEMENTS_JOB, REFUND_RETRY_JOB, RESERVATION_SWEEP_JOB, ROOST_REPORT_MAIL_JOB, SEASONAL_REMINDERS_JOB } from "@/lib/jobs/store-jobs";
import { MAIL_DELIVERY_JOB } from "@/lib/mail/kick";
import type { MailStandIn } from "@/stand-ins/mail/server";
import { resetDb } from "../../support/db";
import { startTestPayments } from "../../support/payments";
import { checkoutInput, orderRow, startCheckout } from "../checkout/helpers";
import { clearInbox, payForOrder, startTestMail } from "../mail/helpers";
import { dropQueueSchema, queueStates, tickUntil, waitFor } from "./support";

// The store's own jobs (lib/jobs/store-jobs.ts) on the queue, end to end, with a TestClock.

vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => null }));

let payments: Awaited<ReturnType<typeof startTestPayments>>;
let mail: MailStandIn;

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
  await dropQueueSchema();
  await clearInbox(mail);
});
afterEach(async () => {
  await stopJobs({ timeoutMs: 1000 });
});

function storeJob(name: string): JobDefinition {
  const job = listJobs().find((j) => j.name === name);
  if (!job) throw new Error(`${name} is not in the store's list`);
  return job;
}

describe("the store's jobs", () => {
  it("are the sweeper, the refund retry, the outbox sender, the seasonal reminders, the roost-report questions and the January statements, each on a schedule", () => {
    expect(
      Object.fromEntries(listJobs().map((j) => [j.name, j.options.schedule])),
    ).toEqual({
      [RESERVATION_SWEEP_JOB]: { cron: "* * * * *" },
      [MAIL_DELIVERY_JOB]: { cron: "* * * * *" },
      [SEASONAL_REMINDERS_JOB]: { cron: "0 8 * * *", tz: "America/Los_Angeles", catchUp: true },
      [REFUND_RETRY_JOB]: { cron: "* * * * *" },
      [ROOST_REPORT_MAIL_JOB]: { cron: "0 9 * * *", tz: "America/Los_Angeles", catchUp: true },
      [JANUARY_STATEMENTS_JOB]: { cron: "15 * * * *", tz: "UTC", catchUp: true },
    });
  });

  it("the outbox sender runs when a payment nudges it, and again when a failed message's backoff runs out", async () => {
    const sender = storeJob(MAIL_DELIVERY_JOB);
    // Without its every-minute backstop, so only the nudge and the follow-up can deliver.
    const nudgedOnly = defineJob(sender.name, sender.handler, { ...sender.options, schedule: undefined });
    const clock = new TestClock(new Date());
    await startJobs({ jobs: [nudgedOnly], clock });
    mail.setDown(true);
    const quiet = vi.spyOn(console, "error").mockImplementation(() => {});

    await payForOrder(payments);
    const db = await getDb();
    const rows = () => db.select().from(outbox);
    await tickUntil(clock, async () => {
      const all = await rows();
      return all.length === 2 && all.every((r) => r.attempts === 1 && r.lastError !== null);
    });
    const retryAt = Math.min(...(await rows()).map((r) => r.nextAttemptAt.getTime()));
    expect(mail.messages()).toHaveLength(0);
    // The next pass waits in the queue for the moment the first retry is due. The sender asks for
    // it after its last write to the outbox, so give that request a moment of real time to land
    // (without moving the test clock, which would run it).
    await waitFor(async () => (await queueStates(MAIL_DELIVERY_JOB)).includes("created"));
    expect(await queueStates(MAIL_DELIVERY_JOB)).toContain("created");

    mail.setDown(false);
    await tickUntil(clock, async () => (await rows()).every((r) => r.status === "sent"), { stepMs: 1000 });
    quiet.mockRestore();
    // Sent by the pass that ran when the retry fell due: not before its backoff, and not at some
    // later pass (one poll of 2 s at most, plus a clock step).
    for (const row of await rows()) {
      expect(row.sentAt!.getTime()).toBeGreaterThanOrEqual(retryAt);
      expect(row.sentAt!.getTime() - retryAt).toBeLessThan(3_500);
    }
    expect((await rows()).map((r) => r.attempts)).toEqual([2, 2]);
    expect(mail.messages()).toHaveLength(2);
  });

  it("the sweeper expires an unpaid reservation on its minute", async () => {
    const { orderId } = await startCheckout(checkoutInput({ items: [{ slug: "hollow-four", quantity: 1 }] }), null);
    const clock = new TestClock(new Date(Date.now() + RESERVATION_MS + 5_000));
    await startJobs({ jobs: [storeJob(RESERVATION_SWEEP_JOB)], clock, scheduleCheckSeconds: 1 });
    await tickUntil(clock, async () => (await orderRow(orderId)).status === "expired", { stepMs: 1000, limitMs: 2 * 60_000 });
    // The order changes inside the handler; the queue marks the job done only after the handler
    // returns (on a PostgreSQL server that write can land a moment later), so wait for it too.
    await tickUntil(clock, async () => (await queueStates(RESERVATION_SWEEP_JOB)).includes("completed"), {
      stepMs: 100,
      limitMs: 10_000,
    });
    expect(await queueStates(RESERVATION_SWEEP_JOB)).toContain("completed");
  });

  it("the seasonal reminders run at start and at 8:00 store time, and send one message per person", async () => {
    const db = await getDb();
    const account = DEMO_USERS.find((u) => u.role === "customer")!;
    const [user] = await db.select().from(users).where(eq(users.email, account.email));
    await db.insert(emailPreferences).values({
      userId: user!.id,
      seasonalReminders: true,
      unsubscribeToken: randomBytes(24).toString("base64url"),
    });
    // 07:59:50 in Los Angeles on 3 December 2030, inside the winter check's window.
    const clock = new TestClock(new Date("2030-12-03T15:59:50Z"));
    await startJobs({
      jobs: [storeJob(SEASONAL_REMINDERS_JOB), storeJob(MAIL_DELIVERY_JOB)],
      clock,
      scheduleCheckSeconds: 1,
    });
    await tickUntil(
      clock,
      async () => (await queueStates(SEASONAL_REMINDERS_JOB)).filter((s) => s === "completed").length === 2,
      { stepMs: 1000, limitMs: 2 * 60_000 },
    );
    await tickUntil(clock, () => mail.messages().length > 0);
    await clock.tick(10_000);
    expect(mail.messages().map((m) => m.subject)).toEqual(["Winter check for your bat house (December to February)"]);
  });
});
