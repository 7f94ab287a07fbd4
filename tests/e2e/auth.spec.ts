import { expect, test } from "@playwright/test";
import { ROLE_HOME } from "../../lib/auth/roles";
import { demoAccount, signInAs, type DemoRole } from "./support/accounts";
import { expectAccessible } from "./support/axe";
import { PROTECTED_PAGES, PROTECTED_ROUTES } from "./support/protected";

const ROLES: DemoRole[] = ["customer", "staff", "fulfillment", "admin"];

test("the home page serves and passes the accessibility scan", async ({ page }) => {
  await page.goto("/");
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  await expectAccessible(page);
});

test("sign-in and sign-up pages pass the accessibility scan", async ({ page }) => {
  await page.goto("/sign-in");
  await expectAccessible(page);
  await page.goto("/sign-up");
  await expectAccessible(page);
});

test("signing out from the header ends the session", async ({ page }) => {
  await signInAs(page, "customer");
  await page.goto("/houses");
  await page.getByRole("banner").getByRole("button", { name: "Sign out" }).filter({ visible: true }).first().click();
  await page.waitForURL((url) => url.pathname === "/");
  await expect(page.getByRole("banner").getByRole("link", { name: "Sign in" }).filter({ visible: true }).first()).toBeVisible();
  // The session is gone on the server too: a private page asks to sign in.
  await page.goto("/account");
  await expect(page).toHaveURL(/\/sign-in/);
});

for (const role of ROLES) {
  test(`${role} signs in and lands in their own area`, async ({ page }) => {
    await signInAs(page, role);
    await expect(page).toHaveURL(new RegExp(`${ROLE_HOME[role]}$`));
    await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
    await expectAccessible(page);
  });
}

test("a wrong password gets a clear message and no session", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(demoAccount("customer").email);
  await page.getByLabel("Password").fill("definitely-not-it");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("form-error")).toHaveText(/don't match an account/);
  await page.goto("/account");
  await expect(page).toHaveURL(/\/sign-in\?next=%2Faccount/);
});

test("sign-up refuses a short password and a common one, then creates a supporter account", async ({ page }) => {
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Ezra Pennington");
  await page.getByLabel("E-mail").fill(`ezra-${Date.now()}@example.org`);
  await page.getByLabel("Password").fill("short");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByText("Use at least 8 characters.")).toBeVisible();
  await page.getByLabel("Password").fill("password123");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByText(/commonly used passwords/).first()).toBeVisible();
  await page.getByLabel("Password").fill("moth-lantern-orchard");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page).toHaveURL(/\/account$/);
  await expect(page.getByRole("heading", { name: "Hello, Ezra Pennington" })).toBeVisible();
});

test.describe("every protected page answers each visitor correctly", () => {
  for (const { path } of PROTECTED_PAGES) {
    test(`signed out: ${path} asks to sign in`, async ({ page }) => {
      await page.goto(path);
      await expect(page).toHaveURL(new RegExp(`/sign-in\\?next=${encodeURIComponent(path)}`));
    });
  }
  for (const role of ROLES) {
    test(`as ${role}`, async ({ page }) => {
      await signInAs(page, role);
      for (const { path, allowed, heading } of PROTECTED_PAGES) {
        await page.goto(path);
        if (allowed.includes(role)) {
          await expect(page.getByRole("heading", { level: 1, name: heading }), path).toBeVisible();
        } else {
          await expect(page, path).toHaveURL(/\/forbidden/);
          await expect(page.getByRole("heading", { level: 1 })).toHaveText(/not open to your account/);
        }
      }
    });
  }
});

test.describe("every protected route answers 401 signed out and 403 to the wrong role", () => {
  test("signed out", async ({ request }) => {
    for (const r of PROTECTED_ROUTES) {
      const res = await request.fetch(r.path, { method: r.method, data: r.body });
      expect(res.status(), `${r.method} ${r.path}`).toBe(401);
      expect((await res.json()).error.code).toBe("unauthenticated");
    }
  });
  for (const role of ROLES) {
    test(`as ${role}`, async ({ page }) => {
      await signInAs(page, role);
      for (const r of PROTECTED_ROUTES) {
        const res = await page.request.fetch(r.path, { method: r.method, data: r.body });
        if (r.allowed.includes(role)) expect(res.status(), `${r.method} ${r.path}`).toBeLessThan(400);
        else {
          expect(res.status(), `${r.method} ${r.path}`).toBe(403);
          expect((await res.json()).error.code).toBe("forbidden");
        }
      }
    });
  }
});

test("health reports the database", async ({ request }) => {
  const res = await request.get("/api/health");
  expect(res.status()).toBe(200);
  expect(await res.json()).toMatchObject({ status: "ok", database: { state: "up" } });
});
