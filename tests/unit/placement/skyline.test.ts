// The skyline profile (PRODUCT.md §4): 16 directions, north first and clockwise, 22.5° apart
// (the standard 16-point compass rose); linear between directions, wrapping at north; every
// angle a finite number from 0 to 90. Presets are rough tangent figures (common practice).
import { describe, expect, it } from "vitest";
import {
  findSkylineProblem,
  formatSkylineQuery,
  isOpenSky,
  nearestSkylineIndex,
  OPEN_SKY,
  parseSkylineQuery,
  skylineDirectionAbbreviation,
  skylineDirectionName,
  skylineElevationAt,
} from "@/lib/placement/skyline";
import { buildSkylinePreset, SKYLINE_PRESETS } from "@/lib/placement/skyline-presets";
import { readSightLine, toSkylineAngle } from "@/lib/placement/skyline-sensor";

const ramp = Array.from({ length: 16 }, (_, k) => k * 2); // N 0°, NNE 2°, … NNW 30°

describe("skylineElevationAt", () => {
  it("gives each direction's own angle at its bearing", () => {
    expect(skylineElevationAt(ramp, 0)).toBe(0);
    expect(skylineElevationAt(ramp, 90)).toBe(8);
    expect(skylineElevationAt(ramp, 337.5)).toBe(30);
  });

  it("is linear between neighbours", () => {
    expect(skylineElevationAt(ramp, 11.25)).toBeCloseTo(1, 12);
    expect(skylineElevationAt(ramp, 95.625)).toBeCloseTo(8.5, 12);
  });

  it("wraps from north-northwest back to north", () => {
    // Halfway from NNW (30°) to N (0°).
    expect(skylineElevationAt(ramp, 348.75)).toBeCloseTo(15, 12);
    expect(skylineElevationAt(ramp, 360)).toBe(0);
    expect(skylineElevationAt(ramp, -11.25)).toBeCloseTo(15, 12);
  });

  it("names the directions as the compass rose does", () => {
    expect([0, 4, 8, 12, 15].map(skylineDirectionAbbreviation)).toEqual([
      "N",
      "E",
      "S",
      "W",
      "NNW",
    ]);
    expect(skylineDirectionName(10)).toBe("southwest");
    expect(nearestSkylineIndex(349)).toBe(0);
    expect(nearestSkylineIndex(101)).toBe(4);
    expect(nearestSkylineIndex(102)).toBe(5);
  });

  it("knows an open sky", () => {
    expect(isOpenSky(undefined)).toBe(true);
    expect(isOpenSky(OPEN_SKY)).toBe(true);
    expect(isOpenSky(ramp)).toBe(false);
  });
});

describe("findSkylineProblem", () => {
  it("accepts 16 finite angles from 0 to 90, both ends included", () => {
    expect(findSkylineProblem(ramp)).toBeNull();
    expect(findSkylineProblem([90, ...new Array(15).fill(0)])).toBeNull();
  });

  it.each([
    ["not an array", "12", /16 angles in degrees, north first/],
    ["15 angles", new Array(15).fill(0), /exactly 16 angles.*this one has 15/],
    ["17 angles", new Array(17).fill(0), /this one has 17/],
    [
      "a string inside",
      [...new Array(4).fill(0), "ten", ...new Array(11).fill(0)],
      /toward the east must be a number/,
    ],
    [
      "null inside",
      [null, ...new Array(15).fill(0)],
      /Enter the angle toward the north: 0 means open sky/,
    ],
    [
      "below 0",
      [0, -0.1, ...new Array(14).fill(0)],
      /north-northeast must be between 0° .* and 90°/,
    ],
    ["above 90", [...new Array(15).fill(0), 90.01], /north-northwest must be between/],
    [
      "not finite",
      [...new Array(8).fill(0), Number.POSITIVE_INFINITY, ...new Array(7).fill(0)],
      /toward the south must be a number/,
    ],
  ])("refuses %s", (_name, value, message) => {
    expect(findSkylineProblem(value)).toMatch(message);
  });
});

