import { readFileSync } from "node:fs";
import { expect, test, type APIRequestContext, type Locator, type Page } from "@playwright/test";
import Stripe from "stripe";
import { billableWeightLb } from "../../lib/checkout/billable-weight";
import { signInAs } from "./support/accounts";
import { expectAccessible } from "./support/axe";
import { E2E_ENV } from "../../playwright.config";

// The shipping desk in a browser: paid orders are made the way a buyer makes them (checkout
// route, then the card confirmed through the payments SDK against the stand-in, whose signed
// webhook marks them paid), then a volunteer works them through the pages.

// Tracking numbers with valid check digits (sources in tests/unit/fulfillment/tracking.test.ts).
const UPS_NUMBER = "1Z5R89390357567127";
const USPS_NUMBER = "9400111201080805483016";

// The e2e server's payments stand-in.
const PAYMENTS_PORT = Number(E2E_ENV.PAYMENTS_PORT);

type Made = { orderId: string; token: string; number: string };

function payments(): Stripe {
  const secrets = JSON.parse(readFileSync("var/dev-secrets.json", "utf8")) as { STRIPE_SECRET_KEY: string };
  return new Stripe(secrets.STRIPE_SECRET_KEY, { host: "127.0.0.1", port: PAYMENTS_PORT, protocol: "http", telemetry: false, maxNetworkRetries: 0 });
}

async function paidOrder(request: APIRequestContext, body: Record<string, unknown>): Promise<Made> {
  const res = await request.post("/api/checkout", { data: body });
  expect(res.ok(), await res.text()).toBe(true);
  const started = (await res.json()) as { orderId: string; clientSecret: string; accessToken: string };
  await payments().paymentIntents.confirm(started.clientSecret.split("_secret_")[0]!, { payment_method: "pm_card_visa" });
  let order: { status: string; number: string } | undefined;
  await expect
    .poll(async () => {
      order = await (await request.get(`/api/orders/${started.orderId}?t=${encodeURIComponent(started.accessToken)}`)).json();
      return order?.status;
    }, { timeout: 30_000 })
    .toBe("paid");
  return { orderId: started.orderId, token: started.accessToken, number: order!.number };
}

type House = { slug: string; name: string; billableLb: number };

/** Houses on sale with stock to spare, as the catalog lists them now (other specs may retire some). */
async function housesOnSale(request: APIRequestContext, count: number): Promise<House[]> {
  const { items } = (await (await request.get("/api/houses")).json()) as { items: { slug: string; stock: number }[] };
  const picked = items.filter((h) => h.stock >= 3).slice(0, count);
  expect(picked, "houses in stock").toHaveLength(count);
  return Promise.all(
    picked.map(async ({ slug }) => {
      const house = (await (await request.get(`/api/houses/${slug}`)).json()) as { name: string; carton: Parameters<typeof billableWeightLb>[0] };
      return { slug, name: house.name, billableLb: billableWeightLb(house.carton).billableLb };
    }),
  );
}

const contact = (name: string) => ({ name, email: `${name.split(" ")[0]!.toLowerCase()}-${Date.now()}@example.org` });
const address = (name: string) => ({ name, line1: "4 Quarry Lane", line2: "", city: "Madison", state: "WI", zip: "53703" });

/**
 * Presses a button until what it leads to shows. A press that lands before the page's scripts
 * have loaded does nothing; a second press after a first that worked finds the button gone or
 * busy, and the version check on the server would refuse a true double submit anyway.
 */
async function pressUntil(button: Locator, shows: Locator) {
  await expect(async () => {
    if (await button.isEnabled().catch(() => false)) await button.click({ timeout: 2_000 }).catch(() => undefined);
    await expect(shows).toBeVisible({ timeout: 5_000 });
  }).toPass({ timeout: 45_000 });
}

async function shoot(page: Page, name: string) {
  // Opt-in design screenshots (git-ignored folder): FULFILLMENT_SCREENSHOTS=1.
  if (!process.env.FULFILLMENT_SCREENSHOTS) return;
  for (const [label, viewport] of [["phone", { width: 390, height: 844 }], ["desktop", { width: 1280, height: 900 }]] as const) {
    await page.setViewportSize(viewport);
    await page.screenshot({ path: `screenshots/${name}-${label}.png`, fullPage: true });
  }
  await page.setViewportSize({ width: 1280, height: 720 });
}

