import { eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { outbox } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import { formatOrderNumber } from "@/lib/checkout/order-number";
import { MAX_ATTEMPTS } from "@/lib/mail/backoff";
import { deliverPendingMail } from "@/lib/mail/commands/sender";
import type { MailStandIn } from "@/stand-ins/mail/server";
import { resetDb } from "../../support/db";
import { startTestPayments } from "../../support/payments";
import { orderRow } from "../checkout/helpers";
import { clearInbox, messagesMatching, payForOrder, startTestMail } from "./helpers";

let payments: Awaited<ReturnType<typeof startTestPayments>>;
let mail: MailStandIn;
const later = (minutes: number) => new Date(Date.now() + minutes * 60_000);

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
});

async function rowsFor(orderId: string) {
  const db = await getDb();
  return (await db.select().from(outbox)).filter((row) =>
    JSON.stringify(row.payload).includes(orderId),
  );
}

describe("every message goes out exactly once", () => {
  it("a payment webhook delivered 5 times (4 of them at once) gives one confirmation and one install guide", async () => {
    const orderId = await payForOrder(payments);
    const [event] = payments.standIn.events().filter((e) => e.type === "payment_intent.succeeded");
    const resent = await fetch(`${payments.standIn.url}/_stand-in/events/${event!.id}/resend`, {
      method: "POST",
      body: JSON.stringify({ times: 4, parallel: true }),
    });
    expect(resent.status).toBe(200);
    await payments.standIn.webhooksIdle();
    const attempts = (await (
      await fetch(`${payments.standIn.url}/_stand-in/events/${event!.id}`)
    ).json()) as { deliveries: { status: number }[] };
    expect(attempts.deliveries.filter((d) => d.status === 200)).toHaveLength(5);

    // Two senders at once, as two app instances would run them, then a third pass.
    const reports = await Promise.all([deliverPendingMail(), deliverPendingMail()]);
    expect(reports.reduce((sum, r) => sum + r.sent, 0)).toBe(2);
    expect(await deliverPendingMail()).toEqual({ sent: 0, retrying: 0, failed: 0 });

    const number = formatOrderNumber((await orderRow(orderId)).number);
    expect(messagesMatching(mail, new RegExp(`^Order ${number} is in the workshop queue$`))).toHaveLength(
      1,
    );
    expect(messagesMatching(mail, /install guide/)).toHaveLength(1);
    expect(mail.messages()).toHaveLength(2);
    const rows = await rowsFor(orderId);
    expect(rows.map((r) => [r.kind, r.status, r.attempts]).sort()).toEqual([
      ["install-guide", "sent", 1],
      ["order-confirmation", "sent", 1],
    ]);
    // The provider's id is recorded, and each message went out under its row id as the key.
    for (const row of rows) {
      const sent = mail.messages().find((m) => m.id === row.providerId);
      expect(sent?.idempotency_key).toBe(row.id);
    }
  });

  it("with the mail service down the order is still paid; the message waits and goes out once it is back", async () => {
    mail.setDown(true);
    const orderId = await payForOrder(payments, { giftCents: 2500 });
    expect((await orderRow(orderId)).status).toBe("paid");

    expect(await deliverPendingMail()).toEqual({ sent: 0, retrying: 3, failed: 0 });
    let rows = await rowsFor(orderId);
    expect(rows).toHaveLength(3);
    for (const row of rows) {
      expect(row.status).toBe("pending");
      expect(row.attempts).toBe(1);
      expect(row.lastError).toMatch(/application_error \(503\)/);
      // First retry 30 s after the failure.
      expect(row.nextAttemptAt.getTime()).toBeGreaterThan(Date.now() + 25_000);
    }
    // Not due yet: nothing is tried again before its time.
    expect(await deliverPendingMail()).toEqual({ sent: 0, retrying: 0, failed: 0 });
    expect(mail.messages()).toHaveLength(0);

    mail.setDown(false);
    expect(await deliverPendingMail({ now: later(1) })).toEqual({
      sent: 3,
      retrying: 0,
      failed: 0,
    });
    expect(await deliverPendingMail({ now: later(60) })).toEqual({
      sent: 0,
      retrying: 0,
      failed: 0,
    });
    expect(
      mail
        .messages()
        .map((m) => m.subject)
        .sort(),
    ).toEqual([
      expect.stringMatching(/^Order RW-\d+ is in the workshop queue$/),
      expect.stringMatching(/^Your gift receipt from /),
      expect.stringMatching(/^Your install guide for order RW-\d+$/),
    ]);
    rows = await rowsFor(orderId);
    expect(rows.every((r) => r.status === "sent" && r.attempts === 2 && r.lastError === null)).toBe(
      true,
    );
  });

  it("a sender that died after the service accepted a message does not send it twice", async () => {
    const orderId = await payForOrder(payments);
    await deliverPendingMail();
    expect(mail.messages()).toHaveLength(2);
    // Simulate the crash: the row never learned it was sent, and its claim lease ran out.
    const db = await getDb();
    const [confirmation] = (await rowsFor(orderId)).filter((r) => r.kind === "order-confirmation");
    await db
      .update(outbox)
      .set({ status: "pending", providerId: null, sentAt: null })
      .where(eq(outbox.id, confirmation!.id));
    expect(await deliverPendingMail({ now: later(5) })).toEqual({
      sent: 1,
      retrying: 0,
      failed: 0,
    });
    expect(mail.messages()).toHaveLength(2);
    const [after] = await db.select().from(outbox).where(eq(outbox.id, confirmation!.id));
    expect(after?.status).toBe("sent");
    expect(after?.providerId).toBe(confirmation!.providerId);
  });

  it(`gives up after ${MAX_ATTEMPTS} failed attempts and keeps the error for the admin`, async () => {
    mail.setDown(true);
    const orderId = await payForOrder(payments);
    let now = new Date();
    for (let attempt = 1; attempt <= MAX_ATTEMPTS; attempt += 1) {
      await deliverPendingMail({ now });
      now = new Date(now.getTime() + 2 * 60 * 60_000);
    }
    const rows = await rowsFor(orderId);
    expect(rows.map((r) => [r.status, r.attempts])).toEqual([
      ["failed", MAX_ATTEMPTS],
      ["failed", MAX_ATTEMPTS],
    ]);
    expect(await deliverPendingMail({ now })).toEqual({ sent: 0, retrying: 0, failed: 0 });
  });
});
