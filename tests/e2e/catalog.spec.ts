import { expect, test } from "@playwright/test";
import { expectAccessible } from "./support/axe";

test("a buyer finds their band from a ZIP code, browses, and sees the fit labels change with the band", async ({ page }) => {
  await page.goto("/climate");
  await expectAccessible(page);
  await page.getByRole("textbox", { name: /ZIP code/ }).fill("85004");
  await page.getByRole("button", { name: "Find my band" }).click();
  const result = page.getByTestId("band-result");
  await expect(result.getByRole("heading", { name: "Very hot summers" })).toBeVisible();
  await expect(result.getByRole("table", { name: "Weather stations used, nearest first" })).toContainText("PHOENIX");
  await expectAccessible(page);

  await result.getByRole("link", { name: /See houses for very hot summers/ }).click();
  await expect(page).toHaveURL(/\/houses\?band=very-hot/);
  const saltbush = page.getByTestId("house-card").filter({ hasText: "Saltbush" });
  const northwind = page.getByTestId("house-card").filter({ hasText: "Northwind Six" });
  await expect(saltbush).toContainText("Suits your summers");
  await expect(northwind).toContainText("Not for your summers");
  await expectAccessible(page);

  // The band follows the buyer: switching to cool summers flips the labels without a reload.
  await page.getByLabel("Your summers").selectOption("cool");
  await expect(page).toHaveURL(/band=cool/);
  await expect(northwind).toContainText("Suits your summers");
  await expect(saltbush).toContainText("Not for your summers");

  await page.getByLabel("Chambers").selectOption("6");
  await expect(page.getByRole("heading", { name: /^\d+ houses? for cool summers/ })).toBeVisible();
  await expect(page.getByTestId("house-card").filter({ hasText: "Twin Ridge" })).toHaveCount(0);

  await northwind.getByRole("link", { name: "Northwind Six" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Northwind Six" })).toBeVisible();
  await expect(page.getByRole("heading", { name: "For cool summers" })).toBeVisible();
  await expect(page.locator("[data-criterion=D1]")).toContainText("3/4 in");
  await expect(page.locator("[data-criterion]")).toHaveCount(11);
  await expectAccessible(page);
});

test("a typed July high in °C works, and an unknown ZIP gets a clear message", async ({ page }) => {
  await page.goto("/climate");
  await page.getByRole("textbox", { name: /ZIP code/ }).fill("00000");
  await page.getByRole("button", { name: "Find my band" }).click();
  await expect(page.getByText(/no map centre for ZIP 00000/)).toBeVisible();
  await page.getByLabel("My summer high").check();
  await page.getByLabel("Average daily high of your warmest month").fill("30");
  await page.getByLabel("Unit").selectOption("C");
  await page.getByRole("button", { name: "Find my band" }).click();
  // 30 °C = 86 °F: warm summers.
  await expect(page.getByTestId("band-result").getByRole("heading", { name: "Warm summers" })).toBeVisible();
  await expect(page.getByTestId("band-result")).toContainText("86.0 °F (30.0 °C)");
  // The cookie keeps what the buyer typed, in their unit.
  const cookie = (await page.context().cookies()).find((c) => c.name === "rw_band")?.value ?? "";
  expect(JSON.parse(decodeURIComponent(cookie))).toMatchObject({ id: "warm", source: "typed", typed: { value: 30, unit: "C" } });

});

test("the home page offers the band finder and the catalog", async ({ page }) => {
  await page.goto("/");
  await expect(page.getByRole("form", { name: "Find your climate band" })).toBeVisible();
  await page.getByRole("link", { name: "Browse the houses" }).first().click();
  await expect(page.getByRole("heading", { level: 1, name: "Bat houses" })).toBeVisible();
});

test("on a phone the filters fold behind a button with the count of active filters, and the first house shows on the first screen", async ({ page }) => {
  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto("/houses?band=hot&chambers=4");
  const toggle = page.getByRole("button", { name: /^Filters/ });
  await expect(toggle).toHaveAttribute("aria-expanded", "false");
  await expect(page.getByTestId("active-filter-count")).toHaveText("2 filters on");
  await expect(page.getByRole("form", { name: "Filter houses" })).toBeHidden();
  const firstCard = page.getByTestId("house-card").first();
  await expect(firstCard).toBeVisible();
  const box = await firstCard.boundingBox();
  expect(box && box.y < 844).toBe(true);
  await expectAccessible(page);

  // By keyboard: the button opens the filters, a change shows in the count.
  await toggle.focus();
  await page.keyboard.press("Enter");
  await expect(page.getByRole("button", { name: /^Hide filters/ })).toHaveAttribute("aria-expanded", "true");
  await expect(page.getByRole("form", { name: "Filter houses" })).toBeVisible();
  await page.getByLabel("In stock only").check();
  await expect(page.getByTestId("active-filter-count")).toHaveText("3 filters on");
  await expectAccessible(page);
  await page.getByRole("button", { name: /^Hide filters/ }).press("Enter");
  await expect(page.getByRole("form", { name: "Filter houses" })).toBeHidden();

  // On a wide screen the filters always stand beside the results and the button is gone.
  await page.setViewportSize({ width: 1280, height: 900 });
  await expect(page.getByRole("form", { name: "Filter houses" })).toBeVisible();
  await expect(page.getByRole("button", { name: /^Filters/ })).toBeHidden();
});

test("each house card opens its own house when the page moves without reloading", async ({ page, request }) => {
  // Client-side navigations between pages of one dynamic route once showed the first house's page
  // under the next one's address (next.config.mjs, experimental.varyParams).
  const { items } = (await (await request.get("/api/houses")).json()) as { items: { slug: string; name: string }[] };
  expect(items.length).toBeGreaterThanOrEqual(3);
  for (const house of items.slice(0, 4)) {
    await page.goto("/houses");
    await page.waitForLoadState("networkidle");
    await page.getByRole("main").locator(`a[href='/houses/${house.slug}']`).first().click();
    await page.waitForURL((url) => url.pathname === `/houses/${house.slug}`);
    await expect(page.getByRole("heading", { level: 1 })).toHaveText(house.name);
  }
});
