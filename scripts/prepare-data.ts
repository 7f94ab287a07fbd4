/**
 * The database half of the start command, run by scripts/start.ts in a process of its own with
 * `--conditions=react-server` (the data modules it calls are server-only): migrates, loads the demo
 * scenario into an empty database, loads the committed climate table (data/climate/) when the
 * database does not hold it yet, and
 * closes the embedded database again so the Next.js server can open it.
 */
import { closeDb, getDb } from "@/db/client";
import { loadClimateTableIfNeeded } from "@/lib/climate/commands";
import { seedDemo, seedDemoReportQuestion } from "@/lib/demo/commands";
import { isEmpty } from "@/lib/demo/queries";

const db = await getDb();
if (await isEmpty(db)) {
  console.log("• Loading the demo scenario…");
  await seedDemo(db);
  await seedDemoReportQuestion(db);
}
const climate = await loadClimateTableIfNeeded(db);
if (!climate.skipped) console.log(`• Loaded ${climate.loaded} climate stations from data/climate (${Math.round(climate.ms)} ms).`);
await closeDb();
