/**
 * `npm run climate:import [folder]`: loads the climate stations into the database. Without a folder
 * it loads the committed table (data/climate/normals-1981-2010.csv, as the start command does);
 * with a folder of raw NOAA files it parses and loads those (checking them against SOURCE.md).
 */
import { closeDb, getDb } from "@/db/client";
import { replaceClimateStations } from "@/lib/climate/commands";
import { readClimateTable } from "@/lib/climate/table-file";
import { checkRawFiles, loadRawStations } from "./climate/raw-noaa";

const folder = process.argv[2];
try {
  if (folder) {
    const bad = checkRawFiles(folder).filter((c) => !c.ok);
    if (bad.length > 0) throw new Error(`${bad.map((c) => c.file).join(", ")} do not match the checksums in SOURCE.md.`);
    const load = loadRawStations(folder);
    const n = await replaceClimateStations(await getDb(), load.stations);
    console.log(`Read ${load.normals.read} normals lines and ${load.inventory.read} station lines from ${folder}.`);
    console.log(`Loaded ${n} stations; skipped ${load.normals.skipped.length + load.inventory.skipped.length} lines.`);
  } else {
    const n = await replaceClimateStations(await getDb(), readClimateTable());
    console.log(`Loaded ${n} stations from the committed table data/climate/normals-1981-2010.csv.`);
  }
} catch (error) {
  console.error(`Climate import failed: ${(error as Error).message}`);
  process.exitCode = 1;
} finally {
  await closeDb();
}
