import "server-only";
import type { Pool, PoolClient } from "pg";
import { fromPglite, type PGliteLike } from "pg-boss";
import type { Db } from "@/db/client";

// The queue runs its SQL through the app's own database client, never a connection of its own:
// on PGlite that is the one connection of the process (a second opener would lose writes, trap 3),
// and on a PostgreSQL server it is the app's pool. pg-boss keeps its tables in its own schema
// ("pgboss"), created and migrated by pg-boss itself at start; they are not in db/schema.ts.

/** What pg-boss needs from a database: the IDatabase shape of its `db` option. */
export type QueueDatabase = {
  executeSql(text: string, values?: unknown[]): Promise<{ rows: unknown[] }>;
  setSessionStatements?(statements: string[]): Promise<void>;
};

/**
 * PGlite: pg-boss's own adapter. Every statement waits its turn on PGlite's single connection,
 * behind any app transaction that is open (measured: a pg-boss `BEGIN; …; COMMIT;` issued during
 * an app transaction ran after it, and saw none of its rows).
 */
function pgliteDatabase(client: PGliteLike): QueueDatabase {
  return fromPglite(client);
}

const sessionStatements = new WeakMap<Pool, string[]>();
const appliedTo = new WeakMap<PoolClient, string[]>();

/**
 * node-postgres: each statement on a pooled connection, as pool.query does (a failed statement
 * drops its connection). setSessionStatements exists only for pg-boss's TestClock (tests): from
 * then on a statement first applies them to its connection, once per connection.
 */
export function poolDatabase(pool: Pool): QueueDatabase {
  return {
    async executeSql(text, values) {
      const statements = sessionStatements.get(pool) ?? [];
      if (statements.length === 0) return pool.query(text, values);
      const client = await pool.connect();
      let failed = false;
      try {
        if (appliedTo.get(client) !== statements) {
          for (const statement of statements) await client.query(statement);
          appliedTo.set(client, statements);
        }
        return await client.query(text, values);
      } catch (error) {
        failed = true;
        throw error;
      } finally {
        client.release(failed);
      }
    },
    async setSessionStatements(statements) {
      sessionStatements.set(pool, statements);
    },
  };
}

export function queueDatabase(db: Db, kind: "pglite" | "postgres"): QueueDatabase {
  // Drizzle exposes the driver it was built on as `$client`.
  const client = (db as unknown as { $client: unknown }).$client;
  return kind === "pglite" ? pgliteDatabase(client as PGliteLike) : poolDatabase(client as Pool);
}
