import { expect, test, type Page } from "@playwright/test";
import { DEMO_ORGANIZATION, DEMO_SHIPPING_RATES } from "../../lib/demo/seed-data";
import { signInAs } from "./support/accounts";
import { expectAccessible } from "./support/axe";

async function addToCart(page: Page, slug: string) {
  await page.goto(`/houses/${slug}`);
  await page.getByRole("button", { name: "Add to cart" }).click();
  await expect(page.getByText(/in your cart: view cart/)).toBeVisible();
}

async function fillCard(page: Page, number: string) {
  await page.getByLabel("Card number").fill(number);
  await page.getByLabel("Expiration date (MM / YY)").fill("12 / 34");
  await page.getByLabel("Security code (CVC)").fill("123");
}

test("a guest buys two houses with a $25 gift, is declined once, pays on the same order, and sees the order and receipt", async ({ page }) => {
  await addToCart(page, "hollow-four");
  await addToCart(page, "twin-ridge");
  await page.goto("/cart");
  await expect(page.getByTestId("cart-line")).toHaveCount(2);
  await page.getByRole("button", { name: "$25" }).click();
  await page.getByLabel("Your name").fill("Marisol Fenwick");
  await page.getByRole("textbox", { name: /^E-mail/ }).fill("marisol@example.org");
  await page.getByLabel("Ship to (name)").fill("Marisol Fenwick");
  await page.getByLabel("Street address").fill("12 Heron Way");
  await page.getByLabel("Town or city").fill("Tempe");
  await page.getByLabel("State").selectOption("AZ");
  await page.getByLabel("ZIP code").fill("85281");
  // Hollow Four $149 + Twin Ridge $89; AZ 5.6% on goods; two parcels; $25 gift.
  await expect(page.getByTestId("order-summary")).toContainText("Conservation gift$25.00");
  await expect(page.getByTestId("order-summary")).toContainText("Sales tax$13.33");
  await expectAccessible(page);
  await page.getByRole("button", { name: "Continue to payment" }).click();
  await page.waitForURL(/\/checkout\//);
  const checkoutUrl = page.url();
  await expectAccessible(page);

  await fillCard(page, "4000 0000 0000 0002");
  await page.getByRole("button", { name: /^Pay \$/ }).click();
  await expect(page.getByTestId("form-error")).toContainText(/declined/i);
  expect(page.url()).toBe(checkoutUrl);

  await fillCard(page, "4242 4242 4242 4242");
  await page.getByRole("button", { name: /^Pay \$/ }).click();
  await page.waitForURL(/\/orders\//);
  await expect(page.getByText("Thank you: your order is paid")).toBeVisible({ timeout: 30_000 });
  await expect(page.getByRole("cell", { name: "Hollow Four" })).toBeVisible();
  await expectAccessible(page);

  await page.getByRole("link", { name: "View your receipt" }).click();
  const receipt = page.getByTestId("receipt");
  await expect(receipt).toHaveAttribute("data-kind", "mixed");
  await expect(page.getByTestId("deductible")).toHaveText("$25.00");
  await expect(receipt).toContainText("good-faith estimate");
  await expectAccessible(page);

  // The cart was emptied by the payment.
  await page.goto("/cart");
  await expect(page.getByRole("heading", { name: "Your cart is empty" })).toBeVisible();
});

test("a gift on its own from /give gets a gift receipt", async ({ page }) => {
  await page.goto("/give");
  await expectAccessible(page);
  await page.getByRole("button", { name: "$50" }).click();
  await page.getByLabel("Your name").fill("Odalys Brightwater");
  await page.getByRole("textbox", { name: /^E-mail/ }).fill("odalys@example.org");
  await page.getByRole("button", { name: "Continue to payment" }).click();
  await page.waitForURL(/\/checkout\//);
  await fillCard(page, "4242 4242 4242 4242");
  await page.getByRole("button", { name: "Pay $50.00" }).click();
  await expect(page.getByText("Thank you for your gift")).toBeVisible({ timeout: 30_000 });
  await page.getByRole("link", { name: "View your receipt" }).click();
  await expect(page.getByTestId("receipt")).toHaveAttribute("data-kind", "gift");
  await expect(page.getByTestId("receipt")).toContainText("No goods or services");
});

// Runs last in this file: it changes the rate table and puts it back.
test("the footer names the center from its settings, and staff are told which parcels no rate covers", async ({ page }) => {
  await page.goto("/");
  const footer = page.getByRole("contentinfo");
  await expect(footer).toContainText(DEMO_ORGANIZATION.displayName);
  await expect(footer).toContainText(`${DEMO_ORGANIZATION.city}, ${DEMO_ORGANIZATION.state} ${DEMO_ORGANIZATION.zip}`);
  await footer.screenshot({ path: "test-results/home-footer.png" });

  await signInAs(page, "admin");
  await page.goto("/admin/settings");
  const notice = page.getByText(/No shipping rate covers parcels of/);
  await expect(page.getByRole("heading", { name: "Parcel rates" })).toBeVisible();
  await expect(notice).toHaveCount(0);

  // Keep only the lightest tier: the heavier houses on sale are no longer covered.
  for (let i = DEMO_SHIPPING_RATES.length; i > 1; i--) await page.getByRole("button", { name: "Remove" }).nth(i - 1).click();
  await page.getByRole("button", { name: "Save rates" }).click();
  await expect(page.getByText("Saved 1 rate tiers.")).toBeVisible();
  await page.reload();
  await expect(notice).toBeVisible();
  await expect(page.getByText(new RegExp(`No shipping rate covers parcels of ${DEMO_SHIPPING_RATES[0]!.maxBillableLb + 1}(–\\d+)? lb billable weight`))).toBeVisible();
  await expect(page.getByText(/Checkout refuses parcels of/)).toBeVisible();
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.screenshot({ path: "test-results/admin-settings-rate-notice.png", fullPage: false });
  await expectAccessible(page);

  // Put the table back; the notice goes away.
  for (let i = 1; i < DEMO_SHIPPING_RATES.length; i++) {
    await page.getByRole("button", { name: "Add a tier" }).click();
    await page.getByLabel(`Tier ${i + 1} weight limit in pounds`).fill(String(DEMO_SHIPPING_RATES[i]!.maxBillableLb));
    await page.getByLabel(`Tier ${i + 1} price in dollars`).fill((DEMO_SHIPPING_RATES[i]!.cents / 100).toFixed(2));
  }
  await page.getByRole("button", { name: "Save rates" }).click();
  await expect(page.getByText(`Saved ${DEMO_SHIPPING_RATES.length} rate tiers.`)).toBeVisible();
  await page.reload();
  await expect(page.getByRole("heading", { name: "Parcel rates" })).toBeVisible();
  await expect(notice).toHaveCount(0);
});