describe("the query encoding", () => {
  it("reads a comma list of 16 plain decimals, and writes one", () => {
    expect(parseSkylineQuery(formatSkylineQuery(ramp))).toEqual(ramp);
    expect(parseSkylineQuery(" 5 ,7.5,0")).toEqual([5, 7.5, 0]);
    expect(parseSkylineQuery("")).toBeUndefined();
    // Not decimals: left as text so the check names them.
    expect(parseSkylineQuery("1e1,0x10,")).toEqual(["1e1", "0x10", ""]);
  });
});

describe("presets", () => {
  it("every preset is a valid skyline on every side", () => {
    for (const preset of SKYLINE_PRESETS) {
      for (const side of [0, 4, 8, 12, 14]) {
        expect(
          findSkylineProblem(buildSkylinePreset({ id: preset.id, side })),
          preset.id,
        ).toBeNull();
      }
    }
  });

  it("a sided preset stands on the side chosen and tapers both ways", () => {
    const east = buildSkylinePreset({ id: "tree-line", side: 4 });
    expect(east[4]).toBe(30);
    expect(east[3]).toBe(east[5]);
    expect(east[12]).toBe(0);
    const north = buildSkylinePreset({ id: "tree-line", side: 0 });
    expect(north[15]).toBe(north[1]); // wraps at north
    expect(buildSkylinePreset({ id: "open" })).toEqual(OPEN_SKY);
    expect(new Set(buildSkylinePreset({ id: "clearing" }))).toEqual(new Set([25]));
  });

  it("the tree line's 30° is about the angle of 50 ft trees 75 ft away", () => {
    expect((Math.atan(50 / 75) * 180) / Math.PI).toBeCloseTo(33.7, 1);
  });
});

// W3C DeviceOrientation: alpha about z (up), beta about x, gamma about y; the top edge of the
// phone is its +y axis, which points along R·(0, 1, 0) = (−cos β sin α, cos β cos α, sin β).
describe("readSightLine", () => {
  it("a phone held flat sights level, along the compass heading 360 − alpha", () => {
    const level = readSightLine({ alpha: 0, beta: 0, gamma: 0, absolute: true });
    expect(level?.elevationDeg).toBeCloseTo(0, 9);
    expect(level?.headingDeg).toBeCloseTo(0, 9);
    expect(readSightLine({ alpha: 90, beta: 0, gamma: 0, absolute: true })?.headingDeg).toBeCloseTo(
      270,
      9,
    );
    expect(
      readSightLine({ alpha: 300, beta: 0, gamma: 0, absolute: true })?.headingDeg,
    ).toBeCloseTo(60, 9);
  });

  it("raising the top edge by 30° raises the sight line by 30°, whatever the roll", () => {
    for (const gamma of [0, 10, -25]) {
      const up = readSightLine({ alpha: 270, beta: 30, gamma, absolute: true });
      expect(up?.elevationDeg).toBeCloseTo(30, 9);
      expect(up?.headingDeg).toBeCloseTo(90, 9);
    }
  });

  it("uses Safari's compass heading when given, and no heading from a relative alpha", () => {
    expect(
      readSightLine({ alpha: 10, beta: 20, gamma: 0, absolute: false, compassHeading: 123 })
        ?.headingDeg,
    ).toBe(123);
    expect(
      readSightLine({ alpha: 10, beta: 20, gamma: 0, absolute: false })?.headingDeg,
    ).toBeNull();
    expect(readSightLine({ alpha: null, beta: null, gamma: null, absolute: false })).toBeNull();
  });

  it("turns a reading into a skyline angle", () => {
    expect(toSkylineAngle(-5)).toBe(0);
    expect(toSkylineAngle(23.6)).toBe(24);
    expect(toSkylineAngle(95)).toBe(90);
  });
});
