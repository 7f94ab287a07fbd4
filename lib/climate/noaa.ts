// Parsers for two fixed-width files of the NOAA NCEI U.S. Climate Normals 1981–2010 (public
// domain): products/temperature/mly-tmax-normal.txt and station-inventories/allstations.txt.
// Column layout from the normals' readme, as restated in the raw files' SOURCE.md (the rebuild
// script scripts/climate-build-table.ts reads them; the store itself reads only the committed table
// data/climate/). Every bad line is skipped with its reason, never guessed at.

export type SkippedLine = { line: number; reason: string };
export type ParseResult<Row> = { rows: Row[]; read: number; skipped: SkippedLine[] };

/** C complete, S standard, R representative, P provisional, Q quasi-normal. */
export const NORMAL_FLAGS = ["C", "S", "R", "P", "Q"] as const;
export type NormalFlag = (typeof NORMAL_FLAGS)[number];

export type MonthlyNormal = { tenthsF: number | null; flag: NormalFlag | null };
export type TmaxNormalRow = {
  id: string;
  /** January..December; null where the file holds a special "no value" code. */
  months: MonthlyNormal[];
  julyTenthsF: number;
  julyFlag: NormalFlag;
};

export type StationRow = {
  id: string;
  lat: number;
  lon: number;
  /** Metres; null where the inventory says -999.9. */
  elevationM: number | null;
  state: string;
  name: string;
  gsn: boolean;
  hcnCrn: "HCN" | "CRN" | null;
  wmoId: string | null;
};

/** One station as the store uses it: where it is, and its January and July normal daily highs. */
export type ClimateStation = {
  id: string;
  name: string;
  state: string;
  lat: number;
  lon: number;
  /** °F; null where the file has a "no value" code for January (none in this copy). */
  janHighF: number | null;
  janFlag: NormalFlag | null;
  julyHighF: number;
  julyFlag: NormalFlag;
};

// GHCN-Daily ids: 2-letter country code, 1-character network code, 8-character station number.
const STATION_ID = /^[A-Z]{2}[0-9A-Z]{9}$/;
const INTEGER = /^-?\d+$/;
const DECIMAL = /^-?\d+(\.\d+)?$/;
const SPECIAL_VALUES = new Set([-6666, -7777, -8888, -9999]);
const JULY = 6;
const MONTH_NAMES = "Jan Feb Mar Apr May Jun Jul Aug Sep Oct Nov Dec".split(" ");

/** 1-based inclusive columns, as the readme numbers them. */
const cols = (line: string, from: number, to: number) => line.slice(from - 1, to);

function linesOf(text: string): string[] {
  const lines = text.split(/\r?\n/);
  if (lines.at(-1) === "") lines.pop();
  return lines;
}

function blankAt(line: string, columns: readonly number[]): number | null {
  return columns.find((c) => line[c - 1] !== " ") ?? null;
}

// mly-tmax-normal.txt: id 1–11, blank 12–18, then for month m (0-based) the value in columns
// 19+7m … 23+7m (right-aligned, tenths of °F) and the flag in column 24+7m; 101 columns in all.
const TMAX_LENGTH = 101;

type LineOutcome<Row> = { row: Row } | { reason: string };

function parseTmaxLine(line: string): LineOutcome<TmaxNormalRow> {
  if (line.length !== TMAX_LENGTH) {
    return { reason: `wrong length: ${line.length} characters, expected ${TMAX_LENGTH}` };
  }
  const id = cols(line, 1, 11);
  if (!STATION_ID.test(id)) return { reason: `bad station id "${id}"` };
  if (cols(line, 12, 18).trim() !== "") return { reason: "columns 12–18 should be blank" };
  const months: MonthlyNormal[] = [];
  for (let m = 0; m < 12; m++) {
    const start = 19 + 7 * m;
    const name = MONTH_NAMES[m] ?? String(m + 1);
    if (m > 0 && line[start - 2] !== " ") return { reason: `column ${start - 1} should be blank` };
    const raw = cols(line, start, start + 4).trim();
    if (!INTEGER.test(raw)) return { reason: `${name} value "${raw}" is not a whole number` };
    const value = Number(raw);
    const flag = line[start + 4] ?? "";
    if (SPECIAL_VALUES.has(value)) {
      if (m === JULY) return { reason: `July has no value (special code ${value})` };
      months.push({ tenthsF: null, flag: null });
      continue;
    }
    if (!(NORMAL_FLAGS as readonly string[]).includes(flag)) {
      return { reason: `${name} flag "${flag}" is not one of ${NORMAL_FLAGS.join(", ")}` };
    }
    months.push({ tenthsF: value, flag: flag as NormalFlag });
  }
  const july = months[JULY];
  if (!july || july.tenthsF === null || july.flag === null) return { reason: "July has no value" };
  return { row: { id, months, julyTenthsF: july.tenthsF, julyFlag: july.flag } };
}

