/**
 * Takes screenshots of pages at phone and desktop widths, for looking at the design:
 *   npx tsx scripts/screenshots.ts [--base http://localhost:3000] [--as staff] /houses /climate …
 * Files go to screenshots/ (git-ignored).
 */
import { mkdirSync } from "node:fs";
import { chromium } from "@playwright/test";
import { DEMO_USERS } from "@/lib/demo/seed-data";

const args = process.argv.slice(2);
const option = (name: string) => {
  const i = args.indexOf(name);
  if (i < 0) return undefined;
  const [value] = args.splice(i, 2).slice(1);
  return value;
};
const base = option("--base") ?? "http://localhost:3000";
const role = option("--as");
const paths = args.length > 0 ? args : ["/"];

mkdirSync("screenshots", { recursive: true });
const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
  args: ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"],
});
for (const [label, viewport] of [
  ["phone", { width: 390, height: 844 }],
  ["desktop", { width: 1280, height: 900 }],
] as const) {
  const context = await browser.newContext({ viewport, deviceScaleFactor: 1 });
  const page = await context.newPage();
  if (role) {
    const account = DEMO_USERS.find((u) => u.role === role);
    if (!account) throw new Error(`no demo account with role ${role}`);
    await page.goto(`${base}/sign-in`);
    await page.getByLabel("E-mail").fill(account.email);
    await page.getByLabel("Password").fill(account.password);
    await Promise.all([page.waitForResponse((r) => r.url().includes("/api/auth/callback/credentials")), page.getByRole("button", { name: "Sign in" }).click()]);
    await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
  }
  for (const path of paths) {
    await page.goto(`${base}${path}`, { waitUntil: "networkidle" });
    const name = `${path.replace(/[^a-z0-9]+/gi, "_").replace(/^_|_$/g, "") || "home"}-${label}.png`;
    await page.screenshot({ path: `screenshots/${name}`, fullPage: true });
    console.log(`screenshots/${name}`);
  }
  await context.close();
}
await browser.close();
