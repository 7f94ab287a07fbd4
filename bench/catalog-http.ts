/**
 * The catalog under load, in one run, as ratios to a static route of the same server.
 *
 *   npx next build
 *   APP_URL=http://localhost:3500 PAYMENTS_PORT=3511 MAIL_PORT=3512 UPLOADS_PORT=3513 \
 *     DATA_DIR=var/bench/data npm start -- --no-build      (in another terminal)
 *   npx tsx bench/catalog-http.ts --base http://localhost:3500 [--seconds 7] [--lighthouse]
 *
 * Part 1, throughput (autocannon, 20 connections, loopback): `/icon.svg` (a static file the server
 * answers without rendering) is the baseline; `/houses`, a model page and `GET /api/houses` are printed
 * with their requests per second, p97.5 latency, and the ratio of their requests per second to the
 * baseline's in the same run.
 * Part 2, first-load script per route: every `<script src>` of the page's HTML under `/_next/` (not
 * the `noModule` polyfills, which a current browser skips), fetched
 * and gzip-compressed here (level 9 is close to what a CDN serves), summed; the same figure the build
 * used to print as "First Load JS".
 * Part 3, with `--lighthouse`: Lighthouse (mobile defaults) against Debian's chromium
 * (`CHROME_PATH`, default /usr/bin/chromium), three runs per page, the median printed. Lighthouse is
 * not a dependency of the store: set `LIGHTHOUSE_BIN` to its CLI, or the script uses
 * `node_modules/.bin/lighthouse`, and skips the part (saying so) when neither exists. The version that
 * installs on Node 20: `npm i -E lighthouse@12.2.3` in any scratch folder.
 */
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { gzipSync } from "node:zlib";
import autocannon from "autocannon";

const args = process.argv.slice(2);
const arg = (name: string, fallback: string) => {
  const i = args.indexOf(name);
  return i >= 0 && args[i + 1] ? args[i + 1]! : fallback;
};
const base = arg("--base", "http://localhost:3000");
const seconds = Number(arg("--seconds", "7"));
const withLighthouse = args.includes("--lighthouse");

async function firstModelSlug(): Promise<string> {
  const res = await fetch(`${base}/api/houses`);
  if (!res.ok) throw new Error(`GET /api/houses answered ${res.status}; is the store running at ${base}?`);
  const body = (await res.json()) as { items: { slug: string }[] };
  const slug = arg("--model", body.items[0]?.slug ?? "");
  if (!slug) throw new Error("The catalog is empty: load the demo data first (npm start does it on an empty database).");
  return slug;
}

type Load = { path: string; rps: number; p50: number; p975: number; non2xx: number };

async function load(pathname: string): Promise<Load> {
  // A short warm-up so the first compile of a route or a cold cache is not what is measured.
  await autocannon({ url: `${base}${pathname}`, connections: 4, amount: 40 });
  const result = await autocannon({ url: `${base}${pathname}`, connections: 20, duration: seconds });
  const latency = result.latency as unknown as Record<string, number>;
  return {
    path: pathname,
    rps: result.requests.average,
    p50: latency.p50 ?? 0,
    p975: latency.p97_5 ?? latency.p99 ?? 0,
    non2xx: result.non2xx,
  };
}

