import { closeDb, getDb } from "./client";
import { seedDemo } from "./seed";

// `npm run db:seed`: safe to run again; existing rows are left alone.
const db = await getDb();
await seedDemo(db);
await closeDb();
console.log("Demo data is in place.");
