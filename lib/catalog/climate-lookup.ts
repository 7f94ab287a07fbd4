import { bandForJulyHigh, nearBandEdge, type BandEdge, type ClimateBand } from "./climate-bands";
import type { LatLon } from "./geo-distance";
import { lookupJulyHigh, type NearbyStation, type StationIndex } from "./station-index";
import { zipToCentre } from "./zip-centre";

// ZIP → centre → three nearest NOAA stations → July high → band (product brief §2).
// Values: NOAA NCEI, U.S. Climate Normals 1981–2010 (credit it wherever they are shown).

export { distanceMiles, EARTH_RADIUS_MI } from "./geo-distance";
export {
  createStationIndex,
  lookupJulyHigh,
  type JulyHighEstimate,
  type NearbyStation,
  type StationIndex,
} from "./station-index";
export { zipCodeSchema, zipToCentre, type ZipCentre } from "./zip-centre";

export const CLIMATE_DATA_CREDIT = "NOAA NCEI, U.S. Climate Normals 1981–2010";

export type ZipClimate =
  | {
      ok: true;
      zip: string;
      centre: LatLon;
      julyHighF: number;
      stations: NearbyStation[];
      band: ClimateBand;
      /** Set when the July high lies within 1 °F of a band edge. */
      nearEdge: BandEdge | null;
    }
  | { ok: false; code: "malformed" | "unknown"; message: string };

export function climateForZip(index: StationIndex, zip: string): ZipClimate {
  const centre = zipToCentre(zip);
  if (!centre.ok) return centre;
  const point = { lat: centre.lat, lon: centre.lon };
  const { julyHighF, stations } = lookupJulyHigh(index, point);
  return {
    ok: true,
    zip: centre.zip,
    centre: point,
    julyHighF,
    stations,
    band: bandForJulyHigh(julyHighF),
    nearEdge: nearBandEdge(julyHighF),
  };
}