async function firstLoadScript(pathname: string): Promise<{ files: number; raw: number; gzip: number }> {
  const html = await (await fetch(`${base}${pathname}`)).text();
  // `noModule` scripts (the framework's polyfills) are never fetched by a browser that runs modules.
  const tags = [...html.matchAll(/<script[^>]+>/g)].map((m) => m[0]).filter((tag) => !/\snoModule/i.test(tag));
  const srcs = [...new Set(tags.map((tag) => /src="([^"]+)"/.exec(tag)?.[1] ?? "").filter((s) => s.startsWith("/_next/")))];
  let raw = 0;
  let gzip = 0;
  for (const src of srcs) {
    const body = Buffer.from(await (await fetch(`${base}${src}`)).arrayBuffer());
    raw += body.length;
    gzip += gzipSync(body, { level: 9 }).length;
  }
  return { files: srcs.length, raw, gzip };
}

function lighthouseBin(): string | null {
  if (process.env.LIGHTHOUSE_BIN) return process.env.LIGHTHOUSE_BIN;
  const local = path.join("node_modules", ".bin", "lighthouse");
  return existsSync(local) ? local : null;
}

type LighthouseRun = { score: number; lcp: number; tbt: number; scriptKb: number };

function lighthouseOnce(bin: string, url: string): LighthouseRun {
  const dir = mkdtempSync(path.join(tmpdir(), "roostwright-lh-"));
  const out = path.join(dir, "report.json");
  const flags = "--headless=new --no-sandbox --disable-gpu --disable-background-networking --disable-component-update --disable-sync --no-first-run";
  const run = spawnSync(bin, [url, "--only-categories=performance", "--output=json", `--output-path=${out}`, "--quiet", `--chrome-flags=${flags}`], {
    env: { ...process.env, CHROME_PATH: process.env.CHROME_PATH ?? "/usr/bin/chromium" },
    encoding: "utf8",
    timeout: 180_000,
  });
  if (run.status !== 0 || !existsSync(out)) throw new Error(`lighthouse failed on ${url}: ${run.stderr?.slice(-400)}`);
  const report = JSON.parse(readFileSync(out, "utf8")) as {
    categories: { performance: { score: number } };
    audits: Record<string, { numericValue?: number; details?: { items?: { resourceType?: string; transferSize?: number }[] } }>;
  };
  rmSync(dir, { recursive: true, force: true });
  const resources = report.audits["network-requests"]?.details?.items ?? [];
  const script = resources.filter((r) => r.resourceType === "Script").reduce((s, r) => s + (r.transferSize ?? 0), 0);
  return {
    score: Math.round(report.categories.performance.score * 100),
    lcp: report.audits["largest-contentful-paint"]?.numericValue ?? NaN,
    tbt: report.audits["total-blocking-time"]?.numericValue ?? NaN,
    scriptKb: script / 1024,
  };
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;

const slug = await firstModelSlug();
const modelPath = `/houses/${slug}`;

console.log(`Throughput: 20 connections, ${seconds} s each, against ${base}`);
console.log("path".padEnd(34), "req/s".padStart(8), "ratio".padStart(7), "p50 ms".padStart(8), "p97.5 ms".padStart(9), "non-2xx".padStart(8));
const baseline = await load("/icon.svg");
const rows = [baseline];
for (const p of ["/houses", modelPath, "/api/houses"]) rows.push(await load(p));
for (const r of rows) {
  console.log(
    r.path.padEnd(34),
    r.rps.toFixed(0).padStart(8),
    (r.rps / baseline.rps).toFixed(2).padStart(7),
    r.p50.toFixed(1).padStart(8),
    r.p975.toFixed(1).padStart(9),
    String(r.non2xx).padStart(8),
  );
}

console.log("\nFirst-load script per route (the page's own <script src> files, gzip -9 here)");
console.log("path".padEnd(34), "files".padStart(6), "raw kB".padStart(8), "gzip kB".padStart(8));
for (const p of ["/", "/houses", modelPath, "/cart"]) {
  const s = await firstLoadScript(p);
  console.log(p.padEnd(34), String(s.files).padStart(6), (s.raw / 1024).toFixed(1).padStart(8), (s.gzip / 1024).toFixed(1).padStart(8));
}

if (withLighthouse) {
  const bin = lighthouseBin();
  if (!bin) {
    console.log("\nLighthouse: skipped (set LIGHTHOUSE_BIN to the lighthouse CLI; npm i -E lighthouse@12.2.3 in a scratch folder)");
  } else {
    console.log("\nLighthouse, mobile defaults, median of 3 runs");
    console.log("path".padEnd(34), "perf".padStart(5), "LCP ms".padStart(8), "TBT ms".padStart(8), "script kB".padStart(10));
    for (const p of ["/", "/houses", modelPath, "/cart"]) {
      const runs = [0, 1, 2].map(() => lighthouseOnce(bin, `${base}${p}`));
      console.log(
        p.padEnd(34),
        String(median(runs.map((r) => r.score))).padStart(5),
        median(runs.map((r) => r.lcp)).toFixed(0).padStart(8),
        median(runs.map((r) => r.tbt)).toFixed(0).padStart(8),
        median(runs.map((r) => r.scriptKb)).toFixed(1).padStart(10),
      );
    }
  }
}
