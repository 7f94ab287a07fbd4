import { NORMAL_FLAGS, type ClimateStation, type NormalFlag } from "./noaa";

// The compact climate table the store ships (data/climate/normals-1981-2010.csv): one line per
// station, derived from the raw NOAA NCEI U.S. Climate Normals 1981–2010 files by
// scripts/climate-build-table.ts. Temperatures are kept in tenths of °F as whole numbers, exactly
// as NOAA publishes them, so the table round-trips without any floating-point drift.
// Pure: no file access here (lib/climate/table-file.ts reads the committed file).

export const CLIMATE_TABLE_HEADER = "id,name,state,lat,lon,jan_tenths_f,jan_flag,jul_tenths_f,jul_flag";
export const CLIMATE_DATA_CREDIT = "NOAA NCEI, U.S. Climate Normals 1981–2010";

const tenths = (f: number) => Math.round(f * 10);

/** The table's text: header, then one line per station in the order given, "\n" line ends. */
export function formatClimateTable(stations: readonly ClimateStation[]): string {
  const lines = stations.map((s) => {
    if (/[,"\n]/.test(s.name)) throw new RangeError(`Station ${s.id} has a comma or quote in its name.`);
    return [
      s.id,
      s.name,
      s.state,
      String(s.lat),
      String(s.lon),
      s.janHighF === null ? "" : String(tenths(s.janHighF)),
      s.janFlag ?? "",
      String(tenths(s.julyHighF)),
      s.julyFlag,
    ].join(",");
  });
  return `${CLIMATE_TABLE_HEADER}\n${lines.join("\n")}\n`;
}

function flagOf(raw: string, line: number): NormalFlag {
  if (!(NORMAL_FLAGS as readonly string[]).includes(raw)) {
    throw new RangeError(`Climate table line ${line}: flag "${raw}" is not one of ${NORMAL_FLAGS.join(", ")}.`);
  }
  return raw as NormalFlag;
}

function numberOf(raw: string, what: string, line: number): number {
  const n = Number(raw);
  if (raw.trim() === "" || !Number.isFinite(n)) throw new RangeError(`Climate table line ${line}: ${what} "${raw}" is not a number.`);
  return n;
}

/** Parses the table back; any malformed line throws (the committed table is all or nothing). */
export function parseClimateTable(text: string): ClimateStation[] {
  const lines = text.split("\n");
  if (lines.at(-1) === "") lines.pop();
  if (lines[0] !== CLIMATE_TABLE_HEADER) throw new RangeError("The climate table's header is not the expected one.");
  return lines.slice(1).map((text, i): ClimateStation => {
    const line = i + 2;
    const cells = text.split(",");
    if (cells.length !== 9) throw new RangeError(`Climate table line ${line}: ${cells.length} fields, expected 9.`);
    const [id = "", name = "", state = "", lat = "", lon = "", jan = "", janFlag = "", jul = "", julFlag = ""] = cells;
    const latitude = numberOf(lat, "latitude", line);
    const longitude = numberOf(lon, "longitude", line);
    if (Math.abs(latitude) > 90 || Math.abs(longitude) > 180) throw new RangeError(`Climate table line ${line}: not a latitude/longitude.`);
    return {
      id,
      name,
      state,
      lat: latitude,
      lon: longitude,
      janHighF: jan === "" ? null : numberOf(jan, "January", line) / 10,
      janFlag: jan === "" ? null : flagOf(janFlag, line),
      julyHighF: numberOf(jul, "July", line) / 10,
      julyFlag: flagOf(julFlag, line),
    };
  });
}
