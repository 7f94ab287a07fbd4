import { mkdirSync } from "node:fs";
import path from "node:path";
import type { PgDatabase, PgQueryResultHKT } from "drizzle-orm/pg-core";
import { acquireDataDirLock } from "./lock";
import { databaseSettings } from "./settings";
import * as schema from "./schema";

export type Db = PgDatabase<PgQueryResultHKT, typeof schema>;
/** A transaction handle; inside a transaction callback use it, never the outer db (PGlite would deadlock). */
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
export type DbOrTx = Db | Tx;

type Handle = { db: Db; close: () => Promise<void>; kind: "pglite" | "postgres" };

// One instance per process, kept on globalThis so hot reloads reuse it instead of opening another.
const globalForDb = globalThis as unknown as { __roostwrightDb?: Promise<Handle> };

export const migrationsFolder = path.join(process.cwd(), "db", "migrations");

async function openPglite(dataDir: string | null): Promise<Handle> {
  const { PGlite } = await import("@electric-sql/pglite");
  const { drizzle } = await import("drizzle-orm/pglite");
  const { migrate } = await import("drizzle-orm/pglite/migrator");
  let release = () => {};
  let client;
  if (dataDir) {
    const absolute = path.resolve(dataDir);
    mkdirSync(path.dirname(absolute), { recursive: true });
    release = acquireDataDirLock(absolute);
    try {
      mkdirSync(absolute, { recursive: true });
      client = await PGlite.create({ dataDir: absolute });
    } catch (error) {
      release();
      throw error;
    }
  } else {
    client = await PGlite.create();
  }
  const db = drizzle({ client, schema, casing: undefined });
  await migrate(db, { migrationsFolder });
  return {
    db: db as unknown as Db,
    kind: "pglite",
    close: async () => {
      await client.close();
      release();
    },
  };
}

async function openPostgres(url: string): Promise<Handle> {
  const { Pool } = await import("pg");
  const { drizzle } = await import("drizzle-orm/node-postgres");
  const { migrate } = await import("drizzle-orm/node-postgres/migrator");
  const pool = new Pool({ connectionString: url, max: 10 });
  const db = drizzle({ client: pool, schema });
  if (process.env.MIGRATE_ON_START !== "false") await migrate(db, { migrationsFolder });
  return { db: db as unknown as Db, kind: "postgres", close: () => pool.end() };
}

function open(): Promise<Handle> {
  if (process.env.NEXT_PHASE === "phase-production-build") {
    throw new Error("The database must not be opened during `next build`: make the page dynamic (await connection()).");
  }
  const settings = databaseSettings();
  const url = settings.DATABASE_URL;
  if (url?.startsWith("memory://")) return openPglite(null);
  if (url) return openPostgres(url);
  return openPglite(settings.DATA_DIR);
}

/** The process's database, opened and migrated on first use. */
export async function getDb(): Promise<Db> {
  if (!globalForDb.__roostwrightDb) {
    globalForDb.__roostwrightDb = open();
    globalForDb.__roostwrightDb.catch(() => {
      globalForDb.__roostwrightDb = undefined;
    });
    installShutdown();
  }
  return (await globalForDb.__roostwrightDb).db;
}

export async function getDbKind(): Promise<Handle["kind"]> {
  await getDb();
  return (await globalForDb.__roostwrightDb!).kind;
}

const globalForClose = globalThis as unknown as {
  __roostwrightBeforeClose?: Set<() => Promise<void>>;
};

/**
 * Work that must end before the database closes (the background job runner stops here first, so
 * none of its queries reaches a closed PGlite). Returns a function that removes the hook.
 */
export function beforeCloseDb(hook: () => Promise<void>): () => void {
  const hooks = (globalForClose.__roostwrightBeforeClose ??= new Set());
  hooks.add(hook);
  return () => void hooks.delete(hook);
}

export async function closeDb(): Promise<void> {
  for (const hook of [...(globalForClose.__roostwrightBeforeClose ?? [])]) {
    await hook().catch((error: unknown) =>
      console.error("a shutdown step before closing the database failed", error),
    );
  }
  const pending = globalForDb.__roostwrightDb;
  globalForDb.__roostwrightDb = undefined;
  if (pending) await (await pending).close();
}

const globalForSignals = globalThis as unknown as { __roostwrightSignals?: boolean };

/** Close the embedded database on SIGTERM/SIGINT, else the next start runs crash recovery. */
export function installShutdown() {
  if (globalForSignals.__roostwrightSignals) return;
  globalForSignals.__roostwrightSignals = true;
  for (const signal of ["SIGTERM", "SIGINT"] as const) {
    process.once(signal, () => {
      closeDb()
        .catch((error) => console.error("closing the database failed", error))
        .finally(() => process.exit(0));
    });
  }
}
