import { readFileSync } from "node:fs";
import { join } from "node:path";
import {
  joinJulyNormals,
  parseStationInventory,
  parseTmaxNormals,
  type JulyStation,
  type ParseResult,
  type StationRow,
  type TmaxNormalRow,
} from "./noaa";

// Reading the two official files from disk (Node only; the parsers themselves stay pure).
// Callers pass the folder, e.g. resolved from the repository root as
// "../shared/data/noaa-normals-1981-2010".

export const TMAX_FILE = "mly-tmax-normal.txt";
export const STATIONS_FILE = "allstations.txt";

export type JulyNormalsLoad = {
  stations: JulyStation[];
  normals: ParseResult<TmaxNormalRow>;
  inventory: ParseResult<StationRow>;
};

export function loadJulyNormals({ folder }: { folder: string }): JulyNormalsLoad {
  const normals = parseTmaxNormals(readFileSync(join(folder, TMAX_FILE), "utf8"));
  const inventory = parseStationInventory(readFileSync(join(folder, STATIONS_FILE), "utf8"));
  return { stations: joinJulyNormals(normals.rows, inventory.rows), normals, inventory };
}
