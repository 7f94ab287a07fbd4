import { closeDb, getDb } from "./client";

// `npm run db:migrate`: opening the database applies every pending migration.
await getDb();
await closeDb();
console.log("Database is up to date.");
