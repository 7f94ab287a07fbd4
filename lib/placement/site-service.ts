import "server-only";
import { requireClimate } from "@/lib/climate/queries";
import type { ClimateInput } from "@/lib/climate/resolve";
import { buildPlacementAnswer, toSiteClimate, type PlacementAnswer, type SiteLocation } from "./placement-answer";
import type { PlacementInput } from "./schema";

/** The placement form's fields as the one climate lookup takes them (typed °F or °C wins over stations). */
export function placementClimateInput(input: Pick<PlacementInput, "zip" | "lat" | "lon" | "julyHighF" | "julyHighC">): ClimateInput {
  const typed =
    input.julyHighF !== undefined
      ? { value: input.julyHighF, unit: "F" as const }
      : input.julyHighC !== undefined
        ? { value: input.julyHighC, unit: "C" as const }
        : undefined;
  const place = input.lat !== undefined && input.lon !== undefined ? { lat: input.lat, lon: input.lon } : { zip: input.zip ?? "" };
  return { ...place, ...(typed ? { typed } : {}) };
}

/**
 * The placement check for `POST /api/placement`, the saved-site routes and the pages: resolves the
 * location and the warmest month's high through lib/climate, then runs the pure check. Problems the
 * buyer can fix come back as a 400 naming the field; missing station data is a 503 that still names
 * the field to fill instead.
 */
export async function checkSite(input: PlacementInput): Promise<PlacementAnswer> {
  const climate = await requireClimate(placementClimateInput(input), { zip: "zip", value: "julyHighF" });
  const location: SiteLocation =
    input.lat !== undefined && input.lon !== undefined
      ? { lat: input.lat, lon: input.lon, source: "coordinates" }
      : climate.source.kind !== "coordinates" && climate.source.lat !== undefined && climate.source.lon !== undefined
        ? { lat: climate.source.lat, lon: climate.source.lon, source: "zip", ...(climate.source.zip ? { zip: climate.source.zip } : {}) }
        : { lat: 0, lon: 0, source: "zip" };
  return buildPlacementAnswer({ input, location, climate: toSiteClimate(climate) });
}
