import { expect, test, type APIRequestContext, type Page } from "@playwright/test";
import sharp from "sharp";
import { signInAs } from "./support/accounts";

// The catalog is cached (lib/catalog/cached.ts): a buyer's request never waits on the database. Each
// staff change that a buyer sees must show on the buyer's very next request, on the production
// server. The buyer's views are read first (so they are cached), then the change is made through
// the workshop's pages, then read once more: nothing stale. Everything changed is put back, so the
// specs after this one find the catalog as seeded.

type Card = { slug: string; priceCents: number; stock: number; photo: { id: string } | null };
type Detail = { priceCents: number; stock: number; certification: { inspectedOn: string | null } };

async function buyerView(buyer: APIRequestContext, slug: string) {
  const list = await buyer.get("/api/houses");
  expect(list.ok()).toBe(true);
  const card = ((await list.json()) as { items: Card[] }).items.find((c) => c.slug === slug) ?? null;
  const one = await buyer.get(`/api/houses/${slug}`);
  const detail = one.ok() ? ((await one.json()) as Detail) : null;
  const page = await (await buyer.get(`/houses/${slug}`)).text();
  const catalogPage = await (await buyer.get("/houses")).text();
  return { card, detail, page, catalogPage };
}

/** Reads the buyer's views twice, so the second read is certainly served from the cache. */
async function warm(buyer: APIRequestContext, slug: string) {
  await buyerView(buyer, slug);
  return buyerView(buyer, slug);
}

const field = (page: Page, label: string) => page.getByLabel(new RegExp(`^${label}`));

async function setPrice(page: Page, slug: string, dollars: string) {
  await page.goto(`/staff/models/${slug}`);
  await field(page, "Price \\(USD\\)").fill(dollars);
  await page.getByRole("button", { name: "Save changes" }).click();
  await expect(page.getByText("Saved.", { exact: true })).toBeVisible();
}

async function receive(page: Page, slug: string, count: number) {
  await page.goto(`/staff/models/${slug}/stock`);
  await field(page, "How many").fill(String(count));
  await field(page, "Batch").fill("fresh-check");
  await page.getByRole("button", { name: "Receive stock" }).click();
}

test("every staff change a buyer sees shows on the buyer's next request", async ({ page, browser }) => {
  test.setTimeout(240_000);
  const buyerContext = await browser.newContext();
  const buyer = buyerContext.request;
  const slug = "hollow-four";
  await signInAs(page, "admin");

  // Price.
  const before = await warm(buyer, slug);
  expect(before.card?.priceCents).toBe(14900);
  await setPrice(page, slug, "163.25");
  const priced = await buyerView(buyer, slug);
  expect(priced.card?.priceCents).toBe(16325);
  expect(priced.detail?.priceCents).toBe(16325);
  expect(priced.page).toContain("$163.25");
  expect(priced.catalogPage).toContain("$163.25");
  await setPrice(page, slug, "149");
  expect((await buyerView(buyer, slug)).card?.priceCents).toBe(14900);

  // Stock.
  const stocked = (await warm(buyer, slug)).card!.stock;
  await receive(page, slug, 3);
  await expect(page.getByTestId("stock-on-hand")).toHaveText(String(stocked + 3));
  const more = await buyerView(buyer, slug);
  expect(more.card?.stock).toBe(stocked + 3);
  expect(more.detail?.stock).toBe(stocked + 3);
  await field(page, "Reason").selectOption("recount");
  await page.getByLabel(/^Change/).fill("-3");
  // The adjustment's note (the second form's): a recount says what it found.
  await page.getByLabel(/^Note/).last().fill("Counted again after the freshness check");
  await page.getByRole("button", { name: "Record adjustment" }).click();
  await expect(page.getByTestId("stock-on-hand")).toHaveText(String(stocked));
  expect((await buyerView(buyer, slug)).card?.stock).toBe(stocked);

  // Inspection: a built unit measured today, exactly as listed. On another model: an inspection
  // cannot be taken back, and the workshop spec expects this one's to fall due.
  const inspectSlug = "sparrowgate-single";
  const inspectedBefore = (await warm(buyer, inspectSlug)).detail!.certification.inspectedOn;
  await page.goto(`/staff/models/${inspectSlug}/inspections`);
  await field(page, "Measured chamber gap").fill("3/4");
  await field(page, "Measured chamber height").fill("22");
  await field(page, "Measured chamber width").fill("14");
  await field(page, "Measured landing area").fill("4");
  await field(page, "Inside surface as built").selectOption("grooved");
  await page.getByLabel("Seams are sealed on the built unit").check();
  await page.getByRole("button", { name: "Record inspection" }).click();
  await expect(page.getByText("Passed: recorded in the history below")).toBeVisible();
  const inspected = await buyerView(buyer, inspectSlug);
  expect(inspected.detail?.certification.inspectedOn).not.toBe(inspectedBefore);
  expect(Date.parse(inspected.detail!.certification.inspectedOn!)).toBeGreaterThan(Date.parse(inspectedBefore!));

  // Photo, on another model (the specs after this one expect this one's drawing).
  const photoSlug = "ember-five";
  const photoBefore = (await warm(buyer, photoSlug)).card;
  expect(photoBefore).not.toBeNull();
  await page.goto(`/staff/models/${photoSlug}/photos`);
  await page.locator('input[type="file"]').setInputFiles([
    {
      name: "fresh.jpg",
      mimeType: "image/jpeg",
      buffer: await sharp({ create: { width: 900, height: 700, channels: 3, background: "#6b4f3a" } }).jpeg().toBuffer(),
    },
  ]);
  await page.getByLabel(/^Description of fresh\.jpg/).fill("The house on its post, seen from the south");
  await page.getByRole("button", { name: "Add 1 photo" }).click();
  await expect(page.getByRole("progressbar").first()).toHaveAttribute("aria-valuetext", "Added", { timeout: 60_000 });
  const withPhoto = await buyerView(buyer, photoSlug);
  expect(withPhoto.card?.photo).not.toBeNull();
  expect(withPhoto.card?.photo?.id).not.toBe(photoBefore?.photo?.id ?? "none");
  expect(withPhoto.page).toContain("The house on its post, seen from the south");

  // Retire, then back on sale.
  await warm(buyer, "twin-ridge");
  await page.goto("/staff/models/twin-ridge");
  await page.getByRole("button", { name: "Retire" }).click();
  await page.getByRole("dialog").getByRole("button", { name: "Retire" }).click();
  await expect(page.getByRole("heading", { level: 2, name: "Retired" })).toBeVisible();
  const retired = await buyerView(buyer, "twin-ridge");
  expect(retired.card).toBeNull();
  expect(retired.detail).toBeNull();
  expect(retired.catalogPage).not.toContain("Twin Ridge");
  await page.getByRole("button", { name: "Put back on sale" }).click();
  await expect(page.getByRole("heading", { level: 2, name: "On sale" })).toBeVisible();
  const back = await buyerView(buyer, "twin-ridge");
  expect(back.card).not.toBeNull();
  expect(back.page).toContain("Twin Ridge");

  await buyerContext.close();
});
