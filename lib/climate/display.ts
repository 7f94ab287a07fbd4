import { bandForJulyHigh, fahrenheitToCelsius, type ClimateBand } from "@/lib/catalog/climate-bands";

// Display rounding that never contradicts the band (PRODUCT.md §2): the band is chosen from the
// unrounded value; a shown number is rounded to the nearest step unless that would carry it over
// the band's edge, in which case it is cut toward the band (84.96 °F shows as 84.9 °F, cool
// summers, never 85.0 °F). Common practice, no source, for rounding to 0.1 °F and to whole degrees.

function roundWithinBand(valueF: number, band: ClimateBand, step: number): number {
  const rounded = Math.round(valueF / step) * step;
  if (band.belowF !== null && rounded >= band.belowF) return Math.floor(valueF / step) * step;
  if (band.fromF !== null && rounded < band.fromF) return Math.ceil(valueF / step) * step;
  return rounded;
}

export type ClimateDisplay = {
  /** 0.1 °F, never over the band's edge: "84.9". */
  f: string;
  /** 0.1 °C of the unrounded value: "29.4". */
  c: string;
  /** Whole °F, never over the band's edge: "84". */
  wholeF: string;
  /** Whole °C. */
  wholeC: string;
  /** "84.9 °F (29.4 °C)". */
  text: string;
};

export function displayClimateValue(valueF: number, band: ClimateBand = bandForJulyHigh(valueF)): ClimateDisplay {
  const f = roundWithinBand(valueF, band, 0.1).toFixed(1);
  const c = fahrenheitToCelsius(valueF).toFixed(1);
  const wholeF = roundWithinBand(valueF, band, 1).toFixed(0);
  const wholeC = Math.round(fahrenheitToCelsius(valueF)).toFixed(0);
  return { f, c, wholeF, wholeC, text: `${f} °F (${c} °C)` };
}
