// The assembled answer of a placement check (PRODUCT.md §4): the sun on the house by mount and on
// the face that matters, the season's hour-by-hour shape adds up to its mean, the skyline's
// effect in words, the sun's paths for the chart, and the label is the worst rule. Reference figure: the closed form cos h = tan δ / tan φ (7.85 h, south wall, 40° N,
// June solstice, δ = 23.44°).
import { describe, expect, it } from "vitest";
import { bandForJulyHigh } from "@/lib/catalog/climate-bands";
import { resolveClimate } from "@/lib/climate/resolve";
import { buildPlacementAnswer, toSiteClimate } from "@/lib/placement/placement-answer";
import type { PlacementInput } from "@/lib/placement/schema";
import { seasonSunOnHouse } from "@/lib/placement/sun";

const location = { lat: 40, lon: -100, source: "coordinates" as const };
// Through the one climate function, as the site service does (a typed °F value at the site).
const climate = (julyHighF: number) => {
  const outcome = resolveClimate({ input: { ...location, typed: { value: julyHighF, unit: "F" } }, index: null });
  if (!outcome.ok) throw new Error(outcome.message);
  expect(outcome.climate.band).toBe(bandForJulyHigh(julyHighF));
  return toSiteClimate(outcome.climate);
};
const input = (partial: Partial<PlacementInput> = {}): PlacementInput => ({
  skyline: undefined,
  zip: undefined,
  lat: 40,
  lon: -100,
  julyHighF: 88,
  julyHighC: undefined,
  mount: "pole",
  heightFt: 16,
  facingDeg: 180,
  pairedBackToBack: false,
  stacked: false,
  waterMi: 0.2,
  woodsEdgeFt: 30,
  clearFlightPath: true,
  brightLight: false,
  predators: false,
  ...partial,
});

