import { defineConfig } from "@playwright/test";

// Three instances of the production build on one PostgreSQL server (DATABASE_URL, required):
// "first" (scripts/start.ts: migrations, demo data, stand-ins) takes the staff change; "peer" must
// show it within 2 s; "unshared" runs with CACHE_TAG_SYNC=off, the control that shows the peer saw
// the change through the shared invalidations and not by its cache running out. Run by .ci/run.
const database = process.env.DATABASE_URL ?? "";
if (!/^postgres(ql)?:\/\//.test(database)) throw new Error("tests/multi-instance needs DATABASE_URL set to a PostgreSQL server");

const FIRST = 3410;
export const URLS = { first: `http://localhost:${FIRST}`, peer: "http://localhost:3411", unshared: "http://localhost:3412" };
const common = {
  ROOSTWRIGHT_MODE: "local",
  NEXT_TELEMETRY_DISABLED: "1",
  DATABASE_URL: database,
  DATA_DIR: "var/multi/data",
  PAYMENTS_PORT: "14311",
  MAIL_PORT: "14312",
  UPLOADS_PORT: "14313",
};
const peer = (port: number, extra: Record<string, string> = {}) => ({
  command: "npx tsx tests/multi-instance/start-peer.ts",
  cwd: "../..",
  url: `http://localhost:${port}/api/health`,
  timeout: 240_000,
  reuseExistingServer: false,
  env: { ...common, ...extra, FIRST_URL: URLS.first, PEER_PORT: String(port), APP_URL: `http://localhost:${port}` },
  stdout: "pipe" as const,
  stderr: "pipe" as const,
});

export default defineConfig({
  testDir: ".",
  timeout: 120_000,
  expect: { timeout: 10_000 },
  workers: 1,
  retries: 0,
  reporter: [["list"]],
  use: {
    baseURL: URLS.first,
    launchOptions: { executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: ["--no-sandbox", "--disable-gpu"] },
  },
  webServer: [
    {
      command: "rm -rf var/multi && npx tsx scripts/start.ts --no-build",
      cwd: "../..",
      url: `${URLS.first}/api/health`,
      timeout: 240_000,
      reuseExistingServer: false,
      env: { ...common, APP_URL: URLS.first },
      stdout: "pipe",
      stderr: "pipe",
    },
    peer(3411),
    peer(3412, { CACHE_TAG_SYNC: "off" }),
  ],
});
