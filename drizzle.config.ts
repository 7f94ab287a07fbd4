import { defineConfig } from "drizzle-kit";

// Migrations are generated from db/schema.ts and committed; they run on PGlite and on a PostgreSQL server alike.
export default defineConfig({
  dialect: "postgresql",
  schema: "./db/schema.ts",
  out: "./db/migrations",
  strict: true,
});
