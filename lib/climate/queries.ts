import "server-only";
import { getDb } from "@/db/client";
import { climateStations } from "@/db/schema";
import { AppError } from "@/lib/http/errors";
import type { NormalFlag } from "./noaa";
import { needsStations, resolveClimate, type Climate, type ClimateInput, type ClimateOutcome } from "./resolve";
import { createStationIndex, type StationIndex } from "./station-index";

// Reads of the climate module: the stations, once per process, from the table the start command
// loaded (scripts/prepare-data.ts loads the committed data/climate table when it is empty).

const globalForIndex = globalThis as unknown as { __roostwrightStations?: Promise<StationIndex | null> };

/** The station index, built once per process from the database; null when the table is empty. */
export function getStationIndex(): Promise<StationIndex | null> {
  globalForIndex.__roostwrightStations ??= (async () => {
    const db = await getDb();
    const rows = await db.select().from(climateStations);
    if (rows.length === 0) return null;
    return createStationIndex(
      rows.map((r) => ({
        id: r.id,
        name: r.name,
        state: r.state,
        lat: r.lat,
        lon: r.lon,
        julyHighF: r.julyHighF,
        julyFlag: r.flag as NormalFlag,
        janHighF: r.janHighF,
        janFlag: (r.janFlag as NormalFlag | null) ?? null,
      })),
    );
  })();
  const pending = globalForIndex.__roostwrightStations;
  // An empty table is not cached: a load later in the process's life is picked up.
  void pending.then((index) => {
    if (!index && globalForIndex.__roostwrightStations === pending) globalForIndex.__roostwrightStations = undefined;
  });
  return pending;
}

/** The one climate lookup for every caller; the database is read only when stations are needed. */
export async function lookupClimate(input: ClimateInput): Promise<ClimateOutcome> {
  const index = needsStations(input) ? await getStationIndex() : null;
  return resolveClimate({ input, index });
}

/** As lookupClimate, but a failure becomes the route's error: 400 naming the field, 503 without data. */
export async function requireClimate(input: ClimateInput, fieldNames: { zip: string; value: string } = { zip: "zip", value: "value" }): Promise<Climate> {
  const outcome = await lookupClimate(input);
  if (outcome.ok) return outcome.climate;
  throw new AppError(outcome.code === "no-station-data" ? "unavailable" : "bad_request", outcome.message, {
    [fieldNames[outcome.field]]: outcome.message,
  });
}
