import { closeDb, getDb } from "@/db/client";
import { seedDemo } from "@/lib/demo/commands";

// `npm run db:seed`: safe to run again; existing rows are left alone.
const db = await getDb();
await seedDemo(db);
await closeDb();
console.log("Demo data is in place.");
