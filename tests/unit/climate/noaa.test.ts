import { describe, expect, it } from "vitest";
import { joinStationNormals, parseStationInventory, parseTmaxNormals } from "@/lib/climate/noaa";
import { monthsWithJuly, stationLine, tmaxLine } from "./noaa-lines";

// Format: NOAA NCEI U.S. Climate Normals 1981–2010 readme (fixed-width columns, tenths of °F,
// special values -6666/-7777/-8888/-9999), as restated in the data folder's SOURCE.md.

describe("parseTmaxNormals", () => {
  const good = tmaxLine("USW00023183", monthsWithJuly(1061), "S");
  const lines = [
    good, // 1
    tmaxLine("USC00000001", monthsWithJuly(-5), "R"), // 2: a cold July still parses
    good.slice(0, 100), // 3: one column short
    tmaxLine("usw0002318x", monthsWithJuly(900)), // 4: lower-case id
    tmaxLine("USC00000002", monthsWithJuly(900)).replace(" 900C", " 9O0C"), // 5: letter O in July
    tmaxLine("USC00000003", monthsWithJuly(-9999)), // 6: July has no value
    tmaxLine("USC00000004", [-8888, ...monthsWithJuly(870).slice(1)]), // 7: January missing only
    tmaxLine("USC00000005", monthsWithJuly(870), "X"), // 8: unknown flag
    tmaxLine("USW00023183", monthsWithJuly(1000)), // 9: duplicate id
    "", // 10: blank line inside the file
    `${tmaxLine("USC00000006", monthsWithJuly(870)).slice(0, 31)}X${tmaxLine("USC00000006", monthsWithJuly(870)).slice(32)}`, // 11: separator column 32 used
    tmaxLine("USC00000007", monthsWithJuly(-6666)), // 12
    tmaxLine("USC00000008", monthsWithJuly(-7777)), // 13
    tmaxLine("USC00000009", monthsWithJuly(-8888)), // 14
  ];
  const result = parseTmaxNormals(`${lines.join("\r\n")}\r\n`);

  it("reads every line and keeps only the good ones", () => {
    expect(result.read).toBe(14);
    expect(result.rows.map((r) => [r.id, r.julyTenthsF, r.julyFlag])).toEqual([
      ["USW00023183", 1061, "S"],
      ["USC00000001", -5, "R"],
      ["USC00000004", 870, "C"],
    ]);
  });

  it("gives each bad line its number and reason", () => {
    expect(result.skipped).toEqual([
      { line: 3, reason: "wrong length: 100 characters, expected 101" },
      { line: 4, reason: 'bad station id "usw0002318x"' },
      { line: 5, reason: 'Jul value "9O0" is not a whole number' },
      { line: 6, reason: "July has no value (special code -9999)" },
      { line: 8, reason: 'Jan flag "X" is not one of C, S, R, P, Q' },
      { line: 9, reason: 'duplicate station id "USW00023183"' },
      { line: 10, reason: "wrong length: 0 characters, expected 101" },
      { line: 11, reason: "column 32 should be blank" },
      { line: 12, reason: "July has no value (special code -6666)" },
      { line: 13, reason: "July has no value (special code -7777)" },
      { line: 14, reason: "July has no value (special code -8888)" },
    ]);
  });

  it("keeps a special value outside July as a missing month", () => {
    const row = result.rows.find((r) => r.id === "USC00000004");
    expect(row?.months[0]).toEqual({ tenthsF: null, flag: null });
    expect(row?.months[6]).toEqual({ tenthsF: 870, flag: "C" });
    expect(row?.months).toHaveLength(12);
  });

  it("handles an empty file", () => {
    expect(parseTmaxNormals("")).toEqual({ rows: [], read: 0, skipped: [] });
  });
});

