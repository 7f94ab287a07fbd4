import { readFileSync } from "node:fs";
import { expect, test, type APIRequestContext, type Page } from "@playwright/test";
import Stripe from "stripe";
import { E2E_ENV } from "../../playwright.config";
import { signInAs } from "./support/accounts";
import { expectAccessible } from "./support/axe";

// Roost reports in a browser (PRODUCT.md §8). The e2e store starts on a fresh database, and its
// demo data holds a guest's order of two Hollow Four houses delivered before the summer two
// seasons ago, with the end-of-season question the season job queued for it (its exact row,
// lib/demo/roost-reports.ts); the sender mails it at start. The season job itself, run for a
// chosen date from a paid order, is proven in tests/integration/roost-reports/season-to-figures.test.ts.

const INBOX = `http://127.0.0.1:${E2E_ENV.MAIL_PORT}`;
const PAYMENTS_PORT = Number(E2E_ENV.PAYMENTS_PORT);
const HAZEL = "hazel.brightwater@larkspur-falls.example";

type InboxMessage = { id: string; to: string[]; subject: string; text: string | null };
type Stat = { n: number; shown: boolean; k?: number; rate?: number; interval?: { lower: number; upper: number } };

async function questionFor(request: APIRequestContext, email: string): Promise<InboxMessage> {
  let found: InboxMessage | undefined;
  await expect
    .poll(async () => {
      const { data } = (await (await request.get(`${INBOX}/_stand-in/messages`)).json()) as { data: InboxMessage[] };
      found = data.find((m) => m.to.some((to) => to.includes(email)) && /^Did bats move in\? Your bat houses, summer \d{4}$/.test(m.subject));
      return Boolean(found);
    }, { timeout: 30_000 })
    .toBe(true);
  return found!;
}

/** The answer links of a question e-mail by house (unit) and answer, read from its plain text. */
function answerLinks(text: string): Map<number, Record<string, string>> {
  const links = new Map<number, Record<string, string>>();
  for (const match of text.matchAll(/http:\/\/[^\s)]+\/roost-reports\/answer\?token=([A-Za-z0-9._%-]+)/g)) {
    const token = decodeURIComponent(match[1]!);
    const claims = JSON.parse(Buffer.from(token.split(".")[1]!, "base64url").toString("utf8")) as { u: number; a: string };
    links.set(claims.u, { ...(links.get(claims.u) ?? {}), [claims.a]: match[0] });
  }
  return links;
}

async function hollowFour(request: APIRequestContext): Promise<Stat> {
  const body = (await (await request.get("/api/houses/hollow-four")).json()) as { occupancy: { overall: Stat } };
  return body.occupancy.overall;
}

async function shoot(page: Page, name: string) {
  // Opt-in design screenshots (git-ignored folder): ROOST_SCREENSHOTS=1.
  if (!process.env.ROOST_SCREENSHOTS) return;
  for (const [label, viewport] of [["phone", { width: 390, height: 844 }], ["desktop", { width: 1280, height: 900 }]] as const) {
    await page.setViewportSize(viewport);
    await page.screenshot({ path: `screenshots/${name}-${label}.png`, fullPage: true });
  }
  await page.setViewportSize({ width: 1280, height: 720 });
}

async function confirm(page: Page, link: string, expected: RegExp) {
  await page.goto(link);
  await expect(page.getByRole("heading", { level: 1, name: /^Summer \d{4}: Hollow Four, house \d of 2$/ })).toBeVisible();
  await page.waitForLoadState("networkidle");
  await expectAccessible(page);
  await page.getByRole("button", { name: "Record this answer" }).click();
  await expect(page.getByRole("status").filter({ hasText: expected })).toBeVisible();
}

