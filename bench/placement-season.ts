// Timing of the placement check: one season of sun on the house (8 days × 1,440 minutes, plus
// the solstice day), under an open sky and under a skyline, and a full check (season + the ten
// rules). Budget (issue 13): one season for one site under 5 ms median. Baseline, timed in the
// same run on the same sites: tracing the sun alone for those 9 days (no counting), so the
// ratios say what the counting and the skyline add whatever the machine's speed.
// Run: npx tsx bench/placement-season.ts [runs]
import os from "node:os";
import { checkPlacement, findSunFaceBearing } from "@/lib/placement/rules";
import { summarizeSeasonSun } from "@/lib/placement/placement-answer";
import { buildSkylinePreset } from "@/lib/placement/skyline-presets";
import type { Skyline } from "@/lib/placement/skyline";
import { seasonSunOnHouse } from "@/lib/placement/sun";
import { findSolarNoonMs, findSolsticeDate, listSeasonDates, parseCalendarDate } from "@/lib/placement/sun-calendar";
import { traceSunMinutes } from "@/lib/placement/sun-position";
import type { PlacementSite } from "@/lib/placement/types";

const RUNS = Number(process.argv[2] ?? 400);
const BUDGET_MS = 5;

// Sites spread over latitudes, facings and mounts so no single input gets a lucky path.
const SITES: PlacementSite[] = (
  [
    [40.0, -105.3, 157, "pole"],
    [30.3, -97.7, 135, "building"],
    [47.6, -122.3, 180, "pole"],
    [25.8, -80.2, 90, "building"],
    [-33.9, 151.2, 22, "pole"],
    [61.2, -149.9, 200, "tree"],
  ] as const
).map(([lat, lon, facingDeg, mount]) => ({
  lat,
  lon,
  facingDeg,
  mount,
  heightFt: 16,
  pairedBackToBack: false,
  stacked: false,
  waterMi: 0.2,
  woodsEdgeFt: 30,
  clearFlightPath: true,
  brightLight: false,
  predators: true,
}));

// A mixed skyline: trees to the east, a house to the south-west, a low hill to the north.
const SKYLINE: Skyline = buildSkylinePreset({ id: "tree-line", side: 4 }).map((east, k) =>
  Math.max(east, buildSkylinePreset({ id: "house", side: 10 })[k] ?? 0, k === 0 ? 5 : 0),
);

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? (sorted[mid] ?? NaN) : ((sorted[mid - 1] ?? 0) + (sorted[mid] ?? 0)) / 2;
}

function percentile(values: number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))] ?? NaN;
}

type Case = { name: string; run: (site: PlacementSite) => unknown };

function traceOnly(site: PlacementSite) {
  const dates = [...listSeasonDates({ lat: site.lat }), findSolsticeDate({ lat: site.lat })];
  let sink = 0;
  for (const date of dates) {
    const noon = findSolarNoonMs({ lat: site.lat, lon: site.lon, date: parseCalendarDate(date) });
    sink += traceSunMinutes({ lat: site.lat, lon: site.lon, startMs: noon - 43_200_000 }).east[700] ?? 0;
  }
  return sink;
}

const season = (site: PlacementSite, skyline: Skyline | null) =>
  seasonSunOnHouse({ ...site, facingDeg: findSunFaceBearing(site), skyline });

const CASES: Case[] = [
  { name: "baseline: trace the sun, 9 days", run: traceOnly },
  { name: "season, open sky", run: (site) => season(site, null) },
  { name: "season, under a skyline", run: (site) => season(site, SKYLINE) },
  {
    name: "full check, under a skyline",
    run: (site) => {
      const faceDeg = findSunFaceBearing(site);
      const result = seasonSunOnHouse({ ...site, facingDeg: faceDeg, skyline: SKYLINE });
      const sun = summarizeSeasonSun({ season: result, site, faceDeg, skyline: SKYLINE });
      return checkPlacement(site, { julyHighF: 88, sun });
    },
  },
];

console.log(
  `placement bench: ${RUNS} runs per case, node ${process.version}, load average ${os
    .loadavg()
    .map((l) => l.toFixed(2))
    .join(" ")}`,
);

// The cases take turns run by run, so a burst of load from other work hits them all alike.
const wall = CASES.map(() => [] as number[]);
const cold = CASES.map((c) => {
  const start = performance.now();
  c.run(SITES[0] as PlacementSite);
  return performance.now() - start;
});
for (let i = 0; i < RUNS; i++) {
  const site = SITES[i % SITES.length] as PlacementSite;
  CASES.forEach((c, k) => {
    const start = performance.now();
    c.run(site);
    wall[k]?.push(performance.now() - start);
  });
}

const base = median(wall[0] ?? []);
const f = (n: number) => n.toFixed(3).padStart(7);
CASES.forEach((c, k) => {
  const values = wall[k] ?? [];
  const m = median(values);
  console.log(
    `${c.name.padEnd(34)} median ${f(m)} ms  p95 ${f(percentile(values, 95))} ms  first ${f(cold[k] ?? NaN)} ms  ×${(m / base).toFixed(2)} baseline`,
  );
});
const skylineMedian = median(wall[2] ?? []);
const openMedian = median(wall[1] ?? []);
console.log(
  `skyline / open sky: ×${(skylineMedian / openMedian).toFixed(2)}; budget ${BUDGET_MS} ms median: ${
    Math.max(skylineMedian, openMedian) < BUDGET_MS ? "within" : "OVER"
  }`,
);
