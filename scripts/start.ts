/**
 * One command for the whole store: migrates the database, loads the demo data when it is empty,
 * loads the committed climate table when the database lacks it, starts the local stand-ins for payments,
 * mail and uploads, and then runs Next.js (dev with --dev, else a production build and `next start`).
 */
import { spawn, spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import path from "node:path";
import { env } from "@/lib/config/env";
import { startMailStandIn } from "@/stand-ins/mail/server";
import { startPaymentsStandIn } from "@/stand-ins/payments/server";
import { startUploadsStandIn } from "@/stand-ins/uploads/server";

const args = new Set(process.argv.slice(2));
const dev = args.has("--dev");
const settings = env();
const port = new URL(settings.APP_URL).port || "3000";

// Migrate, seed and import in a child process: the data modules are server-only, so they load only
// under the react-server condition, and the child's exit releases the embedded database before
// the Next.js server opens it.
function prepareDatabase() {
  const tsx = path.join("node_modules", ".bin", "tsx");
  const prepared = spawnSync(tsx, ["--conditions=react-server", path.join("scripts", "prepare-data.ts")], { stdio: "inherit" });
  if (prepared.status !== 0) process.exit(prepared.status ?? 1);
}

async function startStandIns() {
  if (!settings.useStandIns) return [];
  const payments = await startPaymentsStandIn({
    port: settings.PAYMENTS_PORT,
    webhookUrl: `${settings.APP_URL}/api/webhooks/stripe`,
    webhookSecret: settings.STRIPE_WEBHOOK_SECRET,
    secretKey: settings.STRIPE_SECRET_KEY,
    publishableKey: settings.STRIPE_PUBLISHABLE_KEY,
  });
  // The inbox lives beside the data directory, so a fresh data directory (the e2e run) starts with an empty inbox.
  const mail = await startMailStandIn({ port: settings.MAIL_PORT, dataFile: path.join(path.dirname(settings.DATA_DIR), "mail-stand-in.json") });
  const uploads = await startUploadsStandIn({
    port: settings.UPLOADS_PORT,
    directory: path.join(path.dirname(settings.DATA_DIR), "uploads"),
    bucket: settings.S3_BUCKET,
  });
  console.log(`• Payments stand-in  ${payments.url}`);
  console.log(`• Mail stand-in      ${mail.url}   (inbox)`);
  console.log(`• Uploads stand-in   ${uploads.url}`);
  return [payments, mail, uploads];
}

prepareDatabase();
const standIns = await startStandIns();

const nextBin = path.join("node_modules", ".bin", "next");
const childEnv = { ...process.env, NEXT_TELEMETRY_DISABLED: "1", NEXT_MANUAL_SIG_HANDLE: "1", PORT: port, NEXTAUTH_URL: process.env.NEXTAUTH_URL ?? settings.APP_URL };
if (!dev && !args.has("--no-build") && !existsSync(path.join(".next", "BUILD_ID"))) {
  console.log("• Building the store (first start only)…");
  const build = spawnSync(nextBin, ["build"], { stdio: "inherit", env: { ...childEnv, NODE_ENV: "production" } });
  if (build.status !== 0) process.exit(build.status ?? 1);
}
console.log(`• Store              ${settings.APP_URL}`);
const next = spawn(nextBin, [dev ? "dev" : "start", "-p", port], { stdio: "inherit", env: childEnv });

let stopping = false;
async function stop(code: number) {
  if (stopping) return;
  stopping = true;
  await Promise.allSettled(standIns.map((s) => s.close()));
  process.exit(code);
}
for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.on(signal, () => {
    next.kill("SIGTERM");
  });
}
next.on("exit", (code) => void stop(code ?? 0));
