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
  await expect(page.getByText("Open sky assumed")).toBeVisible();

  // The chart, and its table of the same figures.
  const chart = page.getByRole("img", { name: /The sun's path over your skyline/ });
  await expect(chart).toBeVisible();
  await expect(chart).toHaveAccessibleDescription(/May to August, mean: \d+ h/);
  await page.getByText("The same figures as a table").click();
  await expect(
    page.getByRole("table", { name: /Where the sun stands each solar hour/ }),
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
  expect(JSON.parse(decodeURIComponent(cookies.find((c) => c.name === "rw_band")?.value ?? "{}"))).toMatchObject({
    id: "very-hot",
    source: "site",
    siteName: "Pole by the pond",
  });

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
          .some((m) => {
            const body = `${m.text ?? ""} ${m.html ?? ""}`;
            // The guide carries the site's skyline in words: here none was given.
            return body.includes("Pole by the pond") && body.includes("An open sky was assumed");
          });
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
  const julyHigh = page.getByLabel("Average daily high of your warmest month (°F)");
  await expect(julyHigh).toBeVisible();
  await expect(page.getByText(/none is within 60 mi of this spot/).first()).toBeVisible();
  await julyHigh.fill("77");
  await expect(rating(page)).toBeVisible();
  await expect(page.getByText(/used: 77.0 °F/)).toBeVisible();
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

/** "15 h 10 min a day, …" → 15.17 */
async function readHouseHours(page: Page): Promise<number> {
  const text = (await page.getByTestId("house-hours").textContent()) ?? "";
  const match = /^(\d+) h(?: (\d+) min)?/.exec(text.trim());
  if (!match) throw new Error(`no hours in "${text}"`);
  return Number(match[1]) + Number(match[2] ?? 0) / 60;
}

test("the skyline: typed with the keyboard alone, then a preset; the chart and the result follow", async ({
  page,
}) => {
  await page.goto("/placement");
  // Seattle, a pole facing 160° (the default bearing): well above 10 h under an open sky.
  await page.getByLabel("ZIP code", { exact: true }).fill("98101");
  await page.getByLabel("Height above ground (ft)").fill("16");
  await page.getByLabel("Distance to water (mi)").fill("0.2");
  await page.getByLabel("Distance to the nearest trees (ft)").fill("30");
  await expect(rating(page)).toBeVisible();
  await expect(page.getByTestId("skyline-effect")).toContainText("An open sky was assumed");
  const openSky = await readHouseHours(page);
  expect(openSky).toBeGreaterThan(14);
  await expect(rule(page, "P4")).toHaveAttribute("data-status", "good");

  // Keyboard only: choose to describe the skyline, then type 20° into each of the 16 boxes.
  await page.getByRole("radio", { name: "Leave it out (we assume open sky)" }).focus();
  await page.keyboard.press("ArrowDown");
  await expect(page.getByRole("radio", { name: "Describe the skyline" })).toBeChecked();
  await page.getByLabel("Skyline toward the north, degrees").focus();
  for (let k = 0; k < 16; k++) {
    await page.keyboard.press("ControlOrMeta+A");
    await page.keyboard.type("20");
    if (k < 15) await page.keyboard.press("Tab");
  }
  await expect(page.getByLabel("Skyline toward the north-northwest, degrees")).toHaveValue("20");
  await expect(page.getByTestId("skyline-effect")).toContainText(
    "The skyline you described takes about",
  );
  await expect.poll(() => readHouseHours(page)).toBeLessThanOrEqual(openSky - 2);
  const uniform = await readHouseHours(page);
  const chart = page.getByRole("img", { name: /The sun's path over your skyline/ });
  await expect(chart).toHaveAccessibleDescription(/hides the sun for about \d+ h/);

  // A bad angle is refused beside the grid, naming the direction.
  await page.getByLabel("Skyline toward the east, degrees").fill("95");
  await page.getByRole("button", { name: "Check this site" }).click();
  await expect(
    page.getByText("The angle toward the east must be between 0° (open sky) and 90°."),
  ).toBeVisible();
  await page.getByLabel("Skyline toward the east, degrees").fill("20");

  // A preset, picked and applied from the keyboard.
  await page
    .getByLabel("What the site looks like")
    .selectOption({ label: "A clearing in the woods" });
  await page.getByRole("button", { name: "Use this skyline" }).focus();
  await page.keyboard.press("Enter");
  await expect(page.getByText("Skyline filled in: A clearing in the woods.")).toBeVisible();
  await expect(page.getByLabel("Skyline toward the north, degrees")).toHaveValue("25");
  await expect.poll(() => readHouseHours(page)).toBeLessThan(uniform);
  await expect(page.getByTestId("skyline-effect")).toContainText(/to the (east|west) take about/);
  await page.getByText("The same figures as a table").click();
  await expect(page.getByRole("cell", { name: "Hidden by the skyline" }).first()).toBeVisible();
  await expectAccessible(page);

  // The same spot on a wall: the face figure, and the advice to use a pole.
  await page.getByRole("radio", { name: "Leave it out (we assume open sky)" }).check();
  await page.getByRole("radio", { name: "Building wall" }).check();
  await expect(rule(page, "P4")).toHaveAttribute("data-status", "fair");
  await expect(rule(page, "P4")).toContainText("A pole in the open gets more sun than any wall");
  const wall = await readHouseHours(page);
  expect(wall).toBeGreaterThan(9.5);
  expect(wall).toBeLessThan(9.9);

  // The phone button says plainly when this browser shares no sensors.
  await page.getByRole("radio", { name: "Describe the skyline" }).check();
  await page.getByRole("button", { name: "Measure with this phone" }).click();
  await expect(page.getByText("The phone's sensors are not available here")).toBeVisible({
    timeout: 10_000,
  });
});
