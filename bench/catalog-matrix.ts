/**
 * The catalog benchmark on both databases, in one command:
 *
 *   npx next build
 *   npx tsx bench/catalog-matrix.ts [--seconds 7] [--lighthouse]
 *
 * Starts the production build twice, one after the other, each with its own data and stand-in
 * ports: first on the embedded database (a fresh data directory under var/bench/), then on a
 * throwaway PostgreSQL server (initdb in a temporary directory, port 55434; skipped, saying so,
 * when the PostgreSQL binaries are not installed). Each start loads the demo data. Against each,
 * bench/catalog-http.ts prints requests per second as a ratio to the static route of the same
 * server, p97.5 latencies and the first-load script; `--lighthouse` adds Lighthouse (mobile
 * defaults, median of 3) on the embedded run. Run as root, the PostgreSQL server runs as the
 * `postgres` user (as .ci/run does).
 */
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { existsSync, mkdtempSync, readdirSync, rmSync, chownSync } from "node:fs";
import { tmpdir, userInfo } from "node:os";
import path from "node:path";

const args = process.argv.slice(2);
const passThrough = args.filter((a) => a !== "--lighthouse");
const withLighthouse = args.includes("--lighthouse");

if (!existsSync(path.join(".next", "BUILD_ID"))) {
  console.error("No production build: run `npx next build` first.");
  process.exit(1);
}

async function waitFor(url: string, limitMs: number) {
  const deadline = Date.now() + limitMs;
  while (Date.now() < deadline) {
    if (await fetch(url).then((r) => r.ok, () => false)) return;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`${url} did not answer within ${limitMs / 1000} s`);
}

function startStore(port: number, extra: Record<string, string>): ChildProcess {
  const standIns = port + 11;
  const dataDir = `var/bench/${port}/data`;
  rmSync(`var/bench/${port}`, { recursive: true, force: true });
  return spawn(path.join("node_modules", ".bin", "tsx"), ["scripts/start.ts", "--no-build"], {
    stdio: ["ignore", "ignore", "inherit"],
    env: {
      ...process.env,
      ROOSTWRIGHT_MODE: "local",
      NEXT_TELEMETRY_DISABLED: "1",
      APP_URL: `http://localhost:${port}`,
      DATA_DIR: dataDir,
      PAYMENTS_PORT: String(standIns),
      MAIL_PORT: String(standIns + 1),
      UPLOADS_PORT: String(standIns + 2),
      ...extra,
    },
    detached: true,
  });
}

async function stopStore(child: ChildProcess) {
  if (child.exitCode !== null) return;
  const exited = new Promise((r) => child.once("exit", r));
  process.kill(-child.pid!, "SIGTERM");
  await Promise.race([exited, new Promise((r) => setTimeout(r, 15_000))]);
}

function measure(base: string, label: string, lighthouse: boolean) {
  console.log(`\n##### ${label}`);
  const run = spawnSync(path.join("node_modules", ".bin", "tsx"), ["bench/catalog-http.ts", "--base", base, ...passThrough, ...(lighthouse ? ["--lighthouse"] : [])], {
    stdio: "inherit",
  });
  if (run.status !== 0) throw new Error(`bench/catalog-http.ts failed against ${label}`);
}

async function onEmbedded() {
  const port = 3700;
  const store = startStore(port, {});
  try {
    await waitFor(`http://localhost:${port}/api/health`, 240_000);
    measure(`http://localhost:${port}`, "embedded database (PGlite)", withLighthouse);
  } finally {
    await stopStore(store);
  }
}

function postgresBin(): string | null {
  const root = "/usr/lib/postgresql";
  if (!existsSync(root)) return null;
  const versions = readdirSync(root).sort((a, b) => Number(a) - Number(b));
  const bin = versions.length ? path.join(root, versions.at(-1)!, "bin") : null;
  return bin && existsSync(path.join(bin, "initdb")) ? bin : null;
}

async function onPostgres() {
  const bin = postgresBin();
  if (!bin) {
    console.log("\n##### PostgreSQL server: skipped (no PostgreSQL binaries under /usr/lib/postgresql)");
    return;
  }
  const pgPort = 55434;
  const dataDir = mkdtempSync(path.join(tmpdir(), "roostwright-bench-pg-"));
  const asPostgres = userInfo().uid === 0 ? ["runuser", "-u", "postgres", "--"] : [];
  if (asPostgres.length) chownSync(dataDir, Number(spawnSync("id", ["-u", "postgres"]).stdout.toString().trim()), 0);
  const run = (cmd: string, cmdArgs: string[]) => {
    const [exe, ...rest] = [...asPostgres, path.join(bin, cmd), ...cmdArgs];
    const result = spawnSync(exe!, rest, { stdio: ["ignore", "ignore", "inherit"] });
    if (result.status !== 0) throw new Error(`${cmd} failed`);
  };
  run("initdb", ["-D", dataDir, "-A", "trust", "-U", "postgres"]);
  run("pg_ctl", ["-D", dataDir, "-l", path.join(dataDir, "server.log"), "-w", "-o", `-p ${pgPort} -k /tmp -c listen_addresses=127.0.0.1 -c fsync=off`, "start"]);
  const port = 3720;
  let store: ChildProcess | null = null;
  try {
    run("createdb", ["-h", "127.0.0.1", "-p", String(pgPort), "roostwright_bench"]);
    store = startStore(port, { DATABASE_URL: `postgres://postgres@127.0.0.1:${pgPort}/roostwright_bench` });
    await waitFor(`http://localhost:${port}/api/health`, 240_000);
    measure(`http://localhost:${port}`, "PostgreSQL server", false);
  } finally {
    if (store) await stopStore(store);
    run("pg_ctl", ["-D", dataDir, "-m", "fast", "stop"]);
    rmSync(dataDir, { recursive: true, force: true });
  }
}

await onEmbedded();
await onPostgres();