test("a guest answers from the e-mail without signing in, changes the answer, bad links are refused, staff leave one out, and the figures move", async ({ browser, request }) => {
  // Three browser contexts and a dozen page visits with axe scans: more than the default minute on a shared machine.
  test.setTimeout(180_000);
  const message = await questionFor(request, HAZEL);
  const text = message.text ?? "";
  const links = answerLinks(text);
  expect([...links.keys()].sort()).toEqual([1, 2]);
  const stopLink = /http:\/\/[^\s)]+\/roost-reports\/stop\?token=[A-Za-z0-9._%-]+/.exec(text)?.[0];
  // No link in the plain text is followed by punctuation, so a mail program that links addresses
  // opens exactly the page (a full stop would have become part of the order's access token).
  const orderLink = /http:\/\/[^\s)]+\/orders\/[0-9a-f-]{36}\?t=[A-Za-z0-9._%-]+/.exec(text)?.[0];
  expect(stopLink, "the stop link in the e-mail").toBeTruthy();
  expect(orderLink, "the private order link in the e-mail").toBeTruthy();
  expect(orderLink).not.toMatch(/[.,;:]$/);
  expect(stopLink).not.toMatch(/[.,;:]$/);

  const before = await hollowFour(request);
  expect(before.shown).toBe(true);

  // The buyer, in a browser that never signed in. House 1: "no sign yet" in its second summer.
  const context = await browser.newContext();
  const guest = await context.newPage();
  await confirm(guest, links.get(1)!.no_sign!, /Thank you: your answer is recorded\./);
  expect(await hollowFour(request)).toMatchObject({ n: before.n + 1, k: before.k });

  // The "bats seen" link is opened in a second tab and left there, its button not pressed.
  const stale = await context.newPage();
  await stale.goto(links.get(1)!.bats_seen!);
  await expect(stale.getByRole("button", { name: "Record this answer" })).toBeVisible();
  await stale.waitForLoadState("networkidle");

  // A second click, on "bats seen" with a count: the answer changes, and the figures with it.
  await guest.goto(links.get(1)!.bats_seen!);
  await expect(guest.getByText(/Your answer now:/)).toContainText("No sign yet");
  await guest.waitForLoadState("networkidle");
  await guest.getByLabel("How many bats, roughly?").selectOption("11-50");
  await shoot(guest, "roost-answer-page");
  await guest.getByRole("button", { name: "Record this answer" }).click();
  await expect(guest.getByRole("status").filter({ hasText: "Thank you: your answer is changed." })).toBeVisible();
  const changed = await hollowFour(request);
  expect(changed).toMatchObject({ n: before.n + 1, k: before.k! + 1 });
  expect(changed.interval!.lower).toBeGreaterThan(before.interval!.lower);

  // The link is spent; the page offers fresh links for the other answers and the order page.
  const change = guest.getByRole("navigation", { name: "Saw something else? Change your answer" });
  await expect(change.getByRole("link")).toHaveText(["No sign yet", "Signs of bats", "House gone or moved", "Your order page (to add a note or a photo)"]);
  await expect(guest.getByRole("button", { name: "Record this answer" })).toHaveCount(0);
  await expectAccessible(guest);
  await shoot(guest, "roost-answer-done");

  // The same link, pressed in the tab left open, is refused by the action and changes nothing.
  await stale.getByRole("button", { name: "Record this answer" }).click();
  await expect(stale.getByText(/^This link has already been used\. Your answer stands as “Bats seen” \(11 to 50 bats\)\./)).toBeVisible();
  await stale.close();
  expect(await hollowFour(request)).toEqual(changed);
  // Opened again, it says so at once, with no button.
  await guest.goto(links.get(1)!.bats_seen!);
  await expect(guest.getByRole("heading", { level: 1, name: "This link has already been used" })).toBeVisible();
  await expect(guest.getByText(/Your answer stands as “Bats seen” \(11 to 50 bats\)\./)).toBeVisible();
  await expect(guest.getByRole("button", { name: "Record this answer" })).toHaveCount(0);
  await expectAccessible(guest);
  await shoot(guest, "roost-answer-used");
  expect(await hollowFour(request)).toEqual(changed);

  // A forged link (the answer changed after signing) and a link made for stopping the questions
  // are refused on the page and by the action behind it; nothing changes.
  const [head, token] = links.get(2)!.signs!.split("?token=") as [string, string];
  const [v, body, sig] = decodeURIComponent(token).split(".") as [string, string, string];
  const claims = JSON.parse(Buffer.from(body, "base64url").toString("utf8")) as Record<string, unknown>;
  const forged = `${v}.${Buffer.from(JSON.stringify({ ...claims, a: "bats_seen" })).toString("base64url")}.${sig}`;
  await guest.goto(`${head}?token=${encodeURIComponent(forged)}`);
  await expect(guest.getByRole("heading", { level: 1, name: "This link cannot record an answer" })).toBeVisible();
  await expect(guest.getByText(/was not made by our store, or it was changed after we sent it/)).toBeVisible();
  await expect(guest.getByRole("button", { name: "Record this answer" })).toHaveCount(0);
  await expectAccessible(guest);
  await shoot(guest, "roost-answer-refused");
  // The stop link's token (with a full stop a mail program might still add) on the answer page.
  const stopToken = new URL(stopLink!).searchParams.get("token")!;
  await guest.goto(`/roost-reports/answer?token=${encodeURIComponent(`${stopToken}.`)}`);
  await expect(guest.getByText("This link was made for something else and cannot record an answer.")).toBeVisible();
  await expectAccessible(guest);
  expect(await hollowFour(request)).toEqual(changed);

  // The guest's private order page asks the same questions; house 2 is answered there.
  await guest.goto(orderLink!);
  const panel = guest.getByTestId("roost-report-panel");
  await expect(panel.getByRole("heading", { name: "Did bats move in?" })).toBeVisible();
  const house1 = panel.getByRole("form", { name: "Hollow Four, house 1 of 2" });
  const house2 = panel.getByRole("form", { name: "Hollow Four, house 2 of 2" });
  await expect(house1).toContainText("Bats seen (11 to 50 bats)");
  await expect(house2).toContainText("Not answered yet");
  await guest.waitForLoadState("networkidle");
  await expectAccessible(guest);
  await house2.getByRole("radio", { name: /Signs of bats/ }).check();
  await house2.getByLabel("How is the house mounted?").selectOption("building");
  await house2.getByRole("button", { name: "Save my answer" }).click();
  await expect(house2.getByRole("status").filter({ hasText: "Thank you: your answer is saved." })).toBeVisible();
  await expect(house2).toContainText("Signs of bats");
  await shoot(guest, "roost-order-page-questions");
  expect(await hollowFour(request)).toMatchObject({ n: before.n + 2, k: before.k! + 2 });
  await context.close();

  // The workshop: house 1's report is marked doubtful with a reason, and leaves the figures.
  const context2 = await browser.newContext();
  const staff = await context2.newPage();
  await signInAs(staff, "staff");
  await staff.goto("/staff/roost-reports");
  await expect(staff.getByRole("heading", { level: 1, name: "Roost reports" })).toBeVisible();
  await staff.waitForLoadState("networkidle");
  await expectAccessible(staff);
  // House 1 of an order is titled by the model alone; this one came by the e-mail link.
  const card = staff
    .getByRole("article", { name: /^Hollow Four: summer \d{4}$/ })
    .filter({ hasText: "from the e-mail link" })
    .filter({ hasText: "11 to 50 bats" });
  await expect(card).toHaveCount(1);
  await shoot(staff, "roost-staff-review");
  await card.getByRole("button", { name: "Doubtful: leave out of figures" }).click();
  await expect(card.getByText("Say why the report is doubtful; it is kept with the report.")).toBeVisible();
  await card.getByLabel("Reason or follow-up note").fill("Count far above every other report in that state; asked the buyer for a photo.");
  await card.getByRole("button", { name: "Doubtful: leave out of figures" }).click();
  await expect(card.getByText("Doubtful: not counted")).toBeVisible();
  await expect(card.getByText(/Count far above every other report/)).toBeVisible();
  await expectAccessible(staff);
  const after = await hollowFour(request);
  expect(after).toMatchObject({ n: before.n + 1, k: before.k! + 1 });

  // The figures page shows the same n and K for the model, in its table.
  await staff.goto("/staff/roost-reports/figures");
  await expect(staff.getByRole("heading", { level: 1, name: "Roost report figures" })).toBeVisible();
  await expectAccessible(staff);
  const figure = staff.getByRole("figure", { name: "Occupancy by model" });
  await figure.getByText("The same figures as a table").click();
  const row = figure.getByRole("row").filter({ has: staff.getByRole("cell", { name: /^Hollow Four/ }) });
  await expect(row.getByRole("cell").nth(1)).toHaveText(String(after.n));
  await expect(row.getByRole("cell").nth(2)).toHaveText(String(after.k));
  await expectAccessible(staff);
  await shoot(staff, "roost-staff-figures");
  await context2.close();
});

