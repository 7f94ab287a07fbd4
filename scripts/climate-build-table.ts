/**
 * `npm run climate:build [folder]`: rebuilds the committed climate table from the raw NOAA files.
 * Verifies each raw file's sha256 against the folder's SOURCE.md (refuses on any mismatch), parses
 * them, and writes data/climate/normals-1981-2010.csv and data/climate/PROVENANCE.md.
 * The folder defaults to ../shared/data/noaa-normals-1981-2010 beside the repository.
 */
import { writeFileSync } from "node:fs";
import path from "node:path";
import { CLIMATE_DATA_CREDIT, formatClimateTable } from "@/lib/climate/table";
import { CLIMATE_TABLE_FILE } from "@/lib/climate/table-file";
import { checkRawFiles, DEFAULT_RAW_DIR, loadRawStations, rawFilesPresent, sha256Of } from "./climate/raw-noaa";

const folder = path.resolve(process.argv[2] ?? DEFAULT_RAW_DIR);
if (!rawFilesPresent(folder)) {
  console.error(`No raw NOAA files (mly-tmax-normal.txt, allstations.txt, SOURCE.md) in ${folder}.`);
  process.exit(1);
}
const checks = checkRawFiles(folder);
for (const c of checks) console.log(`${c.ok ? "ok " : "BAD"} ${c.file} sha256 ${c.actual}${c.ok ? "" : ` (SOURCE.md lists ${c.expected ?? "nothing"})`}`);
if (checks.some((c) => !c.ok)) {
  console.error("A raw file does not match its checksum in SOURCE.md; the table was not rebuilt.");
  process.exit(1);
}
const load = loadRawStations(folder);
const skipped = load.normals.skipped.length + load.inventory.skipped.length;
const table = formatClimateTable(load.stations);
writeFileSync(CLIMATE_TABLE_FILE, table);
const tableSha = sha256Of(CLIMATE_TABLE_FILE);
const provenance = `# Climate normals table: provenance

\`normals-1981-2010.csv\` is derived, by \`npm run climate:build\` (scripts/climate-build-table.ts), from two
unmodified files of the NOAA NCEI U.S. Climate Normals 1981–2010:

| raw file | NOAA path | sha256 (checked against the raw folder's SOURCE.md before building) |
|---|---|---|
${checks.map((c) => `| \`${c.file}\` | ${c.file === "mly-tmax-normal.txt" ? "products/temperature/mly-tmax-normal.txt" : "station-inventories/allstations.txt"} | ${c.actual} |`).join("\n")}

- Agency: NOAA National Centers for Environmental Information (formerly the National Climatic Data Center).
- License: a work of the U.S. Government, public domain in the United States.
- Credit line, wherever values are shown: "${CLIMATE_DATA_CREDIT}".
- Lines read: ${load.normals.read} normals, ${load.inventory.read} inventory; skipped ${skipped}; stations written: ${load.stations.length}.
- Table sha256: ${tableSha}

## Columns
\`id\` GHCN-Daily station id · \`name\` · \`state\` · \`lat\`, \`lon\` decimal degrees as in the inventory ·
\`jan_tenths_f\`, \`jul_tenths_f\` the January and July normal daily maximum temperature in tenths of °F, as NOAA
publishes them (January empty where the file has a "no value" code) · \`jan_flag\`, \`jul_flag\` the completeness flag
(C complete, S standard, R representative, P provisional, Q quasi-normal).

The store keys its band to the warmest month: July north of the equator, January south of it. The coolest month
(the other one) tells the install guide where winters stay mild.

## Rebuild
\`npm run climate:build [folder]\` (the folder defaults to \`../shared/data/noaa-normals-1981-2010\`). The start command
loads this table into the database when its climate table is empty or differs; \`tests/unit/climate/table.test.ts\`
checks the committed table against the raw files when they are present.
`;
writeFileSync(path.join(path.dirname(CLIMATE_TABLE_FILE), "PROVENANCE.md"), provenance);
console.log(`Wrote ${load.stations.length} stations to data/climate/normals-1981-2010.csv (${Buffer.byteLength(table)} bytes, sha256 ${tableSha}).`);
