import { expect, test, type Page } from "@playwright/test";
import { E2E_ENV } from "../../playwright.config";
import { signInAs } from "./support/accounts";
import { expectAccessible } from "./support/axe";

// The mail stand-in the e2e server starts (scripts/start.ts on MAIL_PORT); its inbox keeps
// messages across runs, so every test uses an address of its own.
const INBOX = `http://127.0.0.1:${E2E_ENV.MAIL_PORT}`;

type InboxMessage = { id: string; to: string[]; subject: string; text: string | null };

async function messagesTo(page: Page, email: string): Promise<InboxMessage[]> {
  const response = await page.request.get(`${INBOX}/_stand-in/messages`);
  const { data } = (await response.json()) as { data: InboxMessage[] };
  return data.filter((m) => m.to.some((to) => to.includes(email)));
}

/** Waits for the outbox sender (every few seconds, or at once when kicked) to deliver a subject. */
async function waitForMessage(page: Page, email: string, subject: RegExp): Promise<InboxMessage> {
  await expect
    .poll(async () => (await messagesTo(page, email)).some((m) => subject.test(m.subject)), {
      timeout: 30_000,
    })
    .toBe(true);
  const found = (await messagesTo(page, email)).find((m) => subject.test(m.subject));
  if (!found) throw new Error(`no message ${subject} to ${email}`);
  return found;
}

