import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import type { ClimateStation } from "./noaa";
import { parseClimateTable } from "./table";

// Where the committed climate table lives in the repository (it ships with the store; the raw
// NOAA files are only needed to rebuild it with `npm run climate:build`).
export const CLIMATE_TABLE_FILE = fileURLToPath(new URL("../../data/climate/normals-1981-2010.csv", import.meta.url));

/** The committed table, parsed (about 7,500 stations). */
export function readClimateTable(file: string = CLIMATE_TABLE_FILE): ClimateStation[] {
  return parseClimateTable(readFileSync(file, "utf8"));
}
