import { defineConfig, devices } from "@playwright/test";

// The e2e suite runs against a production build (`next start`) with its own data directory and
// its own stand-in ports, in Debian's chromium (never a downloaded browser). E2E_PORT moves the
// app and its stand-ins together, so two checkouts can run their suites side by side.
const PORT = Number(process.env.E2E_PORT ?? 3100);
// 3100 → 12211–12213, 3200 → 13211–13213, …: clear of the integration suite's 12311/12312.
const STAND_IN_BASE = 12211 + (PORT - 3100) * 10;
export const E2E_ENV = {
  APP_URL: `http://localhost:${PORT}`,
  DATA_DIR: "var/e2e/data",
  PAYMENTS_PORT: String(STAND_IN_BASE),
  MAIL_PORT: String(STAND_IN_BASE + 1),
  UPLOADS_PORT: String(STAND_IN_BASE + 2),
};

export default defineConfig({
  testDir: "tests/e2e",
  timeout: 60_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  workers: 1,
  retries: process.env.CI ? 1 : 0,
  reporter: process.env.CI ? [["list"]] : [["list"]],
  use: {
    baseURL: E2E_ENV.APP_URL,
    trace: "retain-on-failure",
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
      args: [
        "--no-sandbox",
        "--disable-gpu",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
        "--no-first-run",
      ],
    },
  },
  projects: [{ name: "chromium", use: { ...devices["Desktop Chrome"], channel: undefined } }],
  webServer: {
    command: "rm -rf var/e2e && npx tsx scripts/start.ts --no-build",
    url: `${E2E_ENV.APP_URL}/api/health`,
    timeout: 180_000,
    reuseExistingServer: false,
    env: { ...E2E_ENV, ROOSTWRIGHT_MODE: "local", NEXT_TELEMETRY_DISABLED: "1" },
    stdout: "pipe",
    stderr: "pipe",
  },
});
