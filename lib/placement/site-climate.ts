// Where the planned site is, and how hot its Julys get (PRODUCT.md §2 and §4): a ZIP becomes its
// Census centre, coordinates are taken as typed; the July high is the buyer's own figure when
// they give one, else the 1/d²-weighted normal of the three nearest NOAA stations. Pure: the
// station index is passed in (the server builds it once per process from the database).
import {
  bandForJulyHigh,
  fahrenheitToCelsius,
  nearBandEdge,
  type ClimateBand,
} from "@/lib/catalog/climate-bands";
import { lookupJulyHigh, type NearbyStation, type StationIndex } from "@/lib/catalog/station-index";
import { zipToCentre } from "@/lib/catalog/zip-centre";
import type { PlacementInput } from "./schema";

/**
 * Typed coordinates count as covered by the station data when the nearest station lies within
 * this distance. Common practice, no source: measured over all 33,791 ZIP centres, the nearest
 * station is 7.3 mi away at the median and 21 mi at the 99th percentile; three times that keeps
 * the whole U.S. (and the border towns) in while a point far offshore or abroad, where the
 * nearest U.S. stations say nothing about its summers, is asked for its July high instead.
 * ZIP codes always use their stations, exactly as the catalog's band finder does.
 */
export const STATION_COVERAGE_MI = 60;

export type SiteLocation = {
  lat: number;
  lon: number;
  /** How the buyer gave it: typed coordinates win over a ZIP when both arrive. */
  source: "coordinates" | "zip";
  zip?: string;
};

export type SiteClimate = {
  julyHighF: number;
  julyHighC: number;
  source: "typed" | "stations";
  /** The stations used, nearest first (stations only). */
  stations?: NearbyStation[];
  /** A sentence when the July high lies within 1 °F of a band edge, else null. */
  nearEdgeNote: string | null;
  band: ClimateBand;
};

export type SiteResolution =
  | { ok: true; location: SiteLocation; climate: SiteClimate }
  | {
      ok: false;
      reason: "zip" | "no-station-data" | "outside-coverage";
      /** The input field the buyer should change. */
      field: "zip" | "julyHighF";
      message: string;
    };

const oneDecimal = (n: number) => Math.round(n * 10) / 10;

function describeClimate({
  julyHighF,
  source,
  stations,
}: Pick<SiteClimate, "julyHighF" | "source" | "stations">): SiteClimate {
  return {
    julyHighF: oneDecimal(julyHighF),
    julyHighC: oneDecimal(fahrenheitToCelsius(julyHighF)),
    source,
    ...(stations ? { stations } : {}),
    nearEdgeNote: nearBandEdge(julyHighF)?.note ?? null,
    band: bandForJulyHigh(julyHighF),
  };
}

function locate(
  input: Partial<Pick<PlacementInput, "zip" | "lat" | "lon">>,
): SiteResolution | SiteLocation {
  if (input.lat !== undefined && input.lon !== undefined) {
    return { lat: input.lat, lon: input.lon, source: "coordinates" };
  }
  const centre = zipToCentre(input.zip ?? "");
  if (!centre.ok) return { ok: false, reason: "zip", field: "zip", message: centre.message };
  return { lat: centre.lat, lon: centre.lon, source: "zip", zip: centre.zip };
}

export function resolveSiteClimate({
  input,
  index,
}: {
  input: Partial<Pick<PlacementInput, "zip" | "lat" | "lon" | "julyHighF">>;
  /** null when the station data is not loaded on this store. */
  index: StationIndex | null;
}): SiteResolution {
  const location = locate(input);
  if ("ok" in location) return location;

  if (input.julyHighF !== undefined) {
    return {
      ok: true,
      location,
      climate: describeClimate({ julyHighF: input.julyHighF, source: "typed" }),
    };
  }
  if (!index) {
    return {
      ok: false,
      reason: "no-station-data",
      field: "julyHighF",
      message:
        "Our weather-station data is not loaded right now, so we cannot estimate your summers. Type your average July high in °F.",
    };
  }
  const estimate = lookupJulyHigh(index, location);
  const nearest = estimate.stations[0];
  if (location.source === "coordinates" && (!nearest || nearest.distanceMi > STATION_COVERAGE_MI)) {
    const away = nearest ? ` The nearest is ${Math.round(nearest.distanceMi)} mi away.` : "";
    return {
      ok: false,
      reason: "outside-coverage",
      field: "julyHighF",
      message: `Our weather stations cover the United States, and none is within ${STATION_COVERAGE_MI} mi of this spot.${away} Type your average July high in °F.`,
    };
  }
  return {
    ok: true,
    location,
    climate: describeClimate({
      julyHighF: estimate.julyHighF,
      source: "stations",
      stations: estimate.stations,
    }),
  };
}
