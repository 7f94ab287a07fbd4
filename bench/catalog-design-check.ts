// Design check plus fit for every band, over generated house models.
// Run: npx tsx bench/catalog-design-check.ts
import { BAND_IDS } from "@/lib/catalog/climate-bands";
import { checkDesign } from "@/lib/catalog/design-check";
import { houseDrawingSvg } from "@/lib/catalog/drawing";
import { fitForBand } from "@/lib/catalog/fit";
import {
  INTERIOR_FINISHES,
  INTERIOR_SURFACES,
  SHADES,
  WOODS,
  type HouseSpec,
} from "@/lib/catalog/spec";

const MODELS = 10_000;

// Seeded (mulberry32; common practice) so runs generate the same models.
function random(seed: number) {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
const next = random(11);
const between = (lo: number, hi: number) => lo + next() * (hi - lo);
const pick = <T>(values: readonly T[]): T => values[Math.floor(next() * values.length)] as T;
const sixteenths = (n: number) => Math.round(n * 16) / 16;

function generateSpec(): HouseSpec {
  const outerHeightIn = sixteenths(between(18, 40));
  const outerWidthIn = sixteenths(between(12, 30));
  return {
    chamberCount: 1 + Math.floor(next() * 6),
    chamberGapIn: sixteenths(between(0.5, 1.25)),
    chamberHeightIn: sixteenths(Math.min(outerHeightIn, between(16, 30))),
    chamberWidthIn: sixteenths(Math.min(outerWidthIn, between(12, 26))),
    landingAreaIn: sixteenths(between(0, 7)),
    interiorSurface: pick(INTERIOR_SURFACES),
    grooveSpacingIn: next() < 0.9 ? sixteenths(between(0.125, 0.75)) : undefined,
    grooveDepthIn: next() < 0.9 ? pick([1 / 64, 1 / 32, 3 / 64, 1 / 16, 1 / 8]) : undefined,
    interiorFinish: pick(INTERIOR_FINISHES),
    seamsSealed: next() < 0.9,
    wood: pick(WOODS),
    outerHeightIn,
    outerWidthIn,
    openBottom: next() < 0.8,
    exteriorShade: pick(SHADES),
    vented: next() < 0.7,
  };
}

const specs = Array.from({ length: MODELS }, generateSpec);
// Warm the JIT on a slice first so the figure is steady-state work, not compilation.
for (const spec of specs.slice(0, 1_000)) checkDesign(spec);

let publishable = 0;
let notes = 0;
const labels = { good: 0, fair: 0, poor: 0 };
const started = performance.now();
for (const spec of specs) {
  const check = checkDesign(spec);
  if (check.publishable) publishable++;
  notes += check.notes;
  for (const band of BAND_IDS) labels[fitForBand(spec, band).label]++;
}
const total = performance.now() - started;

console.log(
  `design check + fit for 4 bands, ${MODELS} generated models: ${total.toFixed(1)} ms total, ${((total / MODELS) * 1000).toFixed(1)} µs per model`,
);
console.log(
  `publishable ${publishable}, notes ${notes}, fit labels good ${labels.good} / fair ${labels.fair} / poor ${labels.poor}`,
);

// What the catalog does per model for one buyer: the design check and the fit for their band
// (issue target: under 50 ms for 10,000 models). Median of 5 runs.
const oneBandRuns: number[] = [];
for (let run = 0; run < 5; run++) {
  const t0 = performance.now();
  for (const [i, spec] of specs.entries()) {
    checkDesign(spec);
    fitForBand(spec, BAND_IDS[i % BAND_IDS.length]!);
  }
  oneBandRuns.push(performance.now() - t0);
}
oneBandRuns.sort((a, b) => a - b);
console.log(`design check + fit for the buyer's band, ${MODELS} models: median ${oneBandRuns[2]!.toFixed(1)} ms of 5 runs (target < 50 ms)`);

const drawStarted = performance.now();
for (const spec of specs.slice(0, 1_000)) houseDrawingSvg({ name: "Bench model", spec });
console.log(
  `houseDrawingSvg: ${((performance.now() - drawStarted) / 1_000).toFixed(3)} ms per drawing (1,000 drawings)`,
);
