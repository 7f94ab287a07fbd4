import { describe, expect, it } from "vitest";
import {
  bandForJulyHigh,
  BAND_IDS,
  celsiusToFahrenheit,
  CLIMATE_BANDS,
  fahrenheitToCelsius,
  nearBandEdge,
} from "@/lib/catalog/climate-bands";

// Source: bat-house colour guidance keyed to average July high (Tuttle, Kiser & Kiser, The Bat
// House Builder's Handbook, 2004, as reproduced by agencies); vents from 85 °F (Bat
// Conservation of Wisconsin). Half-open bands as the product brief §2 fixes them.

describe("bandForJulyHigh: half-open bands with edges at 85, 95 and 100 °F", () => {
  it.each([
    [-10, "cool"],
    [84.9, "cool"],
    [85.0, "warm"],
    [94.9, "warm"],
    [95.0, "hot"],
    [99.9, "hot"],
    [100.0, "very-hot"],
    [120, "very-hot"],
  ] as const)("%s °F → %s", (f, expected) => {
    expect(bandForJulyHigh(f).id).toBe(expected);
  });

  it("puts a reading typed in °C on the right side of an edge despite float noise", () => {
    // 85 °F is 29.444… °C; a buyer typing the exact conversion belongs in the warm band.
    expect(bandForJulyHigh(celsiusToFahrenheit(fahrenheitToCelsius(85))).id).toBe("warm");
    expect(bandForJulyHigh(celsiusToFahrenheit(35)).id).toBe("hot");
    expect(bandForJulyHigh(celsiusToFahrenheit(29.4)).id).toBe("cool"); // 84.92 °F
  });

  it("refuses a reading that is not a number", () => {
    expect(() => bandForJulyHigh(Number.NaN)).toThrow(RangeError);
  });

  it("lists suitable shades and vents as the table gives them", () => {
    expect(
      BAND_IDS.map((id) => [
        id,
        CLIMATE_BANDS[id].shades,
        CLIMATE_BANDS[id].ventsNeeded,
        CLIMATE_BANDS[id].afternoonShade,
      ]),
    ).toEqual([
      ["cool", ["black", "dark"], false, false],
      ["warm", ["dark", "medium"], true, false],
      ["hot", ["medium", "light"], true, false],
      ["very-hot", ["light", "white"], true, true],
    ]);
    for (const id of BAND_IDS) expect(CLIMATE_BANDS[id].explanation.length).toBeGreaterThan(40);
  });
});

describe("°F and °C", () => {
  // Fixed points of the two scales (NIST SP 811, 2008, §B.9: t/°F = 1.8 t/°C + 32).
  it.each([
    [0, 32],
    [100, 212],
    [-40, -40],
    [37, 98.6],
  ])("%s °C = %s °F", (c, f) => {
    expect(celsiusToFahrenheit(c)).toBeCloseTo(f, 10);
    expect(fahrenheitToCelsius(f)).toBeCloseTo(c, 10);
  });

  it("matches the °C edges quoted in the band texts", () => {
    expect(fahrenheitToCelsius(85)).toBeCloseTo(29.4, 1);
    expect(fahrenheitToCelsius(95)).toBeCloseTo(35, 10);
    expect(fahrenheitToCelsius(100)).toBeCloseTo(37.8, 1);
  });
});

describe("nearBandEdge: within 1 °F of an edge, inclusive", () => {
  it.each([
    [83.9, null],
    [84.0, 85],
    [84.9, 85],
    [85.0, 85],
    [86.0, 85],
    [86.1, null],
    [94.0, 95],
    [97.4, null],
    [99.0, 100],
    [101.0, 100],
    [101.1, null],
  ])("%s °F → %s", (f, edge) => {
    expect(nearBandEdge(f)?.edgeF ?? null).toBe(edge);
  });

  it("names both bands and the side of the edge", () => {
    const near = nearBandEdge(84.9);
    expect(near?.below).toBe("cool");
    expect(near?.above).toBe("warm");
    expect(near?.differenceF).toBeCloseTo(-0.1, 10);
    expect(near?.note).toMatch(/within 1 °F of 85 °F/);
  });

  it("reports the edge on either side of it", () => {
    expect(nearBandEdge(96)?.edgeF).toBe(95);
    expect(nearBandEdge(99)?.edgeF).toBe(100);
  });
});