// allstations.txt: id 1–11, latitude 13–20, longitude 22–30, elevation (m) 32–37, state 39–40,
// name 42–71, GSN flag 73–75, HCN/CRN flag 77–79, WMO id 81–85. Lines may stop after the name
// when the trailing flags are blank.
const STATION_MAX_LENGTH = 85;
const STATION_MIN_LENGTH = 42;
const STATION_SEPARATORS = [12, 21, 31, 38, 41, 72, 76, 80] as const;
const MISSING_ELEVATION = -999.9;

function parseStationLine(text: string): LineOutcome<StationRow> {
  if (text.length > STATION_MAX_LENGTH || text.length < STATION_MIN_LENGTH) {
    return {
      reason: `wrong length: ${text.length} characters, expected ${STATION_MIN_LENGTH}–${STATION_MAX_LENGTH}`,
    };
  }
  const line = text.padEnd(STATION_MAX_LENGTH, " ");
  const id = cols(line, 1, 11);
  if (!STATION_ID.test(id)) return { reason: `bad station id "${id}"` };
  const notBlank = blankAt(line, STATION_SEPARATORS);
  if (notBlank !== null) return { reason: `column ${notBlank} should be blank` };

  const fields = {
    latitude: cols(line, 13, 20),
    longitude: cols(line, 22, 30),
    elevation: cols(line, 32, 37),
  };
  for (const [what, raw] of Object.entries(fields)) {
    if (!DECIMAL.test(raw.trim())) return { reason: `${what} "${raw.trim()}" is not a number` };
  }
  const lat = Number(fields.latitude);
  const lon = Number(fields.longitude);
  const elevation = Number(fields.elevation);
  if (lat < -90 || lat > 90) return { reason: `latitude ${lat} is outside -90 to 90` };
  if (lon < -180 || lon > 180) return { reason: `longitude ${lon} is outside -180 to 180` };

  const state = cols(line, 39, 40);
  if (!/^[A-Z]{2}$/.test(state)) return { reason: `bad state code "${state}"` };
  const name = cols(line, 42, 71).trim();
  if (name === "") return { reason: "station name is blank" };

  const gsn = cols(line, 73, 75);
  if (gsn !== "GSN" && gsn.trim() !== "")
    return { reason: `GSN flag "${gsn}" is not GSN or blank` };
  const hcnCrn = cols(line, 77, 79);
  if (hcnCrn !== "HCN" && hcnCrn !== "CRN" && hcnCrn.trim() !== "") {
    return { reason: `HCN/CRN flag "${hcnCrn}" is not HCN, CRN or blank` };
  }
  const wmo = cols(line, 81, 85).trim();
  if (wmo !== "" && !/^\d{5}$/.test(wmo)) return { reason: `WMO id "${wmo}" is not 5 digits` };

  return {
    row: {
      id,
      lat,
      lon,
      elevationM: elevation === MISSING_ELEVATION ? null : elevation,
      state,
      name,
      gsn: gsn === "GSN",
      hcnCrn: hcnCrn === "HCN" || hcnCrn === "CRN" ? hcnCrn : null,
      wmoId: wmo === "" ? null : wmo,
    },
  };
}

function parseLines<Row extends { id: string }>(
  text: string,
  parseLine: (line: string) => LineOutcome<Row>,
): ParseResult<Row> {
  const lines = linesOf(text);
  const rows: Row[] = [];
  const skipped: SkippedLine[] = [];
  const seen = new Set<string>();
  lines.forEach((line, i) => {
    const outcome = parseLine(line);
    if ("reason" in outcome) {
      skipped.push({ line: i + 1, reason: outcome.reason });
    } else if (seen.has(outcome.row.id)) {
      skipped.push({ line: i + 1, reason: `duplicate station id "${outcome.row.id}"` });
    } else {
      seen.add(outcome.row.id);
      rows.push(outcome.row);
    }
  });
  return { rows, read: lines.length, skipped };
}

export function parseTmaxNormals(text: string): ParseResult<TmaxNormalRow> {
  return parseLines(text, parseTmaxLine);
}

export function parseStationInventory(text: string): ParseResult<StationRow> {
  return parseLines(text, parseStationLine);
}

/** Stations that have both a July normal and an inventory entry; tenths of °F become °F. */
export function joinStationNormals(
  normals: readonly TmaxNormalRow[],
  stations: readonly StationRow[],
): ClimateStation[] {
  const byId = new Map(stations.map((s) => [s.id, s]));
  const joined: ClimateStation[] = [];
  for (const normal of normals) {
    const station = byId.get(normal.id);
    if (!station) continue;
    const jan = normal.months[0];
    joined.push({
      id: normal.id,
      name: station.name,
      state: station.state,
      lat: station.lat,
      lon: station.lon,
      janHighF: jan?.tenthsF == null ? null : jan.tenthsF / 10,
      janFlag: jan?.flag ?? null,
      julyHighF: normal.julyTenthsF / 10,
      julyFlag: normal.julyFlag,
    });
  }
  return joined;
}
