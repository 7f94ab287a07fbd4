import { expect, type Page } from "@playwright/test";
import { DEMO_USERS } from "../../../lib/demo/seed-data";

export type DemoRole = (typeof DEMO_USERS)[number]["role"];

export function demoAccount(role: DemoRole) {
  const account = DEMO_USERS.find((u) => u.role === role);
  if (!account) throw new Error(`no demo account for ${role}`);
  return account;
}

/** Signs in through the form, as a person would, and waits for the credentials callback. */
export async function signInAs(page: Page, role: DemoRole) {
  const account = demoAccount(role);
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(account.email);
  await page.getByLabel("Password").fill(account.password);
  const callback = page.waitForResponse((r) => r.url().includes("/api/auth/callback/credentials"));
  await page.getByRole("button", { name: "Sign in" }).click();
  expect((await callback).ok()).toBe(true);
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}
