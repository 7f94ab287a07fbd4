import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import { count } from "drizzle-orm";
import type { Db } from "@/db/client";
import { climateStations } from "@/db/schema";
import { joinJulyNormals, parseStationInventory, parseTmaxNormals } from "./noaa";

export type ClimateImportReport = {
  stations: number;
  normalsRead: number;
  inventoryRead: number;
  skipped: number;
  reasons: { file: string; line: number; reason: string }[];
};

/** Reads the official NOAA files from a folder and replaces the climate_stations table. */
export async function importClimate(db: Db, folder: string): Promise<ClimateImportReport> {
  const dir = path.resolve(folder);
  const normalsFile = path.join(dir, "mly-tmax-normal.txt");
  const inventoryFile = path.join(dir, "allstations.txt");
  for (const file of [normalsFile, inventoryFile]) {
    if (!existsSync(file)) throw new Error(`Missing ${path.basename(file)} in ${folder}.`);
  }
  const normals = parseTmaxNormals(readFileSync(normalsFile, "utf8"));
  const inventory = parseStationInventory(readFileSync(inventoryFile, "utf8"));
  const joined = joinJulyNormals(normals.rows, inventory.rows);
  await db.transaction(async (tx) => {
    await tx.delete(climateStations);
    for (let i = 0; i < joined.length; i += 500) {
      await tx.insert(climateStations).values(joined.slice(i, i + 500));
    }
  });
  const reasons = [
    ...normals.skipped.map((s) => ({ file: "mly-tmax-normal.txt", line: s.line, reason: s.reason })),
    ...inventory.skipped.map((s) => ({ file: "allstations.txt", line: s.line, reason: s.reason })),
  ];
  return {
    stations: joined.length,
    normalsRead: normals.read,
    inventoryRead: inventory.read,
    skipped: reasons.length,
    reasons,
  };
}

/** At start: imports the normals when the folder is there and the table is empty. */
export async function importClimateIfEmpty(db: Db, folder: string): Promise<ClimateImportReport | null> {
  const [row] = await db.select({ n: count() }).from(climateStations);
  if ((row?.n ?? 0) > 0) return null;
  if (!existsSync(path.join(path.resolve(folder), "mly-tmax-normal.txt"))) {
    console.warn(`Climate normals not found in ${folder}; the band finder will ask for a July high instead.`);
    return null;
  }
  return importClimate(db, folder);
}
