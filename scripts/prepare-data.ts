/**
 * The database half of the start command, run by scripts/start.ts in a process of its own with
 * `--conditions=react-server` (the data modules it calls are server-only): migrates, loads the demo
 * scenario into an empty database, imports the NOAA climate normals when they are missing, and
 * closes the embedded database again so the Next.js server can open it.
 */
import { closeDb, getDb } from "@/db/client";
import { importClimateIfEmpty } from "@/lib/catalog/climate-store";
import { env } from "@/lib/config/env";
import { seedDemo, seedDemoReportQuestion } from "@/lib/demo/commands";
import { isEmpty } from "@/lib/demo/queries";

const settings = env();
const db = await getDb();
if (await isEmpty(db)) {
  console.log("• Loading the demo scenario…");
  await seedDemo(db);
  await seedDemoReportQuestion(db);
}
const imported = await importClimateIfEmpty(db, settings.NOAA_DIR);
if (imported) console.log(`• Imported ${imported.stations} climate stations (${imported.skipped} lines skipped).`);
await closeDb();