describe("parseStationInventory", () => {
  const phoenix = stationLine({
    id: "USW00023183",
    lat: 33.4278,
    lon: -112.0039,
    elevationM: 337.4,
    state: "AZ",
    name: "PHOENIX SKY HARBOR INTL AP",
    gsn: "GSN",
    wmo: "72278",
  });
  const lines = [
    phoenix, // 1
    stationLine({
      id: "USC00000001",
      lat: 61.2,
      lon: -149.9,
      elevationM: -999.9,
      state: "AK",
      name: "NO ELEVATION",
      hcnCrn: "HCN",
    }), // 2
    stationLine({ id: "USC00000002", lat: 40, lon: -100, state: "NE", name: "TRIMMED" }).trimEnd(), // 3: trailing blanks dropped
    stationLine({ id: "USC00000003", lat: 91, lon: -100, state: "NE", name: "TOO FAR NORTH" }), // 4
    stationLine({ id: "USC00000004", lat: 40, lon: -181, state: "NE", name: "TOO FAR WEST" }), // 5
    stationLine({ id: "USC00000005", lat: 40, lon: -100, state: "NE", name: "X" }).replace(
      "40.0000",
      "40.00N0",
    ), // 6
    `${phoenix} `, // 7: one column too many
    stationLine({ id: "US-00000006", lat: 40, lon: -100, state: "NE", name: "BAD ID" }), // 8
    stationLine({ id: "USC00000007", lat: 40, lon: -100, state: "ne", name: "LOWER STATE" }), // 9
    stationLine({
      id: "USC00000008",
      lat: 40,
      lon: -100,
      state: "NE",
      name: "BAD WMO",
      wmo: "7227",
    }), // 10
  ];
  const result = parseStationInventory(lines.join("\n"));

  it("parses coordinates, elevation, name and flags", () => {
    expect(result.rows[0]).toEqual({
      id: "USW00023183",
      lat: 33.4278,
      lon: -112.0039,
      elevationM: 337.4,
      state: "AZ",
      name: "PHOENIX SKY HARBOR INTL AP",
      gsn: true,
      hcnCrn: null,
      wmoId: "72278",
    });
    expect(result.rows[1]).toMatchObject({
      elevationM: null,
      hcnCrn: "HCN",
      gsn: false,
      wmoId: null,
    });
    expect(result.rows[2]).toMatchObject({ id: "USC00000002", name: "TRIMMED" });
    expect(result.read).toBe(10);
  });

  it("gives each bad line its number and reason", () => {
    expect(result.skipped).toEqual([
      { line: 4, reason: "latitude 91 is outside -90 to 90" },
      { line: 5, reason: "longitude -181 is outside -180 to 180" },
      { line: 6, reason: 'latitude "40.00N0" is not a number' },
      { line: 7, reason: "wrong length: 86 characters, expected 42–85" },
      { line: 8, reason: 'bad station id "US-00000006"' },
      { line: 9, reason: 'bad state code "ne"' },
      { line: 10, reason: 'WMO id "7227" is not 5 digits' },
    ]);
  });
});

describe("joinStationNormals", () => {
  it("joins on id, converts tenths to °F (January and July) and drops stations missing from either file", () => {
    const normals = parseTmaxNormals(
      [
        tmaxLine("USW00023183", monthsWithJuly(1061), "S"),
        tmaxLine("USC00000009", monthsWithJuly(758)),
      ].join("\n"),
    ).rows;
    const stations = parseStationInventory(
      [
        stationLine({
          id: "USW00023183",
          lat: 33.4278,
          lon: -112.0039,
          state: "AZ",
          name: "PHOENIX SKY HARBOR INTL AP",
        }),
        stationLine({ id: "USC00000010", lat: 40, lon: -100, state: "NE", name: "NO NORMALS" }),
      ].join("\n"),
    ).rows;
    expect(joinStationNormals(normals, stations)).toEqual([
      {
        id: "USW00023183",
        name: "PHOENIX SKY HARBOR INTL AP",
        state: "AZ",
        lat: 33.4278,
        lon: -112.0039,
        janHighF: 40,
        janFlag: "S",
        julyHighF: 106.1,
        julyFlag: "S",
      },
    ]);
  });
});
