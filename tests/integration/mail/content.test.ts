import { eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { houseModels, outbox, sites } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import { DEMO_ORGANIZATION } from "@/lib/demo/seed-data";
import { formatUsd } from "@/lib/checkout/money";
import { formatOrderNumber } from "@/lib/checkout/order-number";
import { renderOutboxMessage } from "@/lib/mail/render-message";
import { deliverPendingMail } from "@/lib/mail/commands/sender";
import { CAUTIONS } from "@/lib/safety/cautions";
import type { MailStandIn } from "@/stand-ins/mail/server";
import { resetDb } from "../../support/db";
import { startTestPayments } from "../../support/payments";
import { orderRow } from "../checkout/helpers";
import {
  clearInbox,
  loadTestStations,
  messagesMatching,
  payForOrder,
  removeTestStations,
  startTestMail,
} from "./helpers";

// What the messages say, read from the stand-in's inbox as a buyer would get them.
// Bands: PRODUCT.md §2; cautions: §7; receipts: §6 (IRS Publication 1771).

let payments: Awaited<ReturnType<typeof startTestPayments>>;
let mail: MailStandIn;

beforeAll(async () => {
  payments = await startTestPayments();
  mail = await startTestMail();
  await loadTestStations();
});
afterAll(async () => {
  await removeTestStations();
  await payments.close();
  await mail.close();
});
beforeEach(async () => {
  await seedDemo(await resetDb());
  await clearInbox(mail);
});

async function sentGuide(orderId: string): Promise<{ text: string; number: string }> {
  await deliverPendingMail();
  const number = formatOrderNumber((await orderRow(orderId)).number);
  const [guide] = messagesMatching(mail, new RegExp(`install guide for order ${number}$`));
  if (!guide?.text || !guide.html) throw new Error("no install guide in the inbox");
  // Every caution is in the HTML too, not only in the plain text.
  for (const caution of CAUTIONS)
    expect(guide.html).toContain(caution.title.replace(/'/g, "&#x27;"));
  return { text: guide.text, number };
}

function expectEveryCaution(text: string) {
  for (const caution of CAUTIONS) {
    expect(text).toContain(caution.title);
    expect(text).toContain(caution.text);
  }
  expect(text).toMatch(/up to two years/);
}

describe("the install guide", () => {
  it("for a buyer in Tempe (very hot summers, from the ZIP) speaks of light shades, vents and afternoon shade", async () => {
    const orderId = await payForOrder(payments, {
      items: [{ slug: "saltbush-white", quantity: 1 }],
    });
    const { text } = await sentGuide(orderId);
    expect(text).toMatch(
      /near ZIP 85281, where we ship your order: very hot summers \(average daily high in July, your warmest month, about 106 °F, 41 °C\)/,
    );
    expect(text).toMatch(/light or white outside/);
    expect(text).toMatch(/Vents are needed/);
    expect(text).toMatch(/Afternoon shade: /);
    expect(text).toMatch(/Saltbush\s+Suits your summers/);
    expect(text).not.toMatch(/black or dark outside/);
    expectEveryCaution(text);
  });

  it("for a buyer with a saved site in cool summers speaks of dark shades and more sun, and of the site's own rules", async () => {
    const db = await getDb();
    const [site] = await db
      .insert(sites)
      .values({
        guestToken: "guest-site-token-for-mail",
        name: "North barn",
        input: { lat: 47.6, lon: -122.3, mount: "building", heightFt: 13, julyHighF: 76 },
        result: {
          label: "fair",
          julyHighF: 76,
          rules: [
            {
              id: "P1",
              name: "Mount",
              status: "good",
              value: "Building wall",
              reason: "A building wall is a mount bats take to.",
              source: "x",
            },
            {
              id: "P2",
              name: "Height",
              status: "fair",
              value: "13 ft",
              reason: "Above the 12 ft minimum, but houses at 15–20 ft do better.",
              change: "Raise it to 15 ft or more.",
              source: "x",
            },
          ],
        },
        label: "fair",
        bandId: "cool",
      })
      .returning();
    const orderId = await payForOrder(payments, {
      items: [{ slug: "northwind-six", quantity: 1 }],
      siteId: site!.id,
      guestSiteToken: "guest-site-token-for-mail",
    });
    const { text } = await sentGuide(orderId);
    expect(text).toMatch(
      /From your saved site check "North barn": cool summers \(average daily high in July, your warmest month, about 76 °F/,
    );
    expect(text).toMatch(/black or dark outside/);
    expect(text).toMatch(/more sun/);
    expect(text).toMatch(/at least 10 hours of direct sun/);
    expect(text).toMatch(/Vents are optional/);
    expect(text).not.toMatch(/Afternoon shade: /);
    expect(text).toMatch(
      /Height: Above the 12 ft minimum, but houses at 15–20 ft do better\. Raise it to 15 ft or more\./,
    );
    expect(text).not.toMatch(/Mount: A building wall is a mount/);
    expectEveryCaution(text);
  });

  it("for a pickup at the center's ZIP, which has no map centre, gives every band and still every caution", async () => {
    const orderId = await payForOrder(payments, { method: "pickup", address: undefined });
    const { text } = await sentGuide(orderId);
    expect(text).toMatch(/could not place ZIP 97399/);
    expect(text).toMatch(/100 °F and above light or white, vented, with afternoon shade/);
    expect(text).toMatch(/waiting at the center soon/);
    expectEveryCaution(text);
  });

  it("is written again, for the delivery, from the outbox row fulfillment queues", async () => {
    const orderId = await payForOrder(payments);
    const db = await getDb();
    const [row] = await db
      .insert(outbox)
      .values({
        dedupeKey: `install-guide:delivered:${orderId}`,
        kind: "install-guide",
        toAddress: "x@example.org",
        subject: "s",
        payload: { orderId, occasion: "delivered" },
      })
      .returning();
    const { text } = await renderOutboxMessage({ db, row: row! });
    expect(text).toMatch(/Your house has reached you\. Here is your install guide again/);
    expectEveryCaution(text);
  });
});

describe("amounts", () => {
  it("the confirmation and the gift receipt state exactly the order's amounts and the §6 statement", async () => {
    const orderId = await payForOrder(payments, {
      items: [{ slug: "hollow-four", quantity: 2 }],
      giftCents: 2500,
    });
    const order = await orderRow(orderId);
    await deliverPendingMail();
    const number = formatOrderNumber(order.number);
    const [confirmation] = messagesMatching(
      mail,
      new RegExp(`^Order ${number} is in the workshop queue$`),
    );
    const text = confirmation!.text!;
    expect(text).toMatch(new RegExp(`Hollow Four × 2 \\(\\$149\\.00 each\\) +\\$298\\.00`));
    for (const [label, cents] of [
      ["Shipping", order.shippingCents],
      ["Sales tax", order.taxCents],
      ["Conservation gift", 2500],
      ["Total paid", order.totalCents],
    ] as const) {
      expect(text).toMatch(new RegExp(`${label} +${formatUsd(cents).replace(/[$.]/g, "\\$&")}\\n`));
    }
    expect(order.totalCents).toBe(
      order.subtotalCents + order.shippingCents + order.taxCents + 2500,
    );
    expect(text).toContain(
      `value of the goods and services you received (items at list price plus shipping) is ${formatUsd(order.subtotalCents + order.shippingCents)}`,
    );
    expect(text).toContain(
      `your deductible contribution is limited to the amount you paid above the value of those goods and services: $25.00`,
    );
    expect(text).toContain(`/orders/${orderId}?t=${order.accessToken}`);

    const [receipt] = messagesMatching(mail, /gift receipt/);
    const receiptText = receipt!.text!;
    expect(receiptText).toContain(DEMO_ORGANIZATION.legalName);
    expect(receiptText).toContain(`Federal tax id (EIN): ${DEMO_ORGANIZATION.taxId}`);
    expect(receiptText).toContain(
      `${DEMO_ORGANIZATION.street}, ${DEMO_ORGANIZATION.city}, ${DEMO_ORGANIZATION.state} ${DEMO_ORGANIZATION.zip}`,
    );
    expect(receiptText).toContain(
      `Date received: ${new Intl.DateTimeFormat("en-US", { dateStyle: "long", timeZone: "UTC" }).format(order.paidAt!)}`,
    );
    expect(receiptText).toMatch(/Of which your gift +\$25\.00/);
  });

  it("a plain purchase's confirmation says it is not a contribution", async () => {
    await payForOrder(payments, { items: [{ slug: "twin-ridge", quantity: 1 }] });
    await deliverPendingMail();
    const [confirmation] = messagesMatching(mail, /is in the workshop queue$/);
    expect(confirmation!.text).toContain(
      "This was a purchase, not a charitable contribution, so no part of it is tax-deductible.",
    );
    expect(messagesMatching(mail, /gift receipt/)).toHaveLength(0);
  });
});

describe("the staff low-stock alert", () => {
  it("goes to the workshop when a sale takes a model under its threshold, once", async () => {
    const db = await getDb();
    // Ember Five's threshold is 3. From 4: the first sale leaves 3 (not under), the second 2 (under).
    await db.update(houseModels).set({ stock: 4 }).where(eq(houseModels.slug, "ember-five"));
    await payForOrder(payments, { items: [{ slug: "ember-five", quantity: 1 }] });
    await payForOrder(payments, { items: [{ slug: "ember-five", quantity: 1 }] });
    await deliverPendingMail();
    const alerts = messagesMatching(mail, /^Low stock: Ember Five/);
    expect(alerts).toHaveLength(1);
    expect(alerts[0]!.to).toEqual(["workshop@cedarhollow.example"]);
    expect(alerts[0]!.subject).toBe("Low stock: Ember Five is down to 2");
    expect(alerts[0]!.text).toMatch(/has 2 houses on the shelf, under its low-stock mark of 3/);
    expect(alerts[0]!.text).toContain("/staff/models/ember-five");
  });
});
