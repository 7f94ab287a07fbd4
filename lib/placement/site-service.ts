import "server-only";
import { getStationIndex } from "@/lib/catalog/climate-service";
import { AppError } from "@/lib/http/errors";
import { buildPlacementAnswer, type PlacementAnswer } from "./placement-answer";
import type { PlacementInput } from "./schema";
import { resolveSiteClimate } from "./site-climate";

/**
 * The placement check for `POST /api/placement`, the saved-site routes and the pages: resolves the
 * location and July high, then runs the pure check. Problems the buyer can fix come back as a 400
 * naming the field; missing station data is a 503 that still names the field to fill instead.
 */
export async function checkSite(input: PlacementInput): Promise<PlacementAnswer> {
  // A typed July high needs no stations, so the database is left alone.
  const index = input.julyHighF === undefined ? await getStationIndex() : null;
  const resolved = resolveSiteClimate({ input, index });
  if (!resolved.ok) {
    throw new AppError(
      resolved.reason === "no-station-data" ? "unavailable" : "bad_request",
      resolved.message,
      { [resolved.field]: resolved.message },
    );
  }
  return buildPlacementAnswer({ input, location: resolved.location, climate: resolved.climate });
}