test("a paid order's confirmation and install guide arrive in the inbox, once each", async ({
  page,
}) => {
  const email = `mail-e2e-${Date.now()}@example.org`;
  // The buyer finds their band first: it travels with the order into both messages.
  await page.goto("/climate");
  await page.getByRole("textbox", { name: /ZIP code/ }).fill("85281");
  await page.getByRole("button", { name: "Find my band" }).click();
  await expect(page.getByTestId("band-result").getByRole("heading", { name: "Very hot summers" })).toBeVisible();
  await page.goto("/houses/saltbush-white");
  await page.getByRole("button", { name: "Add to cart" }).click();
  await expect(page.getByText(/in your cart: view cart/)).toBeVisible();
  await page.goto("/cart");
  await page.getByLabel("Your name").fill("Marisol Fenwick");
  await page.getByRole("textbox", { name: /^E-mail/ }).fill(email);
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
  await page.waitForURL(/\/orders\//);
  await expect(page.getByText("Thank you: your order is paid")).toBeVisible({ timeout: 30_000 });

  const confirmation = await waitForMessage(page, email, /^Order RW-\d+ is in the workshop queue$/);
  const guide = await waitForMessage(page, email, /^Your install guide for order RW-\d+$/);
  expect(confirmation.text).toMatch(/Saltbush × 1 \(\$159\.00 each\) +\$159\.00/);
  expect(confirmation.text).toContain("/orders/");
  // Tempe's summers are very hot (from the imported NOAA normals near ZIP 85281).
  expect(guide.text).toMatch(/light or white outside/);
  expect(confirmation.text).toMatch(/Your summers: very hot summers, from the climate normals near ZIP 85281/);
  expect(guide.text).toMatch(/near ZIP 85281, as you looked it up in our store: very hot summers/);
  expect(guide.text).toMatch(/Afternoon shade/);
  expect(guide.text).toMatch(/Call 811 before you dig a pole hole/);

  // The inbox page a developer looks at lists both, and shows the guide with its plain text.
  // Its file outlives the e2e database, so earlier runs' RW-00001 may be there too: look at this address's rows.
  await page.goto(INBOX);
  const rows = page.getByRole("row").filter({ hasText: email });
  await expect(rows).toHaveCount(2);
  await expect(rows.getByRole("link", { name: confirmation.subject })).toHaveCount(1);
  await rows.getByRole("link", { name: guide.subject }).click();
  await expect(page.getByRole("heading", { name: guide.subject })).toBeVisible();
  await expect(page.locator("pre")).toContainText("Never touch a bat with bare hands");
  // A few sender passes later there is still one of each.
  await page.waitForTimeout(6_000);
  const all = await messagesTo(page, email);
  expect(all.map((m) => m.subject.replace(/RW-\d+/, "RW-n")).sort()).toEqual([
    "Order RW-n is in the workshop queue",
    "Your install guide for order RW-n",
  ]);
});

test("a password reset from the e-mail link works once", async ({ browser }) => {
  const email = `reset-e2e-${Date.now()}@example.org`;
  const signUp = await browser.newContext();
  const first = await signUp.newPage();
  await first.goto("/sign-up");
  await first.getByLabel("Your name").fill("Odalys Brightwater");
  await first.getByLabel("E-mail").fill(email);
  await first.getByLabel("Password").fill("first-owl-meadow-path");
  await first.getByRole("button", { name: "Create account" }).click();
  await first.waitForURL((url) => !url.pathname.startsWith("/sign-up"));
  await signUp.close();

  const context = await browser.newContext();
  const page = await context.newPage();
  await page.goto("/sign-in");
  await page.getByRole("link", { name: "Forgot your password?" }).click();
  await expect(page.getByRole("heading", { name: "Forgot your password?" })).toBeVisible();
  await expectAccessible(page);
  // The sign-in page stays in the document, hidden, after the move (Cache Components keep the last
  // routes' state): the visible field is the one a person types in.
  await page.getByRole("textbox", { name: "E-mail" }).fill(email);
  await page.getByRole("button", { name: "Send the link" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Check your inbox" })).toBeVisible();

  const message = await waitForMessage(page, email, /^Choose a new password$/);
  // Open the message in the stand-in's inbox and follow the link its plain text carries.
  await page.goto(`${INBOX}/messages/${message.id}`);
  const text = (await page.locator("pre").textContent()) ?? "";
  const link = /http:\/\/localhost:\d+\/reset-password\?token=[A-Za-z0-9_%-]+/.exec(text)?.[0];
  expect(link).toBeTruthy();
  await page.goto(link!);
  await expect(page.getByRole("heading", { name: "Choose a new password" })).toBeVisible();
  await expectAccessible(page);
  await page.getByLabel(/^New password ?\(required\)$/).fill("second-heron-lantern");
  await page.getByLabel("New password again").fill("second-heron-lantern");
  await page.getByRole("button", { name: "Save the new password" }).click();
  await expect(
    page.getByRole("status").filter({ hasText: "Your password is changed" }),
  ).toBeVisible();

  await page.getByRole("link", { name: "Sign in" }).last().click();
  await page.getByLabel("E-mail").filter({ visible: true }).fill(email);
  await page.getByLabel("Password").filter({ visible: true }).fill("second-heron-lantern");
  const callback = page.waitForResponse((r) => r.url().includes("/api/auth/callback/credentials"));
  await page.getByRole("button", { name: "Sign in" }).click();
  expect((await callback).ok()).toBe(true);
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));

  // The same link a second time is refused.
  await page.goto(link!);
  await expect(page.getByText("This link was already used.")).toBeVisible();
  await context.close();
});

test("the account and admin mail pages work and pass the accessibility scan", async ({ page }) => {
  await signInAs(page, "customer");
  await page.goto("/account/preferences");
  await expectAccessible(page);
  await page.getByLabel("Send me the seasonal reminders").check();
  await page.getByRole("button", { name: "Save preferences" }).click();
  await expect(
    page.getByRole("status").filter({ hasText: "Saved: you will get the seasonal reminders." }),
  ).toBeVisible();
  await page.reload();
  await expect(page.getByLabel("Send me the seasonal reminders")).toBeChecked();
  await page.getByLabel("Send me the seasonal reminders").uncheck();
  await page.getByRole("button", { name: "Save preferences" }).click();
  await expect(
    page.getByRole("status").filter({ hasText: "Saved: no seasonal reminders." }),
  ).toBeVisible();
  await page.goto("/account/gifts");
  await expect(page.getByRole("heading", { name: "Your gifts", level: 1 })).toBeVisible();
  await expectAccessible(page);
  await page.goto("/unsubscribe?token=not-a-token-we-ever-sent-0000");
  await expect(page.getByText("This link does not work")).toBeVisible();
  await expectAccessible(page);

  await page.context().clearCookies();
  await signInAs(page, "admin");
  await page.goto("/admin");
  await page.getByRole("link", { name: "Mail" }).click();
  await expect(page.getByRole("heading", { name: "Mail", level: 1 })).toBeVisible();
  await expect(page.getByRole("region", { name: /All messages/ })).toContainText("Sent");
  await expectAccessible(page);
  await page.getByRole("link", { name: "Sent", exact: true }).click();
  await expect(page).toHaveURL(/status=sent/);
  await page
    .getByRole("button", { name: /^Send again: Order RW-\d+ is in the workshop queue$/ })
    .first()
    .click();
  await expect(page.getByText("A new copy is queued.")).toBeVisible();
});
