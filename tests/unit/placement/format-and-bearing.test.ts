// Display helpers of the placement check.
// Outside references: the exact foot and mile of the International Yard and Pound Agreement
// (1959), as tabulated in NIST Special Publication 811 (2008), appendix B: 1 ft = 0.3048 m,
// 1 mi = 1.609344 km; and the 16-point compass rose of navigation handbooks (e.g. Bowditch,
// "The American Practical Navigator", NGA Pub. 9, 2019): points every 22.5°, SSE = 157.5°.
import { describe, expect, it } from "vitest";
import {
  abbreviateBearing,
  describeBearing,
  mirrorBearing,
  normalizeBearing,
} from "@/lib/placement/bearing";
import {
  formatFeet,
  formatHours,
  formatMiles,
  formatPercent,
  KILOMETERS_PER_MILE,
  METERS_PER_FOOT,
} from "@/lib/placement/format";

describe("unit conversions against NIST SP 811", () => {
  it("uses the exact international foot and mile", () => {
    expect(METERS_PER_FOOT).toBe(0.3048);
    expect(KILOMETERS_PER_MILE).toBe(1.609344);
    // 15 ft = 4.572 m and 20 ft = 6.096 m exactly; shown to the centimetre, rounded down.
    expect(formatFeet(15)).toBe("15 ft (4.57 m)");
    expect(formatFeet(20)).toBe("20 ft (6.09 m)");
    // A quarter mile = 402.336 m, shown rounded up.
    expect(formatMiles(0.25)).toBe("0.25 mi (0.41 km)");
  });

  it("never shows a value just short of a threshold as the threshold", () => {
    expect(formatFeet(14.999)).toBe("14.99 ft (4.57 m)");
    expect(formatFeet(11.999)).toMatch(/^11\.99 ft/);
    expect(formatMiles(0.2501)).toMatch(/^0\.26 mi/);
    expect(formatMiles(1.001)).toMatch(/^1\.01 mi/);
    expect(formatPercent(0.599)).toBe("59%");
    expect(formatPercent(0.6)).toBe("60%");
    expect(formatHours(5.999)).toBe("5 h 59 min");
    expect(formatHours(6)).toBe("6 h");
    expect(formatHours(0)).toBe("0 h");
  });
});

describe("bearings", () => {
  // The 16 points at their centres, from the compass-rose table.
  const ROSE: Array<[number, string, string]> = [
    [0, "north", "N"],
    [22.5, "north-northeast", "NNE"],
    [45, "northeast", "NE"],
    [67.5, "east-northeast", "ENE"],
    [90, "east", "E"],
    [112.5, "east-southeast", "ESE"],
    [135, "southeast", "SE"],
    [157.5, "south-southeast", "SSE"],
    [180, "south", "S"],
    [202.5, "south-southwest", "SSW"],
    [225, "southwest", "SW"],
    [247.5, "west-southwest", "WSW"],
    [270, "west", "W"],
    [292.5, "west-northwest", "WNW"],
    [315, "northwest", "NW"],
    [337.5, "north-northwest", "NNW"],
  ];

  it.each(ROSE)("%s° is %s (%s)", (deg, words, short) => {
    expect(describeBearing(deg)).toBe(words);
    expect(abbreviateBearing(deg)).toBe(short);
  });

  it("rounds to the nearest point, wrapping at north", () => {
    expect(describeBearing(157)).toBe("south-southeast");
    expect(describeBearing(11.24)).toBe("north");
    expect(describeBearing(11.26)).toBe("north-northeast");
    expect(describeBearing(349)).toBe("north");
    expect(describeBearing(-90)).toBe("west");
  });

  it("normalizes and mirrors across the east-west line", () => {
    expect(normalizeBearing(360)).toBe(0);
    expect(normalizeBearing(-90)).toBe(270);
    expect(Object.is(normalizeBearing(-360), 0)).toBe(true);
    expect(mirrorBearing(135)).toBe(45);
    expect(mirrorBearing(202.5)).toBe(337.5);
    expect(mirrorBearing(90)).toBe(90);
    expect(mirrorBearing(270)).toBe(270);
  });
});
