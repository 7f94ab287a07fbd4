// Integration tests use one migrated database per worker: an in-memory PGlite by default,
// or the PostgreSQL server named by DATABASE_URL (CI runs the suite against both).
process.env.DATABASE_URL ??= "memory://";
process.env.ROOSTWRIGHT_MODE ??= "local";
