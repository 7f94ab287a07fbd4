/**
 * Starts one more app instance beside the one scripts/start.ts started (which migrated the
 * database, loaded the demo data and runs the stand-ins): waits until the first answers, then runs
 * `next start` on PEER_PORT against the same DATABASE_URL and the same stand-ins.
 */
import { spawn } from "node:child_process";
import path from "node:path";

const first = process.env.FIRST_URL;
const port = process.env.PEER_PORT;
if (!first || !port || !process.env.DATABASE_URL) throw new Error("FIRST_URL, PEER_PORT and DATABASE_URL are required");

const deadline = Date.now() + 170_000;
for (;;) {
  const ok = await fetch(`${first}/api/health`).then((r) => r.ok, () => false);
  if (ok) break;
  if (Date.now() > deadline) throw new Error(`${first} did not answer`);
  await new Promise((r) => setTimeout(r, 500));
}

const appUrl = `http://localhost:${port}`;
const next = spawn(path.join("node_modules", ".bin", "next"), ["start", "-p", port], {
  stdio: "inherit",
  env: { ...process.env, APP_URL: appUrl, NEXTAUTH_URL: appUrl, PORT: port, NEXT_TELEMETRY_DISABLED: "1" },
});
for (const signal of ["SIGINT", "SIGTERM"] as const) process.on(signal, () => next.kill("SIGTERM"));
next.on("exit", (code) => process.exit(code ?? 0));
