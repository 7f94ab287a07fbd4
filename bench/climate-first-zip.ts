// How long a fresh start takes to answer its first ZIP: a new on-disk embedded database is
// migrated, the committed climate table is loaded (as scripts/prepare-data.ts does), then the
// station index is built and ZIP 43215 looked up (as the first /api/climate request does). A
// second load shows the idempotent no-op. Baseline in the same run, where the raw NOAA files are
// present: parsing them (the old import read them at every fresh start).
// Run: npx tsx --conditions=react-server bench/climate-first-zip.ts
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";

const dir = mkdtempSync(path.join(tmpdir(), "rw-bench-climate-"));
process.env.DATA_DIR = path.join(dir, "data");
delete process.env.DATABASE_URL;

const ms = (n: number) => `${n.toFixed(0)} ms`;
const t0 = performance.now();
const { getDb, closeDb } = await import("@/db/client");
const db = await getDb();
const tMigrated = performance.now();
const { loadClimateTableIfNeeded } = await import("@/lib/climate/commands");
const { readClimateTable } = await import("@/lib/climate/table-file");
const tRead0 = performance.now();
const stations = readClimateTable();
const tRead = performance.now();
const load = await loadClimateTableIfNeeded(db, stations);
const tLoaded = performance.now();
const again = await loadClimateTableIfNeeded(db, stations);
const tAgain = performance.now();
const { lookupClimate } = await import("@/lib/climate/queries");
const first = await lookupClimate({ zip: "43215" });
const tFirst = performance.now();
const second = await lookupClimate({ zip: "43215" });
const tSecond = performance.now();

console.log(`fresh embedded database opened and migrated: ${ms(tMigrated - t0)}`);
console.log(`read + parse the committed table (${stations.length} stations): ${ms(tRead - tRead0)}`);
console.log(`load into the empty database (batches of 1000): ${ms(tLoaded - tRead)} (${load.loaded} rows)`);
console.log(`second load (idempotent, skipped=${again.skipped}): ${ms(tAgain - tLoaded)}`);
console.log(`first ZIP 43215 (build the station index from the database + lookup): ${ms(tFirst - tAgain)}`);
console.log(`next ZIP lookup: ${(tSecond - tFirst).toFixed(2)} ms`);
if (first.ok) {
  console.log(`  → ${first.climate.band.label}, ${first.climate.display.text}, stations: ${first.climate.stations.map((s) => `${s.name} ${s.distanceMi.toFixed(1)} mi`).join("; ")}`);
} else console.log(`  → failed: ${first.message}`);
void second;
console.log(`FRESH START TO FIRST ZIP (database part): ${ms(tFirst - t0)} (table read + load + first lookup: ${ms(tFirst - tRead0 - (tAgain - tLoaded))})`);

try {
  const raw = await import("../scripts/climate/raw-noaa");
  if (raw.rawFilesPresent()) {
    const b0 = performance.now();
    raw.loadRawStations(raw.DEFAULT_RAW_DIR);
    const b1 = performance.now();
    console.log(`baseline, parse the raw NOAA files instead of the table: ${ms(b1 - b0)} (table read is ${((b1 - b0) / (tRead - tRead0)).toFixed(1)}× faster)`);
  } else console.log("baseline skipped: no raw NOAA files beside the repository");
} finally {
  await closeDb();
  rmSync(dir, { recursive: true, force: true });
}
