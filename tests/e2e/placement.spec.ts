import { expect, test, type Page } from "@playwright/test";
import { E2E_ENV } from "../../playwright.config";
import { signInAs } from "./support/accounts";
import { expectAccessible } from "./support/axe";

// The mail stand-in of the server under test (its port is overridable for a run against `npm run dev`).
const MAIL = `http://localhost:${process.env.MAIL_PORT ?? E2E_ENV.MAIL_PORT}`;

/** Tempe, Arizona: a very hot band from the nearest NOAA stations. */
async function describeSite(page: Page, { mount }: { mount: "Pole" | "Building wall" | "Tree" }) {
  await page.getByLabel("ZIP code", { exact: true }).fill("85281");
  await page.getByRole("radio", { name: mount }).check();
  await page.getByLabel("Height above ground (ft)").fill("16");
  await page.getByLabel("Distance to water (mi)").fill("0.2");
  await page.getByLabel("Distance to the nearest trees (ft)").fill("30");
}

const rating = (page: Page) => page.getByTestId("site-rating");
const rule = (page: Page, id: string) => page.locator(`[data-rule="${id}"]`);

test("a guest checks a site, fixes a poor rule, saves it, buys, and the install guide names the site", async ({
  page,
  request,
}) => {
  await page.goto("/placement");
  await expect(
    page.getByRole("heading", { level: 1, name: "Will bats like this spot?" }),
  ).toBeVisible();
  await expectAccessible(page);

  await describeSite(page, { mount: "Tree" });
  await page.getByRole("button", { name: "Check this site" }).click();
  await expect(rating(page)).toHaveAttribute("data-label", "poor");
  await expect(rule(page, "P1")).toHaveAttribute("data-status", "poor");
  await expect(rule(page, "P1")).toContainText(
    "What to change: Mount the house on a pole or on a building wall instead.",
  );
  await expect(page.getByText(/Very hot summers/).first()).toBeVisible();
  await expect(page.getByText("Trees and buildings are not modelled")).toBeVisible();

  // The chart, and its table of the same figures.
  const chart = page.getByRole("img", { name: /Sun on the house face, hour by hour/ });
  await expect(chart).toBeVisible();
  await expect(chart).toHaveAccessibleName(/May to August mean: \d+ h/);
  await page.getByText("The same figures as a table").click();
  await expect(
    page.getByRole("table", { name: "Minutes of direct sun on the face, by solar hour" }),
  ).toBeVisible();

  // The compass dial answers the keyboard: 5° a press, 15° with Shift, Home for north.
  const dial = page.getByRole("slider", { name: "Which way the house faces" });
  await dial.focus();
  await page.keyboard.press("ArrowRight");
  await expect(dial).toHaveAttribute("aria-valuetext", "165°, south-southeast");
  await page.keyboard.press("Shift+ArrowLeft");
  await expect(dial).toHaveAttribute("aria-valuetext", "150°, south-southeast");
  await expect(page.getByLabel("Bearing in degrees")).toHaveValue("150");
  // And the pointer: a drag to the dial's left edge turns the house to face west.
  const box = await dial.boundingBox();
  if (!box) throw new Error("the dial has no box");
  await page.mouse.move(box.x + box.width / 2, box.y + box.height - 4);
  await page.mouse.down();
  await page.mouse.move(box.x + 4, box.y + box.height / 2, { steps: 5 });
  await page.mouse.up();
  await expect(dial).toHaveAttribute(
    "aria-valuetext",
    /^2(6\d|7\d)°, (west|west-southwest|west-northwest)$/,
  );
  await page.getByLabel("Bearing in degrees").fill("160");
  await expect(dial).toHaveAttribute("aria-valuetext", "160°, south-southeast");

  // Fix the poor rule: a pole instead of the tree. The check updates on its own.
  await page.getByRole("radio", { name: "Pole" }).check();
  await expect(rule(page, "P1")).toHaveAttribute("data-status", "good");
  await expect(rating(page)).not.toHaveAttribute("data-label", "poor");
  await expectAccessible(page);

  await page.getByLabel("Name of the site").fill("Pole by the pond");
  await page.getByRole("button", { name: "Save site" }).click();
  await expect(page.getByText("Saved as “Pole by the pond”")).toBeVisible();
  const saved = await page.evaluate(() =>
    JSON.parse(localStorage.getItem("roostwright.site.v1") ?? "null"),
  );
  expect(saved).toMatchObject({
    name: "Pole by the pond",
    bandId: "very-hot",
    guestToken: expect.any(String),
  });
  const cookies = await page.context().cookies();
  expect(decodeURIComponent(cookies.find((c) => c.name === "rw_band")?.value ?? "")).toContain(
    '"id":"very-hot"',
  );

  await page.getByRole("link", { name: "See houses that suit this site" }).first().click();
  await expect(page).toHaveURL(/\/houses\?band=very-hot/);

  // Buy: the cart sends the saved site with the order.
  await page.goto("/houses/hollow-four");
  await page.getByRole("button", { name: "Add to cart" }).click();
  await page.goto("/cart");
  await page.getByRole("textbox", { name: /^Your name/ }).fill("Marisol Fenwick");
  await page.getByRole("textbox", { name: /^E-mail/ }).fill("marisol.site@example.org");
  await page.getByLabel("Ship to (name)").fill("Marisol Fenwick");
  await page.getByLabel("Street address").fill("12 Heron Way");
  await page.getByLabel("Town or city").fill("Tempe");
  await page.getByLabel("State").selectOption("AZ");
  await page.getByLabel("ZIP code").fill("85281");
  await page.getByRole("button", { name: "Continue to payment" }).click();
  await page.waitForURL(/\/checkout\//);
  await page.getByLabel("Card number").fill("4242 4242 4242 4242");
  await page.getByLabel("Expiration date (MM / YY)").fill("12 / 34");
  await page.getByLabel("Security code (CVC)").fill("123");
  await page.getByRole("button", { name: /^Pay \$/ }).click();
  await expect(page.getByText("Thank you: your order is paid")).toBeVisible({ timeout: 30_000 });

  // The install guide e-mail (sent through the mail stand-in) is written for the saved site.
  await expect
    .poll(
      async () => {
        const res = await request.get(`${MAIL}/_stand-in/messages`);
        const { data } = (await res.json()) as {
          data: { to: string[]; html: string | null; text: string | null }[];
        };
        return data
          .filter((m) => m.to.some((to) => to.includes("marisol.site@example.org")))
          .some((m) => `${m.text ?? ""} ${m.html ?? ""}`.includes("Pole by the pond"));
      },
      { timeout: 45_000, intervals: [1_000] },
    )
    .toBe(true);
});

test("coordinates far from any station ask for the July high beside its field", async ({
  page,
}) => {
  await page.goto("/placement");
  await page.getByRole("radio", { name: "By latitude and longitude" }).check();
  await page.getByRole("textbox", { name: "Latitude" }).fill("95");
  await page.getByRole("textbox", { name: "Longitude" }).fill("2.35");
  await page.getByLabel("Height above ground (ft)").fill("16");
  await page.getByLabel("Distance to water (mi)").fill("0.2");
  await page.getByLabel("Distance to the nearest trees (ft)").fill("30");
  await page.getByRole("button", { name: "Check this site" }).click();
  await expect(page.getByText("Latitude must be between -90 and 90.")).toBeVisible();

  await page.getByRole("textbox", { name: "Latitude" }).fill("48.85");
  const julyHigh = page.getByLabel("Average daily high in July (°F)");
  await expect(julyHigh).toBeVisible();
  await expect(page.getByText(/none is within 60 mi of this spot/).first()).toBeVisible();
  await julyHigh.fill("77");
  await expect(rating(page)).toBeVisible();
  await expect(page.getByText(/July high used: 77 °F/)).toBeVisible();
  await expect(page.getByText(/Cool summers/).first()).toBeVisible();
  await expectAccessible(page);
});

test("a signed-in buyer keeps sites in the account, opens one and deletes it", async ({ page }) => {
  // Unique per run, so a server reused between runs still finds exactly one.
  const name = `Garage gable ${Date.now().toString(36)}`;
  await signInAs(page, "customer");
  await page.goto("/placement");
  await describeSite(page, { mount: "Building wall" });
  await page.getByRole("checkbox", { name: "A bright light shines on or near the house" }).check();
  await page.getByRole("button", { name: "Check this site" }).click();
  await expect(rule(page, "P8")).toHaveAttribute("data-status", "poor");
  await page.getByLabel("Name of the site").fill(name);
  await page.getByRole("button", { name: "Save site" }).click();
  await expect(page.getByText(`Saved as “${name}”`)).toBeVisible();
  const saved = await page.evaluate(() =>
    JSON.parse(localStorage.getItem("roostwright.site.v1") ?? "null"),
  );
  expect(saved.guestToken).toBeUndefined();

  await page.getByRole("link", { name: "Your saved sites" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Your saved sites" })).toBeVisible();
  await expect(page.getByRole("heading", { name, exact: true })).toBeVisible();
  await expectAccessible(page);

  await page.getByRole("link", { name: `Open ${name}` }).click();
  await expect(page.getByText(`Editing your saved site “${name}”.`)).toBeVisible();
  await expect(page.getByLabel("ZIP code", { exact: true })).toHaveValue("85281");
  await expect(
    page.getByRole("checkbox", { name: "A bright light shines on or near the house" }),
  ).toBeChecked();
  await expect(rule(page, "P8")).toHaveAttribute("data-status", "poor");

  await page.goto("/account/sites");
  await page.getByRole("button", { name: `Delete ${name}` }).click();
  const dialog = page.getByRole("dialog", { name: `Delete “${name}”?` });
  await expect(dialog).toBeVisible();
  await dialog.getByRole("button", { name: "Delete site" }).click();
  await expect(dialog).toBeHidden();
  await expect(page.getByRole("heading", { name, exact: true })).toHaveCount(0);
});
