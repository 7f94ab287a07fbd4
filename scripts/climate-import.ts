/** `npm run climate:import [folder]`: loads the NOAA July normals into the database and reports what it read. */
import { closeDb, getDb } from "@/db/client";
import { importClimate } from "@/lib/catalog/climate-store";
import { env } from "@/lib/config/env";

const folder = process.argv[2] ?? env().NOAA_DIR;
try {
  const report = await importClimate(await getDb(), folder);
  console.log(`Read ${report.normalsRead} normals lines and ${report.inventoryRead} station lines from ${folder}.`);
  console.log(`Imported ${report.stations} stations with a July normal; skipped ${report.skipped} lines.`);
  const byReason = new Map<string, number>();
  for (const r of report.reasons) byReason.set(`${r.file}: ${r.reason}`, (byReason.get(`${r.file}: ${r.reason}`) ?? 0) + 1);
  for (const [reason, n] of byReason) console.log(`  ${n} × ${reason}`);
} catch (error) {
  console.error(`Climate import failed: ${(error as Error).message}`);
  process.exitCode = 1;
} finally {
  await closeDb();
}
