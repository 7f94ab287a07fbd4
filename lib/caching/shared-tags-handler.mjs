// @ts-check
/**
 * The "use cache" handler (next.config.mjs `cacheHandlers.default`): the framework's own in-memory
 * handler, plus one thing it lacks when several app instances share one PostgreSQL server — an
 * invalidation made on one instance reaches the others.
 *
 * Every `updateTag`/`revalidateTag` an instance makes is written as one row of `cache_tag_events`
 * (db/schema.ts). Before a request's first cache read the framework calls `refreshTags()`; at most
 * once per CACHE_TAG_SYNC_MS (500 ms) an instance reads the rows written since its last look and
 * expires the same tags in its own memory, so a staff change shows on every instance within about
 * half a second of the next request.
 *
 * Why a table and not LISTEN/NOTIFY: a notification sent while an instance is reconnecting is lost
 * for good, LISTEN needs one connection held open per instance (which a transaction-mode pooler
 * cannot give), and the table is read with one indexed query per half second per instance. Why
 * not a maintained handler from the registry: those keep the cached entries themselves in a shared
 * store (Redis and the like), a service this store does not run; the entries here are small and
 * cheap to rebuild, only the signal has to be shared.
 *
 * On the embedded database (one process, nothing to share), during `next build`, and with
 * CACHE_TAG_SYNC=off (the control in tests/multi-instance) this is exactly the framework's handler.
 *
 * Plain JavaScript because the framework imports this file at run time, outside the bundle. It
 * is infrastructure, like db/migrations: the one place outside the data layer that speaks SQL.
 */
import { randomUUID } from "node:crypto";
import { createDefaultCacheHandler } from "next/dist/server/lib/cache-handlers/default.js";
import pg from "pg";

// The framework's default size for its in-memory "use cache" store.
const MAX_BYTES = 50 * 1024 * 1024;
// Rows are kept a little longer than the longest cache lifetime (`expire` in lib/catalog/cached.ts).
const KEEP_SECONDS = 3600 + 300;
// Rows written up to this long before an instance's last look are read again: an insert that
// committed late (its id and time taken before a row that committed first) is not missed.
const OVERLAP_SECONDS = 5;

const url = process.env.DATABASE_URL ?? "";
const enabled =
  /^postgres(ql)?:\/\//.test(url) && process.env.CACHE_TAG_SYNC !== "off" && process.env.NEXT_PHASE !== "phase-production-build";
const pollMs = Math.max(50, Number(process.env.CACHE_TAG_SYNC_MS) || 500);

const inner = createDefaultCacheHandler(MAX_BYTES);
const instance = randomUUID();

/** @type {pg.Pool | undefined} */
let pool;
/** The database's clock at the last successful look; null until the first. */
let since = /** @type {string | null} */ (null);
let lastLook = 0;
/** @type {Promise<void> | null} */
let looking = null;
/** Ids already applied, with the time they were seen, so the overlap applies nothing twice. */
const applied = new Map();
let warned = false;

function db() {
  if (!pool) {
    pool = new pg.Pool({ connectionString: url, max: 2, idleTimeoutMillis: 10_000, allowExitOnIdle: true });
    pool.on("error", (error) => warn("idle connection", error));
  }
  return pool;
}

/** @param {string} what @param {unknown} error */
function warn(what, error) {
  // Once per failure streak: a database that is away shows in the health route, not in every request.
  if (warned) return;
  warned = true;
  console.warn(`[cache] shared tags: ${what} failed; this instance serves from its own cache until the database answers.`, error instanceof Error ? error.message : error);
}

async function look() {
  const { rows } = await db().query(
    `select now() as at,
            coalesce(json_agg(json_build_object('id', e.id, 'tags', e.tags, 'expire', e.expire_seconds, 'instance', e.instance) order by e.id)
              filter (where e.id is not null), '[]') as events
       from (select 1) one
       left join cache_tag_events e
         on $1::timestamptz is not null and e.created_at > $1::timestamptz - make_interval(secs => $2)`,
    [since, OVERLAP_SECONDS],
  );
  const { at, events } = rows[0];
  for (const event of /** @type {{ id: number, tags: string[], expire: number | null, instance: string }[]} */ (events)) {
    if (applied.has(event.id)) continue;
    applied.set(event.id, Date.now());
    if (event.instance === instance) continue;
    await inner.updateTags(event.tags, event.expire === null ? undefined : { expire: event.expire });
  }
  const forgetBefore = Date.now() - (OVERLAP_SECONDS + 60) * 1000;
  for (const [id, seenAt] of applied) if (seenAt < forgetBefore) applied.delete(id);
  since = at instanceof Date ? at.toISOString() : String(at);
  warned = false;
}

/** @type {import("next/dist/server/lib/cache-handlers/types").CacheHandler} */
const handler = {
  get: (cacheKey, softTags) => inner.get(cacheKey, softTags),
  set: (cacheKey, pendingEntry) => inner.set(cacheKey, pendingEntry),
  getExpiration: (tags) => inner.getExpiration(tags),

  async refreshTags() {
    await inner.refreshTags();
    if (!enabled) return;
    if (!looking && Date.now() - lastLook >= pollMs) {
      lastLook = Date.now();
      looking = look()
        .catch((error) => warn("reading invalidations", error))
        .finally(() => {
          looking = null;
        });
    }
    if (looking) await looking;
  },

  async updateTags(tags, durations) {
    await inner.updateTags(tags, durations);
    if (!enabled || tags.length === 0) return;
    const expire = durations?.expire === undefined ? null : Math.min(Math.max(0, Math.ceil(durations.expire)), 2_147_483_647);
    try {
      await db().query("insert into cache_tag_events (tags, expire_seconds, instance) values ($1, $2, $3)", [tags, expire, instance]);
      if (Math.random() < 0.02) {
        await db().query("delete from cache_tag_events where created_at < now() - make_interval(secs => $1)", [KEEP_SECONDS]);
      }
    } catch (error) {
      warn("sharing an invalidation", error);
    }
  },
};

export default handler;
