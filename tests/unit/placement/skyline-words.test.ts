// The skyline's effect in plain words (the store's own wording): what was assumed, what the
// skyline takes in all, and where, rounded to "about" figures (nearest 5 min below an hour,
// nearest 10 min from an hour up). Cases built from the minute counts of lib/placement/sun.ts.
import { describe, expect, it } from "vitest";
import {
  describeSkylineEffect,
  findMainLoss,
  formatAboutMinutes,
  OPEN_SKY_ASSUMED,
  type SkylineEffect,
} from "@/lib/placement/skyline-words";
import { seasonSunOnHouse } from "@/lib/placement/sun";

const zeros = () => new Array<number>(16).fill(0);

function effect(lostMorning: number[], lostAfternoon = zeros()): SkylineEffect {
  return { described: true, lostMorning, lostAfternoon, openSkyHours: 15, hours: 13 };
}

describe("formatAboutMinutes", () => {
  it.each([
    [2, "5 min"],
    [7.4, "5 min"],
    [7.5, "10 min"],
    [57.4, "55 min"],
    [60, "1 h"],
    [99, "1 h 40 min"],
    [104.9, "1 h 40 min"],
    [105, "1 h 50 min"],
    [260, "4 h 20 min"],
  ])("%s min → %s", (minutes, words) => {
    expect(formatAboutMinutes(minutes)).toBe(words);
  });
});

describe("describeSkylineEffect", () => {
  it("says plainly when an open sky was assumed", () => {
    expect(describeSkylineEffect(null)).toEqual({ summary: OPEN_SKY_ASSUMED, parts: [] });
    expect(describeSkylineEffect({ ...effect(zeros()), described: false }).summary).toMatch(
      /^An open sky was assumed: trees and buildings .* are not counted/,
    );
  });

  it("trees to the east: one sentence about morning sun", () => {
    const morning = zeros();
    [morning[3], morning[4], morning[5]] = [30, 50, 20];
    const words = describeSkylineEffect(effect(morning));
    expect(words.summary).toBe(
      "The skyline you described takes about 1 h 40 min of sun a day from the house over the season.",
    );
    expect(words.parts).toEqual([
      "The trees or buildings to the east take about 1 h 40 min of morning sun a day.",
    ]);
  });

  it("a building to the south-west takes afternoon sun; two stretches are both named", () => {
    const morning = zeros();
    const afternoon = zeros();
    [afternoon[9], afternoon[10], afternoon[11]] = [5, 20, 10];
    morning[2] = 12;
    const words = describeSkylineEffect(effect(morning, afternoon));
    expect(words.parts).toEqual([
      "The trees or buildings to the southwest take about 35 min of afternoon sun a day.",
      "The trees or buildings to the northeast take about 10 min of morning sun a day.",
    ]);
  });

  it("a stretch wrapping past north is one stretch", () => {
    const morning = zeros();
    [morning[15], morning[0], morning[1]] = [10, 10, 10];
    expect(describeSkylineEffect(effect(morning)).parts).toEqual([
      "The trees or buildings to the north take about 30 min of morning sun a day.",
    ]);
  });

  it("says 'hardly any' under 5 minutes a day", () => {
    const morning = zeros();
    morning[4] = 4.9;
    expect(describeSkylineEffect(effect(morning)).summary).toMatch(/hardly any sun/);
  });

  it("a uniform 20° skyline at 47.6° N: about as much from the morning as the afternoon", () => {
    const season = seasonSunOnHouse({
      lat: 47.6,
      lon: -122.3,
      facingDeg: 160,
      mount: "pole",
      skyline: new Array<number>(16).fill(20),
    });
    const words = describeSkylineEffect({
      described: true,
      lostMorning: season.lostMorning,
      lostAfternoon: season.lostAfternoon,
      openSkyHours: season.openSky.houseHours,
      hours: season.house.hours,
    });
    expect(words.summary).toMatch(/takes about 4 h \d0 min of sun a day/);
    expect(words.parts.some((p) => /to the east .* of morning sun/.test(p))).toBe(true);
    expect(words.parts.some((p) => /to the west .* of afternoon sun/.test(p))).toBe(true);
    expect(findMainLoss(season)).toMatch(/^to the (east and the west|west and the east)$/);
  });

  it("one stretch over more than half the compass reads 'all round'", () => {
    const morning = zeros();
    const afternoon = zeros();
    for (let k = 2; k <= 8; k++) morning[k] = 5;
    for (let k = 8; k <= 14; k++) afternoon[k] = 5;
    const words = describeSkylineEffect(effect(morning, afternoon));
    expect(words.parts[0]).toMatch(
      /^Trees or buildings all round take about 1 h 10 min of sun \(35 min in the morning, 35 min in the afternoon\) a day\.$/,
    );
    expect(findMainLoss({ lostMorning: morning, lostAfternoon: afternoon })).toBe("all round");
  });
});
