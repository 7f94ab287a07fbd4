import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { formatOrderNumber } from "@/lib/checkout/order-number";
import { seedDemo } from "@/lib/demo/commands";
import { bandChoiceFromClimate, serializeBandChoice, type BandChoice } from "@/lib/climate/band-cookie";
import { parseBandChoice } from "@/lib/climate/band-cookie-parse";
import { loadClimateTableIfNeeded } from "@/lib/climate/commands";
import type { Climate } from "@/lib/climate/resolve";
import { deliverPendingMail } from "@/lib/mail/commands/sender";
import type { MailStandIn } from "@/stand-ins/mail/server";
import { resetDb } from "../../support/db";
import { startTestPayments } from "../../support/payments";
import { checkoutInput, orderRow, pay } from "../checkout/helpers";
import { clearInbox, messagesMatching, startTestMail } from "../mail/helpers";

vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => null }));
const { GET: climateGet } = await import("@/app/api/climate/route");
const { POST: checkoutPost } = await import("@/app/api/checkout/route");

// PRODUCT.md §2, "The band travels with the order": the band the catalog showed is stored on the
// order at checkout (from the one band cookie, read on the server) and the confirmation and the
// install guide name that same band.

let payments: Awaited<ReturnType<typeof startTestPayments>>;
let mail: MailStandIn;
const noParams = { params: Promise.resolve({}) };

beforeAll(async () => {
  payments = await startTestPayments();
  mail = await startTestMail();
}, 120_000);
afterAll(async () => {
  await payments.close();
  await mail.close();
});
beforeEach(async () => {
  const db = await resetDb();
  await seedDemo(db);
  await loadClimateTableIfNeeded(db);
  (globalThis as { __roostwrightStations?: unknown }).__roostwrightStations = undefined;
  await clearInbox(mail);
}, 120_000);

/** The Cookie header a browser would send after writeBandChoice. */
const cookieHeader = (choice: BandChoice) => serializeBandChoice(choice).split(";")[0]!;

async function checkoutWithCookie(cookie: string | null): Promise<string> {
  const res = await checkoutPost(
    new Request("http://localhost/api/checkout", {
      method: "POST",
      headers: { "content-type": "application/json", ...(cookie ? { cookie } : {}) },
      body: JSON.stringify(checkoutInput({ items: [{ slug: "saltbush-white", quantity: 1 }] })),
    }),
    noParams,
  );
  expect(res.status).toBe(200);
  const { orderId } = (await res.json()) as { orderId: string };
  await pay(orderId);
  await payments.standIn.webhooksIdle();
  await deliverPendingMail();
  return orderId;
}

function mailFor(orderId: string, number: string) {
  const [guide] = messagesMatching(mail, new RegExp(`install guide for order ${number}$`));
  const [confirmation] = messagesMatching(mail, new RegExp(`${number}`)).filter((m) => !/install guide/.test(m.subject));
  void orderId;
  return { guide: guide?.text ?? "", confirmation: confirmation?.text ?? "" };
}

describe("the band travels with the order", () => {
  it("catalog, order and guide all name the band looked up from ZIP 43215 (Columbus, Ohio)", async () => {
    const res = await climateGet(new Request("http://localhost/api/climate?zip=43215"), noParams);
    const climate = (await res.json()) as Climate;
    const cookie = cookieHeader(bandChoiceFromClimate(climate));
    // What the catalog pages read back from the cookie (lib/climate/band-cookie-server.ts).
    const catalogBand = parseBandChoice(cookie.split("=")[1])?.id;
    expect(catalogBand).toBe(climate.band.id);

    const orderId = await checkoutWithCookie(cookie);
    const order = await orderRow(orderId);
    expect(order).toMatchObject({ bandId: climate.band.id, bandSource: "zip", bandZip: "43215" });
    expect(order.bandValueF).toBeCloseTo(climate.valueF, 9);

    const { guide, confirmation } = mailFor(orderId, formatOrderNumber(order.number));
    const label = climate.band.label.toLowerCase();
    expect(guide).toContain(`the climate normals near ZIP 43215, as you looked it up in our store: ${label}`);
    expect(confirmation).toContain(`Your summers: ${label}, from the climate normals near ZIP 43215`);
  }, 120_000);

  it("keeps the band the buyer chose even where the ship-to ZIP (Tempe, very hot) would say otherwise", async () => {
    const orderId = await checkoutWithCookie(cookieHeader({ id: "cool", source: "chosen" }));
    const order = await orderRow(orderId);
    expect(order).toMatchObject({ bandId: "cool", bandSource: "chosen", bandValueF: null });
    const { guide, confirmation } = mailFor(orderId, formatOrderNumber(order.number));
    expect(guide).toMatch(/the band you chose in our catalog: cool summers/);
    expect(guide).not.toMatch(/very hot summers/);
    expect(confirmation).toContain("Your summers: cool summers");
  }, 120_000);

  it("works the band out again from the value when a cookie's band disagrees with it, and stores none without a cookie", async () => {
    const forged = await checkoutWithCookie(cookieHeader({ id: "cool", source: "typed", valueF: 96, typed: { value: 96, unit: "F" } }));
    expect(await orderRow(forged)).toMatchObject({ bandId: "hot", bandSource: "typed", bandTypedValue: 96, bandTypedUnit: "F" });
    const none = await checkoutWithCookie(null);
    expect(await orderRow(none)).toMatchObject({ bandId: null, bandSource: "none" });
  }, 120_000);
});
