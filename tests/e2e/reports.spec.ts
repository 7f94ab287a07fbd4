import { expect, test } from "@playwright/test";
import { signInAs } from "./support/accounts";
import { expectAccessible } from "./support/axe";

// The center's reports in a browser (issue 17): the admin sees sales, gifts and stock with charts,
// tables and CSV files; workshop staff see the stock part only. The figures themselves are checked
// against the database in tests/integration/giving/reports.test.ts and reports-csv.test.ts.

test("an admin sees charts, tables and CSV files for sales, gifts and stock", async ({ page }) => {
  await signInAs(page, "admin");
  await page.goto("/admin");
  await page.getByRole("link", { name: "Reports" }).click();
  await expect(page).toHaveURL(/\/admin\/reports$/);
  await expect(page.getByRole("heading", { level: 1, name: "Reports" })).toBeVisible();
  await page.goto("/admin/reports?from=2020-01-01&to=2040-12-31");
  await expect(page.getByLabel("From")).toHaveValue("2020-01-01");
  await expect(page.getByRole("img", { name: "Stock value by model" })).toBeVisible();
  await expect(page.getByRole("region", { name: "Sales and gifts by month, 2020-01-01 to 2040-12-31" })).toBeVisible();
  await expect(page.getByRole("region", { name: "Stock on hand and its value at list price" })).toBeVisible();
  await expect(page.getByRole("region", { name: "Build plan: houses to build before next spring" })).toBeVisible();
  // The money chart draws when the range holds a sale or gift; otherwise it says there is none.
  await expect(page.getByRole("img", { name: "Sales and gifts by month" }).or(page.getByText("No sales or gifts in this range."))).toBeVisible();
  await expectAccessible(page);

  const download = page.waitForEvent("download");
  await page.getByRole("link", { name: "Download sales and gifts by month (CSV)" }).click();
  const file = await download;
  expect(file.suggestedFilename()).toBe("sales-and-gifts-2020-01-01-to-2040-12-31.csv");
  const { readFile } = await import("node:fs/promises");
  const text = await readFile((await file.path())!, "utf8");
  expect(text.split("\r\n")[0]).toBe("month,orders,sales_usd,one_time_gifts_usd,monthly_gifts_usd");
  expect(text).toMatch(/\r\ntotal,\d+,[\d.]+,[\d.]+,[\d.]+\r\n$/);

  const stock = await page.request.get("/api/admin/reports/stock.csv");
  expect(stock.status()).toBe(200);
  expect((await stock.text()).split("\r\n")[0]).toBe("model,slug,in_stock,list_price_usd,stock_value_usd");
});

test("workshop staff see the stock part only", async ({ page }) => {
  await signInAs(page, "staff");
  await page.goto("/staff");
  await page.getByRole("link", { name: "Stock report" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Stock report" })).toBeVisible();
  await expect(page.getByRole("img", { name: "Stock value by model" })).toBeVisible();
  await expect(page.getByRole("region", { name: "Build plan: houses to build before next spring" })).toBeVisible();
  await expect(page.getByText("Sales and gifts by month")).toHaveCount(0);
  await expect(page.getByText("Monthly donors now")).toHaveCount(0);
  await expectAccessible(page);
  expect((await page.request.get("/api/admin/reports/stock.csv")).status()).toBe(200);
  expect((await page.request.get("/api/admin/reports/sales.csv")).status()).toBe(403);
  await page.goto("/admin/reports");
  await expect(page).toHaveURL(/\/forbidden/);
});
