import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { bandForJulyHigh, nearBandEdge } from "@/lib/catalog/climate-bands";
import { formatClimateTable } from "@/lib/climate/table";
import { CLIMATE_TABLE_FILE, readClimateTable } from "@/lib/climate/table-file";
import {
  checkRawFiles,
  DEFAULT_RAW_DIR as NOAA_FOLDER,
  loadRawStations,
  rawFilesPresent,
  readSourceChecksums,
  STATIONS_FILE,
  TMAX_FILE,
} from "@/scripts/climate/raw-noaa";
import { stationLine, tmaxLine } from "./noaa-lines";

// The official files of NOAA NCEI U.S. Climate Normals 1981–2010, read back through the parsers,
// and the committed table (data/climate/) checked against them. The raw files live beside the
// repository, not in it: a clone without them skips this file (the committed table is then checked
// by table.test.ts alone). Expected figures are those listed in the raw folder's SOURCE.md.

const present = rawFilesPresent(NOAA_FOLDER);
if (!present) console.warn(`raw-files.test.ts skipped: no raw NOAA files in ${NOAA_FOLDER} (they are not part of a clone).`);
const load = present ? loadRawStations(NOAA_FOLDER) : { stations: [], normals: { rows: [], read: 0, skipped: [] }, inventory: { rows: [], read: 0, skipped: [] } };
const rawLine = (file: string, id: string) =>
  readFileSync(join(NOAA_FOLDER, file), "utf8")
    .split("\n")
    .find((l) => l.startsWith(id));

describe.skipIf(!present)("the official NOAA files (skipped when ../shared is absent)", () => {
  it("are the unmodified copies SOURCE.md lists (sha256)", () => {
    const listed = readSourceChecksums(NOAA_FOLDER);
    expect(listed.get(TMAX_FILE)).toBe("c5e0e33634bbe5f6d43372fd2dd4a1df3c3fb697bef388e4d641a7942726933a");
    expect(listed.get(STATIONS_FILE)).toBe("40004b61a3a2b51d8e767b1a5d61eceaa7560c60f01bc4457694dd03c2d7ada8");
    const checks = checkRawFiles(NOAA_FOLDER);
    expect(checks.map((c) => [c.file, c.ok])).toEqual([
      [TMAX_FILE, true],
      [STATIONS_FILE, true],
    ]);
  });

  it("rebuild exactly the committed table, byte for byte (run `npm run climate:build` if this fails)", () => {
    expect(formatClimateTable(load.stations)).toBe(readFileSync(CLIMATE_TABLE_FILE, "utf8"));
    // And the parsed table holds the same values as the raw files, station by station.
    expect(readClimateTable()).toEqual(load.stations);
  });

  it("list in the provenance file the checksums the table was built from", () => {
    const provenance = readFileSync(join(CLIMATE_TABLE_FILE, "..", "PROVENANCE.md"), "utf8");
    for (const c of checkRawFiles(NOAA_FOLDER)) {
      expect(provenance).toContain(`| \`${c.file}\` |`);
      expect(provenance).toContain(c.actual);
    }
    expect(provenance).toContain("NOAA NCEI, U.S. Climate Normals 1981–2010");
  });

  it("parse without a single skipped line, in the counts SOURCE.md gives", () => {
    expect(load.normals).toMatchObject({ read: 7501, skipped: [] });
    expect(load.normals.rows).toHaveLength(7501);
    expect(load.inventory).toMatchObject({ read: 9887, skipped: [] });
    // 7,500 U.S. stations with a July value, plus one Canadian station.
    expect(load.stations).toHaveLength(7501);
    expect(load.stations.filter((s) => s.id.startsWith("CA"))).toHaveLength(1);
  });

  it.each([
    ["USW00023183", "PHOENIX SKY HARBOR", "AZ", 106.1, "very-hot"],
    ["USW00024233", "SEATTLE TACOMA", "WA", 75.8, "cool"],
    ["USW00014821", "COLUMBUS PORT COLUMBUS", "OH", 84.9, "cool"],
    ["USW00012839", "MIAMI INTL", "FL", 90.9, "warm"],
    ["USW00094728", "NEW YORK CNTRL PK", "NY", 84.1, "cool"],
    ["USW00012960", "HOUSTON INTERCONT", "TX", 93.7, "warm"],
  ] as const)("%s (%s %s) has a July normal high of %s °F", (id, name, state, julyHighF, band) => {
    const station = load.stations.find((s) => s.id === id);
    expect(station?.name).toContain(name);
    expect(station?.state).toBe(state);
    expect(station?.julyHighF).toBe(julyHighF);
    expect(bandForJulyHigh(julyHighF).id).toBe(band);
  });

  it("flags Columbus (84.9 °F) and Central Park (84.1 °F) as near the 85 °F edge", () => {
    expect(nearBandEdge(84.9)?.edgeF).toBe(85);
    expect(nearBandEdge(84.1)?.edgeF).toBe(85);
  });

  it("matches the line builders the parser tests use, byte for byte", () => {
    const row = load.normals.rows.find((r) => r.id === "USW00023183");
    const tenths = row?.months.map((m) => m.tenthsF ?? 0) ?? [];
    const flags = row?.months.map((m) => m.flag ?? " ") ?? [];
    expect(tmaxLine("USW00023183", tenths, flags)).toBe(rawLine(TMAX_FILE, "USW00023183"));
    expect(
      stationLine({
        id: "USW00023183",
        lat: 33.4278,
        lon: -112.0039,
        elevationM: 337.4,
        state: "AZ",
        name: "PHOENIX SKY HARBOR INTL AP",
        gsn: "GSN",
        wmo: "72278",
      }),
    ).toBe(rawLine(STATIONS_FILE, "USW00023183"));
  });

  it("runs from the far north of Alaska to Death Valley", () => {
    const byHeat = [...load.stations].sort((a, b) => a.julyHighF - b.julyHighF);
    // Death Valley is the hottest place in the U.S. normals; the far north of Alaska the coolest.
    expect(byHeat.at(-1)).toMatchObject({ name: "DEATH VALLEY", state: "CA", julyHighF: 116.5 });
    expect(byHeat[0]?.state).toBe("AK");
    expect(byHeat[0]?.julyHighF).toBeGreaterThan(40);
    expect(load.stations.every((s) => Math.abs(s.lat) <= 90 && Math.abs(s.lon) <= 180)).toBe(true);
  });
});