test("a volunteer filters the queue, packs a two-house order into two boxes and ships them; the buyer sees both links", async ({ page, request, browser }) => {
  const buyer = "Wren Alcott";
  const [a, b] = (await housesOnSale(request, 2)) as [House, House];
  const order = await paidOrder(request, {
    items: [{ slug: a.slug, quantity: 1 }, { slug: b.slug, quantity: 1 }],
    method: "parcel",
    contact: contact(buyer),
    address: address(buyer),
  });
  await paidOrder(request, { items: [{ slug: a.slug, quantity: 1 }], method: "pickup", contact: contact("Basil Quarrie") });

  await signInAs(page, "fulfillment");
  await page.goto("/fulfillment");
  await expect(page.getByRole("heading", { level: 1, name: "Shipping desk" })).toBeVisible();
  await expect(page.getByText(/Waiting longest:/)).toBeVisible();
  // Filters and buttons answer once the page's scripts have loaded.
  await page.waitForLoadState("networkidle");
  await expectAccessible(page);
  await shoot(page, "fulfillment-queue");

  const rows = page.getByRole("region", { name: "Orders in this view" }).getByRole("row");
  await page.getByLabel("How it goes").selectOption("parcel");
  await expect(page.getByText("Basil Quarrie")).toHaveCount(0);
  await page.getByLabel("Order number or name").fill(order.number);
  await expect(rows).toHaveCount(2); // header + the one order
  await expect(page).toHaveURL(new RegExp(`method=parcel.*q=${order.number}`));
  // The oldest waiting order is also linked from the notice above the table: open it from the table.
  await page.getByRole("region", { name: "Orders in this view" }).getByRole("link", { name: order.number, exact: true }).click();

  await expect(page.getByRole("heading", { level: 1, name: `Order ${order.number}` })).toBeVisible();
  await expect(page.getByRole("region", { name: "Houses and their cartons" })).toContainText(`${a.billableLb} lb`);
  await page.waitForLoadState("networkidle");
  await expectAccessible(page);
  const pack = page.getByRole("form", { name: "Record the boxes" });
  await pressUntil(page.getByRole("button", { name: "Start packing" }), pack);
  // One box per house, its billable weight computed from the carton as PRODUCT.md §5 says.
  const billables = (await pack.getByText(/^Billable: \d+ lb/).allTextContents()).map((t) => Number(/\d+/.exec(t)?.[0]));
  expect(billables.sort((x, y) => x - y)).toEqual([a.billableLb, b.billableLb].sort((x, y) => x - y));
  await expectAccessible(page);
  await shoot(page, "fulfillment-order-packing");
  await pack.getByRole("button", { name: "Record 2 boxes and mark packed" }).click();

  const first = page.getByRole("form", { name: "Ship box 1" });
  await first.getByLabel("Tracking number").fill("1Z5R89390357567128");
  await first.getByRole("button", { name: "Ship box 1" }).click();
  await expect(first.getByText(/check for a typo/)).toBeVisible();
  await expectAccessible(page);
  await first.getByLabel("Tracking number").fill(UPS_NUMBER.replace(/(.{4})/g, "$1 "));
  await first.getByRole("button", { name: "Ship box 1" }).click();
  await expect(first).toBeHidden();

  const second = page.getByRole("form", { name: "Ship box 2" });
  await second.getByLabel("Carrier").selectOption("usps");
  await second.getByLabel("Service").fill("Ground Advantage");
  await second.getByLabel("Tracking number").fill(USPS_NUMBER);
  await second.getByRole("button", { name: "Ship box 2" }).click();
  await expect(page.getByText("With the carrier").first()).toBeVisible();
  await expect(page.getByText("Nothing left to do")).toHaveCount(0);
  await expect(page.getByRole("button", { name: "Log the arrival" })).toBeVisible();
  await expectAccessible(page);
  await shoot(page, "fulfillment-order-shipped");

  await page.goto(`/fulfillment/orders/${order.orderId}/slip`);
  await expect(page.getByRole("heading", { level: 1, name: "Packing slip" })).toBeVisible();
  await expect(page.getByText(/^Box 2 of 2: /)).toBeVisible();
  await expectAccessible(page);
  await shoot(page, "fulfillment-slip");

  // The buyer, not signed in, with the link from their e-mail.
  const guest = await browser.newPage();
  await guest.goto(`/orders/${order.orderId}?t=${encodeURIComponent(order.token)}`);
  await expect(guest.getByRole("link", { name: new RegExp(`Track ${UPS_NUMBER}`) })).toHaveAttribute("href", `https://www.ups.com/track?tracknum=${UPS_NUMBER}`);
  await expect(guest.getByRole("link", { name: new RegExp(`Track ${USPS_NUMBER}`) })).toHaveAttribute(
    "href",
    `https://tools.usps.com/go/TrackConfirmAction?tLabels=${USPS_NUMBER}`,
  );
  await shoot(guest, "orders-buyer-parcels");
  await guest.close();
});