test("the model pages show the figures where five or more houses are known, and say so where not", async ({ page, request }) => {
  const stat = await hollowFour(request);
  await page.goto("/houses/hollow-four");
  const figures = page.getByTestId("occupancy-figures");
  await expect(figures).toContainText(`Of the ${stat.n} houses of this model reported in their first two summers, ${stat.k} had bats within two summers`);
  await expect(figures).toContainText(/only from buyers who chose to answer/);
  await expect(figures.getByRole("img").first()).toBeVisible();
  await expectAccessible(page);
  await shoot(page, "roost-model-with-figures");

  // Twin Ridge: two houses known in the demo data, so no rate.
  const twin = (await (await request.get("/api/houses/twin-ridge")).json()) as { occupancy: { overall: Stat } };
  expect(twin.occupancy.overall).toEqual({ n: 2, shown: false, demo: true });
  await page.goto("/houses/twin-ridge");
  await expect(page.getByTestId("occupancy-figures")).toContainText("2 houses reported so far. Not enough reports yet to give a rate.");
  await expect(page.getByTestId("occupancy-figures")).not.toContainText(/had bats within two summers/);
  await expectAccessible(page);
  await shoot(page, "roost-model-not-enough");

  // The catalog's small mark.
  await page.goto("/houses");
  await expectAccessible(page);
});

