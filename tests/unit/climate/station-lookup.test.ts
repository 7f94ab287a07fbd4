import * as Astronomy from "astronomy-engine";
import { describe, expect, it } from "vitest";
import { distanceMiles, EARTH_RADIUS_MI } from "@/lib/climate/geo-distance";
import type { ClimateStation } from "@/lib/climate/noaa";
import { resolveClimate } from "@/lib/climate/resolve";
import { createStationIndex, lookupWarmestMonthHigh, type StationIndex } from "@/lib/climate/station-index";
import { readClimateTable } from "@/lib/climate/table-file";
import { zipToCentre } from "@/lib/climate/zip-centre";

// Over the committed table (data/climate/), which ships with the store.
const stations = readClimateTable();
const index = createStationIndex(stations);
const lookupJulyHigh = (i: StationIndex, p: { lat: number; lon: number }) => {
  const e = lookupWarmestMonthHigh(i, p);
  return { ...e, julyHighF: e.valueF };
};
const climateForZip = (i: StationIndex, zip: string) => {
  const outcome = resolveClimate({ input: { zip }, index: i });
  return outcome.ok ? { ok: true as const, ...outcome.climate, julyHighF: outcome.climate.valueF } : outcome;
};

// A small seeded generator (mulberry32; common practice) so failures reproduce.
function random(seed: number) {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe("distanceMiles (haversine, R = 3958.8 mi)", () => {
  it("reproduces the LAX–JFK worked example of Ed Williams' Aviation Formulary: 0.623585 rad, 2144 nm", () => {
    const lax = { lat: 33 + 57 / 60, lon: -(118 + 24 / 60) };
    const jfk = { lat: 40 + 38 / 60, lon: -(73 + 47 / 60) };
    const miles = distanceMiles({ from: lax, to: jfk });
    const radians = miles / EARTH_RADIUS_MI;
    expect(radians).toBeCloseTo(0.623585, 6);
    // On the formulary's sphere 1 nautical mile is 1 arcminute of great circle.
    expect(Math.round((radians * 180 * 60) / Math.PI)).toBe(2144);
    expect(miles).toBeCloseTo(2468.6, 1);
  });

  it("agrees with astronomy-engine's AngleBetween on random pairs", () => {
    const next = random(7);
    for (let i = 0; i < 500; i++) {
      const a = { lat: next() * 180 - 90, lon: next() * 360 - 180 };
      const b = { lat: next() * 180 - 90, lon: next() * 360 - 180 };
      const time = new Date("2020-01-01T00:00:00Z");
      const va = Astronomy.VectorFromSphere(new Astronomy.Spherical(a.lat, a.lon, 1), time);
      const vb = Astronomy.VectorFromSphere(new Astronomy.Spherical(b.lat, b.lon, 1), time);
      const degrees = Astronomy.AngleBetween(va, vb);
      expect(distanceMiles({ from: a, to: b }) / EARTH_RADIUS_MI).toBeCloseTo(
        (degrees * Math.PI) / 180,
        7,
      );
    }
  });
});

/** The plain answer: every station's distance, keeping the three smallest. */
function bruteForce(point: { lat: number; lon: number }): string[] {
  const best: { id: string; d: number }[] = [];
  for (const s of stations) {
    const d = distanceMiles({ from: point, to: s });
    if (best.length === 3 && d >= (best[2]?.d ?? Infinity)) continue;
    best.push({ id: s.id, d });
    best.sort((x, y) => x.d - y.d);
    if (best.length > 3) best.pop();
  }
  return best.map((x) => x.id);
}

describe("lookupJulyHigh over the grid index", () => {
  it("finds the same three stations as sorting all of them, everywhere", () => {
    const next = random(42);
    const points = [
      ...Array.from({ length: 600 }, () => ({ lat: 24 + next() * 26, lon: -125 + next() * 58 })), // lower 48
      ...Array.from({ length: 150 }, () => ({ lat: 51 + next() * 20, lon: -180 + next() * 50 })), // Alaska, Aleutians
      ...Array.from({ length: 60 }, () => ({ lat: next() * 180 - 90, lon: next() * 360 - 180 })), // anywhere
      { lat: 52, lon: 179.99 },
      { lat: 52, lon: -179.99 },
      { lat: 89.9, lon: 0 },
      { lat: -89.9, lon: 0 },
      { lat: 13.48, lon: 144.8 }, // Guam
    ];
    for (const point of points) {
      expect(
        lookupJulyHigh(index, point).stations.map((s) => s.id),
        JSON.stringify(point),
      ).toEqual(bruteForce(point));
    }
  });

  it("weights by 1/distance²: stations 1, 2 and 4 mi away at 80, 90 and 100 °F give 82.9 °F", () => {
    const milesToDegrees = (miles: number) => (miles / EARTH_RADIUS_MI) * (180 / Math.PI);
    const at = (id: string, miles: number, julyHighF: number): ClimateStation => ({
      id,
      name: id,
      state: "NE",
      lat: 41 + milesToDegrees(miles),
      lon: -100,
      janHighF: 30,
      janFlag: "C",
      julyHighF,
      julyFlag: "C",
    });
    const small = createStationIndex([
      at("A", 1, 80),
      at("B", 2, 90),
      at("C", 4, 100),
      at("D", 9, 60),
    ]);
    const estimate = lookupJulyHigh(small, { lat: 41, lon: -100 });
    // (80·1 + 90·1/4 + 100·1/16) / (1 + 1/4 + 1/16) = 108.75 / 1.3125 = 82.857…, unrounded.
    expect(estimate.julyHighF).toBeCloseTo(108.75 / 1.3125, 9);
    expect(estimate.stations.map((s) => [s.id, Math.round(s.distanceMi * 1e6) / 1e6])).toEqual([
      ["A", 1],
      ["B", 2],
      ["C", 4],
    ]);
  });

  it("lets a station at the point win outright", () => {
    const estimate = lookupJulyHigh(index, { lat: 33.4278, lon: -112.0039 });
    expect(estimate.julyHighF).toBe(106.1);
    expect(estimate.stations[0]).toMatchObject({ id: "USW00023183" });
    expect(estimate.stations[0]?.distanceMi).toBeLessThan(0.01);
  });

  it("refuses a point that is not on Earth and an empty index", () => {
    expect(() => lookupJulyHigh(index, { lat: 91, lon: 0 })).toThrow(RangeError);
    expect(() => lookupJulyHigh(index, { lat: 0, lon: Number.NaN })).toThrow(RangeError);
    expect(() => lookupJulyHigh(createStationIndex([]), { lat: 0, lon: 0 })).toThrow(RangeError);
  });
});

describe("zipToCentre", () => {
  it("finds Census ZIP-area centres", () => {
    // 85004 is downtown Phoenix, 98101 downtown Seattle.
    expect(zipToCentre("85004")).toMatchObject({ ok: true, zip: "85004" });
    const seattle = zipToCentre(" 98101 ");
    expect(
      seattle.ok && distanceMiles({ from: seattle, to: { lat: 47.6062, lon: -122.3321 } }),
    ).toBeLessThan(2);
    expect(zipToCentre("85004-1234")).toMatchObject({ ok: true, zip: "85004" });
  });

  it.each(["", "8500", "850041", "85 004", "abcde", "85004-12"])("calls %j malformed", (zip) => {
    expect(zipToCentre(zip)).toMatchObject({
      ok: false,
      code: "malformed",
      message: "Enter a 5-digit ZIP code, like 97201.",
    });
  });

  it("calls a well-formed ZIP with no centre unknown, with a different message", () => {
    const result = zipToCentre("00000");
    expect(result).toMatchObject({ ok: false, code: "unknown" });
    expect(!result.ok && result.message).toMatch(/no map centre for ZIP 00000/);
  });
});

describe("climateForZip: cities whose summers are well known", () => {
  // NOAA's 1981–2010 normals put July highs near 106 °F at Phoenix, 76 °F at Seattle and 89 °F
  // at Atlanta (see SOURCE.md for Phoenix and Seattle; Atlanta Hartsfield reads 89.1 in the file).
  it.each([
    ["85004", "very-hot", 104, 108, "PHOENIX"],
    ["98101", "cool", 74, 78, "SEATTLE"],
    ["30303", "warm", 87, 91, "ATLANTA"],
    ["33126", "warm", 89, 92, "MIAMI"],
    ["77032", "warm", 92, 95, "HOUSTON"],
  ] as const)("%s is %s", (zip, band, low, high, place) => {
    const climate = climateForZip(index, zip);
    if (!climate.ok) throw new Error(climate.message);
    expect(climate.band.id).toBe(band);
    expect(climate.julyHighF).toBeGreaterThanOrEqual(low);
    expect(climate.julyHighF).toBeLessThanOrEqual(high);
    expect(climate.stations).toHaveLength(3);
    expect(climate.stations[0]?.name).toContain(place);
    expect(climate.stations.every((s) => s.distanceMi < 15)).toBe(true);
  });

  it("notes a reading within 1 °F of an edge (Columbus, Ohio, near 85 °F)", () => {
    const climate = climateForZip(index, "43219");
    expect(climate.ok && climate.nearEdge?.edgeF).toBe(85);
    expect(climateForZip(index, "85004").ok && climateForZip(index, "85004")).toMatchObject({
      nearEdge: null,
    });
  });

  it("passes malformed and unknown ZIPs through", () => {
    expect(climateForZip(index, "9810")).toMatchObject({ ok: false, code: "malformed" });
    expect(climateForZip(index, "00000")).toMatchObject({ ok: false, code: "unknown" });
  });
});