test("a pickup order is marked ready and then collected", async ({ page, request }) => {
  const [house] = await housesOnSale(request, 1);
  const order = await paidOrder(request, { items: [{ slug: house!.slug, quantity: 1 }], method: "pickup", contact: contact("Dmitri Osgood") });
  await signInAs(page, "fulfillment");
  await page.goto(`/fulfillment?method=pickup&q=${order.number}`);
  // The oldest waiting order is also linked from the notice above the table: open it from the table.
  await page.getByRole("region", { name: "Orders in this view" }).getByRole("link", { name: order.number, exact: true }).click();
  await expect(page.getByRole("heading", { level: 1, name: `Order ${order.number}` })).toBeVisible();
  await page.waitForLoadState("networkidle");
  await pressUntil(page.getByRole("button", { name: "Start packing" }), page.getByRole("button", { name: "Ready at the front desk" }));
  await page.getByRole("button", { name: "Ready at the front desk" }).click();
  await expect(page.getByRole("button", { name: "Log the handover" })).toBeVisible();
  await expectAccessible(page);
  await page.getByRole("button", { name: "Log the handover" }).click();
  await expect(page.getByText("Nothing left to do at the shipping desk for this order.")).toBeVisible();
  await expect(page.getByText("Handed over").first()).toBeVisible();
});

test("an admin sees corrections and refunds; the order page and its actions refuse other roles", async ({ page, request, browser }) => {
  const [house] = await housesOnSale(request, 1);
  const order = await paidOrder(request, { items: [{ slug: house!.slug, quantity: 1 }], method: "pickup", contact: contact("Edda Marsh") });
  await signInAs(page, "admin");
  await page.goto(`/fulfillment/orders/${order.orderId}`);
  await expect(page.getByRole("heading", { name: "Admin corrections and refunds" })).toBeVisible();
  await page.waitForLoadState("networkidle");
  await expectAccessible(page);
  await page.getByLabel("Reason for cancelling").fill("Buyer asked to cancel");
  await page.getByRole("button", { name: "Cancel order…" }).click();
  const dialog = page.getByRole("dialog", { name: "Cancel this order?" });
  await expect(dialog).toBeVisible();
  await expectAccessible(page);
  await shoot(page, "fulfillment-admin-cancel");
  await dialog.getByRole("button", { name: /^Cancel and refund/ }).click();
  // The refund goes out through the payments service before the page reloads.
  await expect(page.getByText(/^\$[\d.,]+ refunded$/)).toBeVisible({ timeout: 30_000 });
  await expect(page.getByText("Nothing left to do at the shipping desk for this order.")).toBeVisible();
  await expect(page.getByRole("paragraph").filter({ hasText: /→ Cancelled$/ })).toBeVisible();

  const paths = [`/fulfillment/orders/${order.orderId}`, `/fulfillment/orders/${order.orderId}/slip`];
  const outsider = await browser.newPage();
  for (const path of paths) {
    await outsider.goto(path);
    await expect(outsider).toHaveURL(/\/sign-in\?next=/);
  }
  await signInAs(outsider, "customer");
  for (const path of paths) {
    await outsider.goto(path);
    await expect(outsider).toHaveURL(/\/forbidden/);
  }
  const post = await outsider.request.post(`/api/fulfillment/orders/${order.orderId}/transition`, { data: { version: 0, to: "packing" } });
  expect(post.status()).toBe(403);
  await outsider.close();
});
