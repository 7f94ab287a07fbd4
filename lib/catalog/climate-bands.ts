import type { Shade } from "./spec";

// Climate bands keyed to the normal daily high in July: in the warmest month, that is, July north
// of the equator and January south of it (lib/climate/warmest-month.ts).
// Source: the bat-house colour guidance keyed to average July high temperature (Tuttle, Kiser &
// Kiser, The Bat House Builder's Handbook, 2004, as reproduced by agencies); vents 6 in above
// the bottom where July highs average 85 °F or more (Bat Conservation of Wisconsin,
// "Attracting Bats"). The sources overlap at their edges; we use half-open bands: a band
// includes its lower edge and excludes its upper edge.

export const BAND_IDS = ["cool", "warm", "hot", "very-hot"] as const;
export type BandId = (typeof BAND_IDS)[number];

export type ClimateBand = {
  id: BandId;
  label: string;
  /** Lower edge in °F, included; null for the coolest band. */
  fromF: number | null;
  /** Upper edge in °F, excluded; null for the hottest band. */
  belowF: number | null;
  rangeText: string;
  shades: readonly Shade[];
  ventsNeeded: boolean;
  afternoonShade: boolean;
  explanation: string;
};

export const BAND_EDGES_F = [85, 95, 100] as const;

export const CLIMATE_BANDS: Record<BandId, ClimateBand> = {
  cool: {
    id: "cool",
    label: "Cool summers",
    fromF: null,
    belowF: 85,
    rangeText: "July highs below 85 °F (29.4 °C)",
    shades: ["black", "dark"],
    ventsNeeded: false,
    afternoonShade: false,
    explanation:
      "Your summers are mild, so a black or dark house soaks up the sun bats need to keep their young warm. Vents are optional.",
  },
  warm: {
    id: "warm",
    label: "Warm summers",
    fromF: 85,
    belowF: 95,
    rangeText: "July highs from 85 °F (29.4 °C) to below 95 °F (35 °C)",
    shades: ["dark", "medium"],
    ventsNeeded: true,
    afternoonShade: false,
    explanation:
      "Your summers are warm, so a dark or medium house holds enough heat without overheating. Choose one with vents so bats can cool off.",
  },
  hot: {
    id: "hot",
    label: "Hot summers",
    fromF: 95,
    belowF: 100,
    rangeText: "July highs from 95 °F (35 °C) to below 100 °F (37.8 °C)",
    shades: ["medium", "light"],
    ventsNeeded: true,
    afternoonShade: false,
    explanation:
      "Your summers are hot, so a medium or light house keeps the chambers from baking. Vents are needed.",
  },
  "very-hot": {
    id: "very-hot",
    label: "Very hot summers",
    fromF: 100,
    belowF: null,
    rangeText: "July highs of 100 °F (37.8 °C) and above",
    shades: ["light", "white"],
    ventsNeeded: true,
    afternoonShade: true,
    explanation:
      "Your summers are very hot, so a light or white house reflects the sun. It needs vents, and a spot that gets shade in the afternoon.",
  },
};

// Readings come from arithmetic (°C converted, weighted means); a billionth of a degree of slack
// keeps 85 typed as 29.444…°C from landing a hair under the edge.
const EPSILON_F = 1e-9;

/** °F = °C × 9/5 + 32 (definition of the Fahrenheit scale against Celsius). */
export function celsiusToFahrenheit(celsius: number): number {
  return (celsius * 9) / 5 + 32;
}

export function fahrenheitToCelsius(fahrenheit: number): number {
  return ((fahrenheit - 32) * 5) / 9;
}

/** The band a July normal daily high falls in; bands include their lower edge. */
export function bandForJulyHigh(fahrenheit: number): ClimateBand {
  if (!Number.isFinite(fahrenheit)) {
    throw new RangeError(`A July high must be a finite number of °F, got ${fahrenheit}.`);
  }
  const [warmFrom, hotFrom, veryHotFrom] = BAND_EDGES_F;
  if (fahrenheit >= veryHotFrom - EPSILON_F) return CLIMATE_BANDS["very-hot"];
  if (fahrenheit >= hotFrom - EPSILON_F) return CLIMATE_BANDS.hot;
  if (fahrenheit >= warmFrom - EPSILON_F) return CLIMATE_BANDS.warm;
  return CLIMATE_BANDS.cool;
}

export type BandEdge = {
  edgeF: number;
  below: BandId;
  above: BandId;
  /** Reading minus edge, °F: negative when the reading is just under the edge. */
  differenceF: number;
  note: string;
};

// Within 1 °F of an edge, a buyer deserves to hear that the band is a close call: the 1981–2010
// normals run cooler than 1991–2020 by 0.5–1 °F at many stations (NOAA NCEI; see the data's
// SOURCE.md). Common practice, no source, for the 1 °F width.
export const NEAR_EDGE_F = 1;

/** The nearest band edge when the reading lies within 1 °F of it (inclusive), else null. */
export function nearBandEdge(fahrenheit: number): BandEdge | null {
  let nearest: BandEdge | null = null;
  for (const [i, edgeF] of BAND_EDGES_F.entries()) {
    const differenceF = fahrenheit - edgeF;
    if (Math.abs(differenceF) > NEAR_EDGE_F + EPSILON_F) continue;
    if (nearest && Math.abs(nearest.differenceF) <= Math.abs(differenceF)) continue;
    const below = BAND_IDS[i] ?? "cool";
    const above = BAND_IDS[i + 1] ?? "very-hot";
    nearest = {
      edgeF,
      below,
      above,
      differenceF,
      note: `Your summer high (the average daily high of your warmest month) is within 1 °F of ${edgeF} °F, where ${CLIMATE_BANDS[below].label.toLowerCase()} meet ${CLIMATE_BANDS[above].label.toLowerCase()}; recent summers may run warmer, so a house for either band can suit.`,
    };
  }
  return nearest;
}