// --- Privacy: a buyer's place never reaches a public page or API (PRODUCT.md §8).

function payments(): Stripe {
  const secrets = JSON.parse(readFileSync("var/dev-secrets.json", "utf8")) as { STRIPE_SECRET_KEY: string };
  return new Stripe(secrets.STRIPE_SECRET_KEY, { host: "127.0.0.1", port: PAYMENTS_PORT, protocol: "http", telemetry: false, maxNetworkRetries: 0 });
}

test("no public page or JSON carries a buyer's name, address, ZIP, e-mail or coordinates", async ({ request }) => {
  const stamp = Date.now();
  const buyer = { name: "Thessaly Ombrewood", email: `thessaly.ombrewood.${stamp}@example.org` };
  const lat = 44.07123;
  const lon = -121.31177;
  // The buyer checks a site by its coordinates and saves it (as a guest), then pays with it.
  const site = await request.post("/api/sites", {
    data: {
      name: "Back fence",
      input: { lat, lon, mount: "pole", heightFt: 16, facingDeg: 160, pairedBackToBack: false, stacked: false, waterMi: 0.2, woodsEdgeFt: 30, clearFlightPath: true, brightLight: false, predators: false },
    },
  });
  expect(site.ok(), await site.text()).toBe(true);
  const { guestToken } = (await site.json()) as { guestToken: string };
  const started = await request.post("/api/checkout", {
    data: {
      items: [{ slug: "hollow-four", quantity: 1 }],
      method: "parcel",
      contact: buyer,
      address: { name: buyer.name, line1: "919 Quenchwater Spur", line2: "", city: "Bend", state: "OR", zip: "97701" },
      guestSiteToken: guestToken,
    },
  });
  expect(started.ok(), await started.text()).toBe(true);
  const { orderId, clientSecret, accessToken } = (await started.json()) as { orderId: string; clientSecret: string; accessToken: string };
  await payments().paymentIntents.confirm(clientSecret.split("_secret_")[0]!, { payment_method: "pm_card_visa" });
  await expect
    .poll(async () => ((await (await request.get(`/api/orders/${orderId}?t=${encodeURIComponent(accessToken)}`)).json()) as { status: string }).status, { timeout: 30_000 })
    .toBe("paid");

  // What must never show: this buyer's and the demo guest's details (the demo guest's houses
  // are in the figures).
  const secrets = [
    "Thessaly", "Ombrewood", "thessaly.ombrewood", "Quenchwater", "97701", "44.0712", "121.3117",
    "Hazel", "hazel.brightwater", "Quillwort",
  ];
  const { items } = (await (await request.get("/api/houses")).json()) as { items: { slug: string }[] };
  const pages = ["/", "/houses", "/placement", "/climate", ...items.map((i) => `/houses/${i.slug}`)];
  const apis = ["/api/houses", "/api/roost-reports/ratings", ...items.map((i) => `/api/houses/${i.slug}`)];
  const scanned: string[] = [];
  for (const path of [...pages, ...apis]) {
    const response = await request.get(path);
    expect(response.ok(), path).toBe(true);
    const body = await response.text();
    for (const secret of secrets) expect(body.includes(secret), `${secret} in ${path}`).toBe(false);
    scanned.push(path);
  }
  // Another buyer's placement check near the same town answers with the figures by rating only.
  const placement = await request.post("/api/placement", {
    data: { zip: "97702", mount: "pole", heightFt: 16, facingDeg: 160, pairedBackToBack: false, stacked: false, waterMi: 0.2, woodsEdgeFt: 30, clearFlightPath: true, brightLight: false, predators: false },
  });
  expect(placement.ok(), await placement.text()).toBe(true);
  const placementBody = await placement.text();
  for (const secret of secrets) expect(placementBody.includes(secret), `${secret} in POST /api/placement`).toBe(false);
  // The public figures are by band, state and mount only: no field of a house's JSON names a place finer than that.
  const house = (await (await request.get("/api/houses/hollow-four")).json()) as { occupancy: Record<string, unknown> };
  expect(Object.keys(house.occupancy).sort()).toEqual(["byBand", "byMount", "caveat", "demo", "demoNote", "firstOccupancy", "minimumHouses", "overall", "summersWindow"]);
  expect(JSON.stringify(house.occupancy)).not.toMatch(/"(lat|lon|zip|city|line1|email|name|siteId|orderId|houseKey)"/);
  expect(scanned.length).toBeGreaterThan(10);
});
