import { eq } from "drizzle-orm";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { SiteFooter } from "@/components/site-footer";
import { getDb } from "@/db/client";
import { organization, shippingRates } from "@/db/schema";
import { mailboxAddress } from "@/lib/admin/center-profile";
import { getCenterProfile, getRateCoverage } from "@/lib/admin/queries";
import { env } from "@/lib/config/env";
import { deliverPendingMail } from "@/lib/mail/commands/sender";
import { seedDemo } from "@/lib/demo/commands";
import { DEMO_ORGANIZATION } from "@/lib/demo/seed-data";
import type { MailStandIn } from "@/stand-ins/mail/server";
import { resetDb } from "../../support/db";
import { startTestPayments } from "../../support/payments";
import { clearInbox, messagesMatching, payForOrder, startTestMail } from "../mail/helpers";

// Every mention of the center comes from its settings (PRODUCT.md §6): rename it in the
// database and the footer, the gift-receipt subject and the mail's from-name follow.
const RENAMED = { displayName: "Prairie Owl Refuge", city: "Testville Junction" };

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
  await clearInbox(mail);
});

async function rename() {
  const db = await getDb();
  await db.update(organization).set(RENAMED).where(eq(organization.id, 1));
}

describe("the center's name comes from its settings", () => {
  it("the footer shows the renamed center and its town, never the old name", async () => {
    const before = renderToStaticMarkup(createElement(SiteFooter, { center: await getCenterProfile() }));
    expect(before).toContain(DEMO_ORGANIZATION.displayName);
    await rename();
    const center = await getCenterProfile();
    expect(center).toMatchObject({ configured: true, name: RENAMED.displayName, city: RENAMED.city });
    const html = renderToStaticMarkup(createElement(SiteFooter, { center }));
    expect(html).toContain(RENAMED.displayName);
    expect(html).toContain(RENAMED.city);
    expect(html).not.toContain(DEMO_ORGANIZATION.displayName);
    expect(html).not.toContain(DEMO_ORGANIZATION.city);
  });

  it("without a settings row the store names only itself", async () => {
    const db = await getDb();
    await db.delete(organization);
    const center = await getCenterProfile();
    expect(center).toMatchObject({ configured: false, name: "Roostwright" });
    const html = renderToStaticMarkup(createElement(SiteFooter, { center }));
    expect(html).not.toContain(DEMO_ORGANIZATION.displayName);
    expect(html).toContain("Roostwright is a nonprofit store.");
  });

  it("the gift receipt's subject and every message's from-name use the renamed center; the address stays", async () => {
    await rename();
    await payForOrder(payments, { items: [{ slug: "hollow-four", quantity: 1 }], giftCents: 2500 });
    await deliverPendingMail();
    const [receipt] = messagesMatching(mail, /gift receipt/);
    expect(receipt, "a gift receipt was sent").toBeDefined();
    expect(receipt!.subject).toContain(RENAMED.displayName);
    expect(receipt!.subject).not.toContain(DEMO_ORGANIZATION.displayName);
    const sent = mail.messages();
    expect(sent.length).toBeGreaterThanOrEqual(2);
    const address = mailboxAddress(env().MAIL_FROM);
    for (const m of sent) expect(m.from).toBe(`${RENAMED.displayName} <${address}>`);
  });

  it("a rename between two sends shows on the next message", async () => {
    await payForOrder(payments, { items: [{ slug: "hollow-four", quantity: 1 }], giftCents: 1000 });
    await deliverPendingMail();
    expect(mail.messages().every((m) => m.from.startsWith(`${DEMO_ORGANIZATION.displayName} <`))).toBe(true);
    await clearInbox(mail);
    await rename();
    await payForOrder(payments, { items: [{ slug: "twin-ridge", quantity: 1 }] });
    await deliverPendingMail();
    expect(mail.messages().length).toBeGreaterThan(0);
    expect(mail.messages().every((m) => m.from.startsWith(`${RENAMED.displayName} <`))).toBe(true);
  });
});

describe("rate coverage from the database", () => {
  it("the demo table covers every house on sale; emptied, it covers none of them", async () => {
    expect(await getRateCoverage()).toMatchObject({ covered: true });
    const db = await getDb();
    await db.delete(shippingRates);
    const coverage = await getRateCoverage();
    expect(coverage).toMatchObject({ covered: false, fromLb: 1, heaviestTierLb: null });
    if (coverage.covered) throw new Error("covered");
    expect(coverage.toLb).toBeGreaterThan(0);
    expect(coverage.heaviest?.billableLb).toBe(coverage.toLb);
  });
});
