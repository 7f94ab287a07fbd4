/**
 * The catalog under load: 20 connections on loopback against a running store (autocannon), for
 * `GET /api/houses`, the `/houses` page and, as the baseline, the same server's `/api/health`.
 *   npm run build && npm start   (in another terminal)
 *   npx tsx bench/catalog-http.ts [--base http://localhost:3000] [--seconds 10]
 */
import autocannon from "autocannon";

const args = process.argv.slice(2);
const arg = (name: string, fallback: string) => {
  const i = args.indexOf(name);
  return i >= 0 && args[i + 1] ? args[i + 1]! : fallback;
};
const base = arg("--base", "http://localhost:3000");
const seconds = Number(arg("--seconds", "10"));

const targets = ["/api/health", "/api/houses", "/api/houses?band=hot&inStock=true", "/houses"];
console.log(`20 connections, ${seconds} s each, against ${base}`);
console.log("path".padEnd(36), "p50 ms".padStart(8), "p95 ms".padStart(8), "req/s".padStart(9), "non-2xx".padStart(8));
for (const path of targets) {
  const result = await autocannon({ url: `${base}${path}`, connections: 20, duration: seconds });
  const p95 = (result.latency as unknown as Record<string, number>).p97_5 ?? result.latency.p99;
  console.log(
    path.padEnd(36),
    result.latency.p50.toFixed(1).padStart(8),
    `${p95.toFixed(1)}`.padStart(8),
    result.requests.average.toFixed(0).padStart(9),
    String(result.non2xx).padStart(8),
  );
}
console.log("(autocannon reports p97.5 rather than p95; it is shown in the p95 column as the nearer, stricter figure)");
