import { createHash } from "node:crypto";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { formatClimateTable, parseClimateTable, CLIMATE_TABLE_HEADER } from "@/lib/climate/table";
import { CLIMATE_TABLE_FILE, readClimateTable } from "@/lib/climate/table-file";

// The committed climate table (data/climate/normals-1981-2010.csv), checked without the raw files:
// against its provenance (a hand edit changes its sha256) and against the station values that
// SOURCE.md of NOAA NCEI U.S. Climate Normals 1981–2010 lists. raw-files.test.ts checks it against
// the raw files themselves when they are present.

const stations = readClimateTable();
const byId = new Map(stations.map((s) => [s.id, s]));

describe("the committed climate table", () => {
  it("is the table its provenance file describes (sha256), with the credit line", () => {
    const text = readFileSync(CLIMATE_TABLE_FILE);
    const provenance = readFileSync(join(CLIMATE_TABLE_FILE, "..", "PROVENANCE.md"), "utf8");
    const sha = createHash("sha256").update(text).digest("hex");
    expect(provenance).toContain(`Table sha256: ${sha}`);
    expect(provenance).toContain('"NOAA NCEI, U.S. Climate Normals 1981–2010"');
    expect(provenance).toContain("npm run climate:build");
  });

  it("holds the 7,500 U.S. stations with a July value and the one Canadian station", () => {
    expect(stations).toHaveLength(7501);
    expect(stations.filter((s) => s.id.startsWith("CA"))).toHaveLength(1);
    // Every station of this copy has a January value too (some below 0 °F in Alaska).
    expect(stations.filter((s) => s.janHighF === null)).toHaveLength(0);
    expect(Math.min(...stations.map((s) => s.janHighF ?? 0))).toBeLessThan(0);
  });

  it.each([
    ["USW00023183", "AZ", 106.1],
    ["USW00024233", "WA", 75.8],
    ["USW00014821", "OH", 84.9],
    ["USW00012839", "FL", 90.9],
    ["USW00094728", "NY", 84.1],
    ["USW00012960", "TX", 93.7],
  ] as const)("gives %s (%s) the July normal SOURCE.md lists, %s °F", (id, state, julyHighF) => {
    expect(byId.get(id)).toMatchObject({ state, julyHighF });
  });

  it("keeps Pago Pago's January, its warmest month south of the equator (87.6 °F against 84.2 °F in July)", () => {
    expect(byId.get("AQW00061705")).toMatchObject({ lat: -14.3306, lon: -170.7136, janHighF: 87.6, julyHighF: 84.2 });
  });

  it("round-trips through format and parse, and refuses a damaged line", () => {
    const sample = stations.slice(0, 50);
    expect(parseClimateTable(formatClimateTable(sample))).toEqual(sample);
    expect(() => parseClimateTable(`${CLIMATE_TABLE_HEADER}\nUSW1,X,AZ,33,-112,400,C,10x1,C\n`)).toThrow(/July/);
    expect(() => parseClimateTable(`${CLIMATE_TABLE_HEADER}\nUSW1,X,AZ,33,-112,400,C,1061,Z\n`)).toThrow(/flag/);
    expect(() => parseClimateTable(`${CLIMATE_TABLE_HEADER}\nUSW1,X,AZ,95,-112,400,C,1061,C\n`)).toThrow(/latitude/);
    expect(() => parseClimateTable("id,name\n")).toThrow(/header/);
  });
});
