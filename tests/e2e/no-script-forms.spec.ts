import { expect, test, type Page } from "@playwright/test";
import { E2E_ENV } from "../../playwright.config";
import { demoAccount } from "./support/accounts";

// With the page's script off (a slow phone, a blocked script) the forms that take an e-mail or
// a password still work, and post: no URL the browser visits or requests ever carries them.

test.use({ javaScriptEnabled: false });

const INBOX = `http://127.0.0.1:${E2E_ENV.MAIL_PORT}`;

/** Every URL the page requests or navigates to, to check afterwards. */
function recordUrls(page: Page): string[] {
  const urls: string[] = [];
  page.on("request", (request) => urls.push(request.url()));
  page.on("framenavigated", (frame) => urls.push(frame.url()));
  return urls;
}

function expectNoCredentialsIn(urls: string[]) {
  expect(urls.length).toBeGreaterThan(0);
  const leaks = urls.filter((url) => /[?&](password|email|confirm)=/i.test(url) || /@example\.org/i.test(decodeURIComponent(url)));
  expect(leaks).toEqual([]);
}

test("the forms post, never get", async ({ page }) => {
  for (const path of ["/sign-in", "/sign-up", "/forgot-password"]) {
    await page.goto(path);
    await expect(page.locator("form").first()).toHaveAttribute("method", /post/i);
  }
});

test("signs in without script and lands signed in", async ({ page }) => {
  const urls = recordUrls(page);
  const account = demoAccount("customer");
  await page.goto("/sign-in?next=%2Faccount");
  await page.getByLabel("E-mail").fill(account.email);
  await page.getByLabel("Password").fill(account.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => url.pathname === "/account");
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  // Signed in: the account page renders instead of the sign-in redirect.
  await page.goto("/account");
  await expect(page).toHaveURL(/\/account$/);
  expectNoCredentialsIn(urls);
});

test("a wrong password without script gets the message, in no URL", async ({ page }) => {
  const urls = recordUrls(page);
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(demoAccount("customer").email);
  await page.getByLabel("Password").fill("definitely-not-it");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("form-error")).toHaveText(/don't match an account/);
  expectNoCredentialsIn(urls);
});

test("signs up without script and lands signed in", async ({ page }) => {
  const urls = recordUrls(page);
  const email = `noscript-${Date.now()}@example.org`;
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Ilse Marrowby");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("quiet-alder-lantern-stone");
  await page.getByRole("button", { name: "Create account" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-up"));
  await page.goto("/account");
  await expect(page).toHaveURL(/\/account$/);
  expectNoCredentialsIn(urls);
});

test("asks for a reset without script, and the mail goes out", async ({ page }) => {
  const urls = recordUrls(page);
  const account = demoAccount("customer");
  await page.goto("/forgot-password");
  await page.getByLabel("E-mail").fill(account.email);
  await page.getByRole("button", { name: "Send the link" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Check your inbox" })).toBeVisible();
  expectNoCredentialsIn(urls);
  await expect
    .poll(
      async () => {
        const response = await page.request.get(`${INBOX}/_stand-in/messages`);
        const { data } = (await response.json()) as { data: Array<{ to: string[]; subject: string }> };
        return data.some((m) => m.to.some((to) => to.includes(account.email)) && /new password/i.test(m.subject));
      },
      { timeout: 30_000 },
    )
    .toBe(true);
});
