/**
 * The raw NOAA NCEI U.S. Climate Normals 1981–2010 files, for rebuilding the committed table and
 * for the test that checks it. Never imported by the store itself: a user's clone has no raw files.
 */
import { createHash } from "node:crypto";
import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import {
  joinStationNormals,
  parseStationInventory,
  parseTmaxNormals,
  type ClimateStation,
  type ParseResult,
  type StationRow,
  type TmaxNormalRow,
} from "@/lib/climate/noaa";

const REPO_ROOT = fileURLToPath(new URL("../..", import.meta.url));
/** Beside the repository, where the project keeps the unmodified downloads with their SOURCE.md. */
export const DEFAULT_RAW_DIR = path.resolve(REPO_ROOT, "../shared/data/noaa-normals-1981-2010");
export const TMAX_FILE = "mly-tmax-normal.txt";
export const STATIONS_FILE = "allstations.txt";
export const RAW_FILES = [TMAX_FILE, STATIONS_FILE] as const;

export function rawFilesPresent(folder: string = DEFAULT_RAW_DIR): boolean {
  return [...RAW_FILES, "SOURCE.md"].every((f) => existsSync(path.join(folder, f)));
}

/** The sha256 of each file as SOURCE.md's table lists it: | `file` | … | <64 hex> |. */
export function readSourceChecksums(folder: string): Map<string, string> {
  const text = readFileSync(path.join(folder, "SOURCE.md"), "utf8");
  const sums = new Map<string, string>();
  for (const line of text.split("\n")) {
    const m = /^\|\s*`([^`]+)`\s*\|.*\|\s*([0-9a-f]{64})\s*\|\s*$/.exec(line);
    if (m?.[1] && m[2]) sums.set(m[1], m[2]);
  }
  return sums;
}

export const sha256Of = (file: string) => createHash("sha256").update(readFileSync(file)).digest("hex");

export type RawCheck = { file: string; expected: string | undefined; actual: string; ok: boolean };

/** Each raw file's checksum against SOURCE.md; ok only when listed and equal. */
export function checkRawFiles(folder: string): RawCheck[] {
  const listed = readSourceChecksums(folder);
  return RAW_FILES.map((file) => {
    const expected = listed.get(file);
    const actual = sha256Of(path.join(folder, file));
    return { file, expected, actual, ok: expected === actual };
  });
}

export type RawLoad = {
  stations: ClimateStation[];
  normals: ParseResult<TmaxNormalRow>;
  inventory: ParseResult<StationRow>;
};

/** Parses both raw files and joins them (no checksum check: call checkRawFiles first). */
export function loadRawStations(folder: string): RawLoad {
  const normals = parseTmaxNormals(readFileSync(path.join(folder, TMAX_FILE), "utf8"));
  const inventory = parseStationInventory(readFileSync(path.join(folder, STATIONS_FILE), "utf8"));
  return { stations: joinStationNormals(normals.rows, inventory.rows), normals, inventory };
}
