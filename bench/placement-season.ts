// Timing of the placement check: one season of sun hours (8 days × 1,440 minutes, plus the
// solstice day) and a full check (season sun + the ten rules). Budget: a season under 20 ms.
// Run: npx tsx bench/placement-season.ts [runs]
import os from "node:os";
import { findSunFaceBearing, checkPlacement } from "@/lib/placement/rules";
import { seasonSunHours } from "@/lib/placement/sun";
import type { PlacementSite } from "@/lib/placement/types";

const RUNS = Number(process.argv[2] ?? 300);
const BUDGET_MS = 20;

// Sites spread over latitudes and facings so no single input gets a lucky cache path.
const SITES: PlacementSite[] = [
  [40.0, -105.3, 157],
  [30.3, -97.7, 135],
  [47.6, -122.3, 180],
  [25.8, -80.2, 90],
  [-33.9, 151.2, 22],
  [61.2, -149.9, 200],
].map(([lat, lon, facingDeg]) => ({
  lat: lat ?? 0,
  lon: lon ?? 0,
  facingDeg: facingDeg ?? 180,
  mount: "pole",
  heightFt: 16,
  pairedBackToBack: false,
  stacked: false,
  waterMi: 0.2,
  woodsEdgeFt: 30,
  clearFlightPath: true,
  brightLight: false,
  predators: true,
}));

function percentile(sorted: number[], p: number): number {
  const index = Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1);
  return sorted[Math.max(0, index)] ?? Number.NaN;
}

/** Wall-clock and CPU milliseconds; CPU time shows the work itself when other jobs share the cores. */
function timeOnce(run: () => unknown): { wall: number; cpu: number } {
  const cpuStart = process.cpuUsage();
  const start = performance.now();
  run();
  const wall = performance.now() - start;
  const cpu = process.cpuUsage(cpuStart);
  return { wall, cpu: (cpu.user + cpu.system) / 1000 };
}

function summarize(values: number[]): string {
  const sorted = [...values].sort((a, b) => a - b);
  const f = (n: number) => n.toFixed(2).padStart(6);
  return `p50 ${f(percentile(sorted, 50))}  p95 ${f(percentile(sorted, 95))}  max ${f(sorted.at(-1) ?? 0)}`;
}

function measure(name: string, run: (site: PlacementSite) => unknown) {
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const site = SITES[i % SITES.length] as PlacementSite;
    const t = timeOnce(() => run(site));
    wall.push(t.wall);
    cpu.push(t.cpu);
  }
  const p95 = percentile(
    [...wall].sort((a, b) => a - b),
    95,
  );
  console.log(`${name} (first call, cold: ${wall[0]?.toFixed(2)} ms wall)`);
  console.log(`  wall ms  ${summarize(wall)}`);
  console.log(`  cpu ms   ${summarize(cpu)}`);
  console.log(`  budget   ${p95 < BUDGET_MS ? "within" : "OVER"} ${BUDGET_MS} ms at p95 (wall)`);
}

console.log(
  `placement bench: ${RUNS} runs each, node ${process.version}, load average ${os
    .loadavg()
    .map((l) => l.toFixed(2))
    .join(" ")}`,
);
measure("season sun hours (8 days + solstice)", (site) =>
  seasonSunHours({ lat: site.lat, lon: site.lon, facingDeg: site.facingDeg }),
);
measure("full placement check", (site) => {
  const sun = seasonSunHours({
    lat: site.lat,
    lon: site.lon,
    facingDeg: findSunFaceBearing(site),
  });
  return checkPlacement(site, { julyHighF: 88, sun });
});
