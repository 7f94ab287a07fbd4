import "server-only";
import { count, isNotNull } from "drizzle-orm";
import type { Db } from "@/db/client";
import { climateStations } from "@/db/schema";
import type { ClimateStation } from "./noaa";
import { readClimateTable } from "./table-file";

// Writes of the climate module: loading the stations into the database. The start command
// (scripts/prepare-data.ts) loads the committed table; `npm run climate:import <folder>` may load
// stations parsed from raw files instead.

const BATCH = 1000;

export type ClimateLoad = { loaded: number; skipped: boolean; ms: number };

/** Replaces the climate_stations table with these stations, in one transaction, in batches. */
export async function replaceClimateStations(db: Db, stations: readonly ClimateStation[]): Promise<number> {
  const rows = stations.map((s) => ({
    id: s.id,
    name: s.name,
    state: s.state,
    lat: s.lat,
    lon: s.lon,
    julyHighF: s.julyHighF,
    flag: s.julyFlag,
    janHighF: s.janHighF,
    janFlag: s.janFlag,
  }));
  await db.transaction(async (tx) => {
    await tx.delete(climateStations);
    for (let i = 0; i < rows.length; i += BATCH) await tx.insert(climateStations).values(rows.slice(i, i + BATCH));
  });
  return rows.length;
}

/**
 * Loads the committed table unless the database already holds it (same number of stations, each
 * with its January value where the table has one): running it again is a no-op, and a database
 * filled by an older import without January values is brought up to date.
 */
export async function loadClimateTableIfNeeded(
  db: Db,
  stations: readonly ClimateStation[] = readClimateTable(),
): Promise<ClimateLoad> {
  const started = performance.now();
  const [all] = await db.select({ n: count() }).from(climateStations);
  const [withJan] = await db.select({ n: count() }).from(climateStations).where(isNotNull(climateStations.janHighF));
  const expectedJan = stations.filter((s) => s.janHighF !== null).length;
  if ((all?.n ?? 0) === stations.length && (withJan?.n ?? 0) === expectedJan) {
    return { loaded: 0, skipped: true, ms: performance.now() - started };
  }
  const loaded = await replaceClimateStations(db, stations);
  return { loaded, skipped: false, ms: performance.now() - started };
}
