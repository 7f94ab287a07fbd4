import { eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { gifts, outbox } from "@/db/schema";
import { getPayments } from "@/lib/checkout/payments";
import { seedDemo } from "@/lib/demo/commands";
import { startGiftOnce } from "@/lib/giving/commands/once";
import { renderOutboxMessage } from "@/lib/mail/render-message";
import { resetDb } from "../../support/db";
import { startTestPayments } from "../../support/payments";

let payments: Awaited<ReturnType<typeof startTestPayments>>;
beforeAll(async () => {
  payments = await startTestPayments();
});
afterAll(async () => payments.close());
beforeEach(async () => {
  await seedDemo(await resetDb());
});

const contact = { name: "Dana Quill", email: "dana@example.org" };

async function payAndLoad(orderId: string, clientSecret: string) {
  await getPayments().paymentIntents.confirm(clientSecret.split("_secret_")[0]!, { payment_method: "pm_card_visa" });
  await payments.standIn.webhooksIdle();
  const db = await getDb();
  return {
    notices: await db.select().from(outbox).where(eq(outbox.dedupeKey, `tribute-notice:${orderId}`)),
    gift: (await db.select().from(gifts).where(eq(gifts.orderId, orderId)))[0],
  };
}

describe("tribute gifts and the covered fee", () => {
  it("e-mails the named person once the gift is paid, without the amount unless the donor chose to show it", async () => {
    const started = await startGiftOnce(
      { amountCents: 5_000, contact, coverFee: false, tribute: { kind: "memory", name: "Rowan Ellery", notice: { name: "Lee Ellery", email: "lee@example.org", showAmount: false } } },
      null,
    );
    const db = await getDb();
    expect(await db.select().from(outbox).where(eq(outbox.kind, "tribute-notice"))).toHaveLength(0);
    const { notices } = await payAndLoad(started.orderId, started.clientSecret);
    expect(notices).toHaveLength(1);
    expect(notices[0]!.toAddress).toBe("lee@example.org");
    expect(notices[0]!.subject).toBe("A gift in memory of Rowan Ellery");
    const rendered = await renderOutboxMessage({ db, row: notices[0]! });
    expect(rendered.text).toContain("in memory of Rowan Ellery");
    expect(rendered.text).toContain("Dana Quill");
    expect(rendered.text).not.toContain("$50");
  });

  it("states the amount in the notice when the donor chose so, and adds the covered fee to the gift", async () => {
    const started = await startGiftOnce(
      { amountCents: 2_500, contact, coverFee: true, tribute: { kind: "honor", name: "Sam Reyes", notice: { name: "Sam Reyes", email: "sam@example.org", showAmount: true } } },
      null,
    );
    expect(started.feeCoveredCents).toBe(106);
    expect(started.totalCents).toBe(2_606);
    const { notices, gift } = await payAndLoad(started.orderId, started.clientSecret);
    expect(gift!.amountCents).toBe(2_606);
    const db = await getDb();
    const rendered = await renderOutboxMessage({ db, row: notices[0]! });
    expect(rendered.text).toContain("in honour of Sam Reyes of $26.06");
    // The donor's own gift receipt names the tribute and the covered fee.
    const [receipt] = await db.select().from(outbox).where(eq(outbox.dedupeKey, `gift-receipt:${started.orderId}`));
    const receiptText = (await renderOutboxMessage({ db, row: receipt! })).text;
    expect(receiptText).toContain("This gift was made in honour of Sam Reyes.");
    expect(receiptText).toContain("It includes $1.06 you added to cover the card fee; that is part of your gift.");
  });

  it("a gift without a notice e-mails nobody else", async () => {
    const started = await startGiftOnce({ amountCents: 2_500, contact, coverFee: false, tribute: { kind: "honor", name: "Sam Reyes" } }, null);
    const { notices, gift } = await payAndLoad(started.orderId, started.clientSecret);
    expect(notices).toHaveLength(0);
    expect(gift!.amountCents).toBe(2_500);
    const db = await getDb();
    const [receipt] = await db.select().from(outbox).where(eq(outbox.dedupeKey, `gift-receipt:${started.orderId}`));
    const receiptText = (await renderOutboxMessage({ db, row: receipt! })).text;
    expect(receiptText).toContain("This gift was made in honour of Sam Reyes.");
    expect(receiptText).not.toContain("card fee");
  });
});
