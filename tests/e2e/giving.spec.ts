import { expect, test, type Page } from "@playwright/test";
import { E2E_ENV } from "../../playwright.config";
import { expectAccessible } from "./support/axe";

const PAYMENTS = `http://127.0.0.1:${E2E_ENV.PAYMENTS_PORT}`;

async function fillCard(page: Page, number: string) {
  await page.getByLabel("Card number").fill(number);
  await page.getByLabel("Expiration date (MM / YY)").fill("12 / 34");
  await page.getByLabel("Security code (CVC)").fill("123");
}

/** Reloads until the monthly gift's page shows the status (the webhook arrives a moment after the payment). */
async function expectStatus(page: Page, status: string) {
  await expect(async () => {
    await page.reload();
    await expect(page.getByTestId("monthly-status")).toHaveAttribute("data-status", status, { timeout: 1_000 });
  }).toPass({ timeout: 30_000 });
}

async function expectPayments(page: Page, n: number) {
  await expect(async () => {
    await page.reload();
    await expect(page.getByTestId("monthly-payments").getByRole("listitem")).toHaveCount(n, { timeout: 1_000 });
  }).toPass({ timeout: 30_000 });
}

async function advanceClock(monthlyGiftId: string, days: number) {
  const clocks = (await (await fetch(`${PAYMENTS}/_stand-in/test-clocks`)).json()) as { data: { id: string; name: string }[] };
  const clock = clocks.data.find((c) => c.name === `monthly gift ${monthlyGiftId}`);
  expect(clock, "the monthly gift's test clock").toBeDefined();
  const res = await fetch(`${PAYMENTS}/_stand-in/test-clocks/${clock!.id}/advance`, { method: "POST", body: JSON.stringify({ days }) });
  expect(res.status).toBe(200);
}

test("a monthly gift started in the browser renews at the clock's advance, one gift per invoice, and stops when the donor stops it", async ({ page }) => {
  await page.goto("/give");
  await page.getByLabel("Every month").check();
  await page.getByRole("button", { name: "$25" }).click();
  await page.getByLabel("Your name").fill("Tamsin Okafor");
  await page.getByRole("textbox", { name: /^E-mail/ }).fill("tamsin@example.org");
  await page.getByRole("button", { name: "Continue to the first payment" }).click();
  await page.waitForURL(/\/give\/monthly\/[0-9a-f-]{36}\?s=/);
  const monthlyGiftId = new URL(page.url()).pathname.split("/").pop()!;
  await fillCard(page, "4242 4242 4242 4242");
  await page.getByRole("button", { name: "Give $25.00" }).click();
  await expectStatus(page, "active");
  await expectPayments(page, 1);
  await expectAccessible(page);

  await advanceClock(monthlyGiftId, 31);
  await expectPayments(page, 2);
  await advanceClock(monthlyGiftId, 31);
  await expectPayments(page, 3);

  // Each payment has its own gift receipt.
  await page.getByTestId("monthly-payments").getByRole("link", { name: "receipt" }).first().click();
  await expect(page.getByTestId("receipt")).toHaveAttribute("data-kind", "gift");
  await expect(page.getByTestId("receipt")).toContainText("$25.00");
  await page.goBack();

  await page.getByRole("button", { name: "Stop my monthly gift" }).click();
  await page.getByRole("button", { name: "Yes, stop it" }).click();
  // The page redraws for a stopped gift (the manage form gives way to the stopped notice).
  await expect(page.getByRole("region", { name: "Pay or manage" })).toContainText("This monthly gift is stopped");
  await expectStatus(page, "stopped");
  await advanceClock(monthlyGiftId, 62);
  await page.reload();
  await expect(page.getByTestId("monthly-payments").getByRole("listitem")).toHaveCount(3);
});

test("a monthly gift's page and its changes need its private link", async ({ page, request }) => {
  await page.goto("/give/monthly/00000000-0000-4000-8000-000000000000?s=nope");
  await expect(page.getByRole("heading", { name: "We could not find that monthly gift" })).toBeVisible();
  const res = await request.patch("/api/giving/monthly/00000000-0000-4000-8000-000000000000", { data: { amountCents: 1000, token: "nope" } });
  expect(res.status()).toBe(404);
  const bad = await request.post("/api/giving/monthly", { data: { amountCents: 5, contact: { name: "", email: "x" } } });
  expect(bad.status()).toBe(400);
});

test("a one-time gift in memory of someone, with the fee covered, says both on the receipt", async ({ page }) => {
  await page.goto("/give");
  await page.getByRole("button", { name: "$50" }).click();
  await page.getByLabel(/^Cover the card fee/).check();
  await expect(page.getByText("You will be charged $51.81")).toBeVisible();
  await page.getByLabel("Give in honour or in memory of someone").check();
  await page.getByLabel("The gift is").selectOption("memory");
  await page.getByLabel("Their name", { exact: false }).first().fill("Rowan Ellery");
  await page.getByLabel("Your name").fill("Odalys Brightwater");
  await page.getByRole("textbox", { name: /^E-mail/ }).fill("odalys@example.org");
  await page.getByRole("button", { name: "Continue to payment" }).click();
  await page.waitForURL(/\/checkout\//);
  await fillCard(page, "4242 4242 4242 4242");
  await page.getByRole("button", { name: "Pay $51.81" }).click();
  await expect(page.getByText("Thank you for your gift")).toBeVisible({ timeout: 30_000 });
  await page.getByRole("link", { name: "View your receipt" }).click();
  await expect(page.getByTestId("gift-extras")).toContainText("in memory of Rowan Ellery");
  await expect(page.getByTestId("gift-extras")).toContainText("$1.81 you added to cover the card fee");
});