describe("buildPlacementAnswer", () => {
  it("charts the solstice and the season hour by hour, each adding up to its total", () => {
    const answer = buildPlacementAnswer({
      input: input({ mount: "building" }),
      location,
      climate: climate(88),
    });
    const { sun } = answer;
    expect(sun.solsticeDate).toBe("2026-06-21");
    expect(Math.abs(sun.face.solsticeHours - 7.85)).toBeLessThanOrEqual(0.05);
    const total = (values: number[]) => values.reduce((a, b) => a + b, 0);
    expect(total(sun.byHour.solsticeFace)).toBe(Math.round(sun.face.solsticeHours * 60));
    expect(total(sun.byHour.seasonHouse) / 60).toBeCloseTo(sun.house.hours, 9);
    // A south wall's sun is symmetric about solar noon: hour 11 mirrors hour 12, 6 mirrors 17.
    expect(sun.byHour.seasonFace[11]).toBeCloseTo(sun.byHour.seasonFace[12] ?? NaN, 0);
    expect(sun.byHour.seasonFace[6]).toBeCloseTo(sun.byHour.seasonFace[17] ?? NaN, 0);
    // Before 6:00 solar time the sun is north of east at 40° N in summer: behind a south wall.
    expect(sun.byHour.solsticeFace.slice(0, 5)).toEqual([0, 0, 0, 0, 0]);
    expect(sun.face.words).toBe("south");
  });

  it("counts a wall from the front and a pole all round, with the same face figure", () => {
    const wall = buildPlacementAnswer({
      input: input({ mount: "building" }),
      location,
      climate: climate(78),
    });
    const pole = buildPlacementAnswer({ input: input(), location, climate: climate(78) });
    expect(wall.sun.house.hours).toBe(wall.sun.face.hours);
    expect(pole.sun.face.hours).toBe(wall.sun.face.hours);
    // At 40° N from May to August the sun is up about 14 h 20 min a day.
    expect(pole.sun.house.hours).toBeGreaterThan(14);
    expect(pole.sun.house.hours).toBeCloseTo(pole.sun.openPoleHours, 9);
    expect(pole.rules.find((r) => r.id === "P4")?.status).toBe("good");
    expect(wall.rules.find((r) => r.id === "P4")?.status).toBe("fair");
  });

  it("matches the season computed on its own", () => {
    const answer = buildPlacementAnswer({
      input: input({ facingDeg: 135 }),
      location,
      climate: climate(88),
    });
    const season = seasonSunOnHouse({ lat: 40, lon: -100, facingDeg: 135, mount: "pole" });
    expect(answer.sun.house.hours).toBe(season.house.hours);
    expect(answer.sun.face.morningShare).toBe(season.face.morningShare);
    expect(answer.sun.byDate).toEqual(season.byDate);
  });

  it("rates a north-facing back-to-back pair by its south half", () => {
    const answer = buildPlacementAnswer({
      input: input({ facingDeg: 0, pairedBackToBack: true }),
      location,
      climate: climate(88),
    });
    expect(answer.sun.face.deg).toBe(180);
    const single = buildPlacementAnswer({
      input: input({ facingDeg: 0 }),
      location,
      climate: climate(88),
    });
    expect(single.sun.face.deg).toBe(0);
    expect(single.sun.face.hours).toBeLessThan(answer.sun.face.hours);
    // On a pole the whole house is lit whichever way it faces.
    expect(single.sun.house.hours).toBe(answer.sun.house.hours);
    expect(single.rules.find((r) => r.id === "P3")?.status).toBe("poor");
    expect(answer.rules.find((r) => r.id === "P3")?.status).toBe("good");
  });

  it("says an open sky was assumed when no skyline is given, and keeps a given one", () => {
    const open = buildPlacementAnswer({ input: input(), location, climate: climate(88) });
    expect(open.sun.skyline.profile).toBeNull();
    expect(open.sun.skyline.summary).toMatch(
      /open sky was assumed: trees and buildings .* not counted/,
    );
    const skyline = [0, 0, 10, 25, 30, 25, 10, 0, 0, 0, 0, 0, 0, 0, 0, 0];
    const shaded = buildPlacementAnswer({
      input: input({ skyline }),
      location,
      climate: climate(88),
    });
    expect(shaded.sun.skyline.profile).toEqual(skyline);
    expect(shaded.sun.skyline.summary).toMatch(/^The skyline you described takes about/);
    expect(shaded.sun.skyline.parts[0]).toMatch(/to the east take about .* of morning sun a day/);
    expect(shaded.sun.house.hours).toBeLessThan(open.sun.house.hours - 1);
    expect(shaded.sun.house.openSkyHours).toBe(open.sun.house.hours);
  });

  it("traces the sun's path at midsummer and on the season's lowest day", () => {
    const { paths } = buildPlacementAnswer({ input: input(), location, climate: climate(88) }).sun;
    expect(paths.solstice.date).toBe("2026-06-21");
    // Aug 15 (declination about 14°) stands lower than May 1 (about 15°).
    expect(paths.seasonLow.date).toBe("2026-08-15");
    const peak = Math.max(...paths.solstice.points.map((p) => p.altitude));
    // Noon altitude at the June solstice, 40° N: 90° − 40° + 23.44° = 73.4° (plus refraction).
    expect(peak).toBeGreaterThan(73.2);
    expect(peak).toBeLessThan(73.6);
  });

  it("labels the site by its worst rule", () => {
    const good = buildPlacementAnswer({
      input: input({ facingDeg: 160 }),
      location,
      climate: climate(88),
    });
    expect(good.rules.map((r) => r.status)).not.toContain("poor");
    const fair = buildPlacementAnswer({
      input: input({ facingDeg: 160, predators: true }),
      location,
      climate: climate(88),
    });
    expect(fair.label).toBe("fair");
    const poor = buildPlacementAnswer({
      input: input({ facingDeg: 160, predators: true, heightFt: 11.9 }),
      location,
      climate: climate(88),
    });
    expect(poor.label).toBe("poor");
  });

  it("reports the band from the July high and drops the band's prose", () => {
    const answer = buildPlacementAnswer({ input: input(), location, climate: climate(100) });
    expect(answer.band).toEqual({
      id: "very-hot",
      label: "Very hot summers",
      rangeText: "July highs of 100 °F (37.8 °C) and above",
      shades: ["light", "white"],
      ventsNeeded: true,
    });
    expect(answer.location.hemisphere).toBe("north");
  });
});
