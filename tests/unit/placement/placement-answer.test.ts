// The assembled answer of a placement check (PRODUCT.md §4): the sun is computed for the face
// that matters, the season's hour-by-hour shape adds up to its mean, and the label is the worst
// rule. Reference figure: the closed form cos h = tan δ / tan φ (7.85 h, south wall, 40° N,
// June solstice, δ = 23.44°).
import { describe, expect, it } from "vitest";
import { bandForJulyHigh } from "@/lib/catalog/climate-bands";
import { buildPlacementAnswer } from "@/lib/placement/placement-answer";
import type { PlacementInput } from "@/lib/placement/schema";
import { seasonSunHours } from "@/lib/placement/sun";

const location = { lat: 40, lon: -100, source: "coordinates" as const };
const climate = (julyHighF: number) => ({
  julyHighF,
  julyHighC: 0,
  source: "typed" as const,
  nearEdgeNote: null,
  band: bandForJulyHigh(julyHighF),
});
const input = (partial: Partial<PlacementInput> = {}): PlacementInput => ({
  zip: undefined,
  lat: 40,
  lon: -100,
  julyHighF: 88,
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
    const answer = buildPlacementAnswer({ input: input(), location, climate: climate(88) });
    const { sun } = answer;
    expect(sun.solstice.date).toBe("2026-06-21");
    expect(Math.abs(sun.solsticeHours - 7.85)).toBeLessThanOrEqual(0.05);
    expect(sun.solstice.byHour.reduce((a, b) => a + b, 0)).toBe(Math.round(sun.solsticeHours * 60));
    expect(sun.seasonByHour.reduce((a, b) => a + b, 0) / 60).toBeCloseTo(sun.seasonMeanHours, 9);
    // A south wall's sun is symmetric about solar noon: hour 11 mirrors hour 12, 6 mirrors 17.
    expect(sun.seasonByHour[11]).toBeCloseTo(sun.seasonByHour[12] ?? NaN, 0);
    expect(sun.seasonByHour[6]).toBeCloseTo(sun.seasonByHour[17] ?? NaN, 0);
    // Before 6:00 solar time the sun is north of east at 40° N in summer: behind a south wall.
    expect(sun.solstice.byHour.slice(0, 5)).toEqual([0, 0, 0, 0, 0]);
    expect(sun.faceWords).toBe("south");
  });

  it("matches the season computed on its own", () => {
    const answer = buildPlacementAnswer({
      input: input({ facingDeg: 135 }),
      location,
      climate: climate(88),
    });
    const season = seasonSunHours({ lat: 40, lon: -100, facingDeg: 135 });
    expect(answer.sun.seasonMeanHours).toBe(season.hours);
    expect(answer.sun.morningShare).toBe(season.morningShare);
    expect(answer.sun.byDate).toEqual(season.byDate);
  });

  it("rates a north-facing back-to-back pair by its south half", () => {
    const answer = buildPlacementAnswer({
      input: input({ facingDeg: 0, pairedBackToBack: true }),
      location,
      climate: climate(88),
    });
    expect(answer.sun.faceDeg).toBe(180);
    const single = buildPlacementAnswer({
      input: input({ facingDeg: 0 }),
      location,
      climate: climate(88),
    });
    expect(single.sun.faceDeg).toBe(0);
    expect(single.sun.seasonMeanHours).toBeLessThan(answer.sun.seasonMeanHours);
    expect(single.rules.find((r) => r.id === "P3")?.status).toBe("poor");
    expect(answer.rules.find((r) => r.id === "P3")?.status).toBe("good");
  });

  it("labels the site by its worst rule and says trees and buildings are not modelled", () => {
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
    expect(poor.notModelled).toMatch(/trees, buildings and hills .* not modelled/);
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
