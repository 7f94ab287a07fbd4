import { count, isNull } from "drizzle-orm";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { getDb } from "@/db/client";
import { climateStations } from "@/db/schema";
import { loadClimateTableIfNeeded } from "@/lib/climate/commands";
import { readClimateTable } from "@/lib/climate/table-file";
import { resetDb } from "../../support/db";

vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => null }));
const { GET: climateGet } = await import("@/app/api/climate/route");

// The start command loads the committed table (data/climate/) into an empty database; nothing
// here reads the raw NOAA files, as a fresh clone has none.

const stationCount = async () => (await (await getDb()).select({ n: count() }).from(climateStations))[0]?.n ?? 0;
const forgetIndex = () => ((globalThis as { __roostwrightStations?: unknown }).__roostwrightStations = undefined);

beforeEach(async () => {
  await resetDb();
  await (await getDb()).delete(climateStations);
  forgetIndex();
});

describe("loading the committed climate table", () => {
  it("fills an empty database once; a second run is a no-op", async () => {
    const db = await getDb();
    const first = await loadClimateTableIfNeeded(db);
    expect(first).toMatchObject({ loaded: 7501, skipped: false });
    expect(await stationCount()).toBe(7501);
    const second = await loadClimateTableIfNeeded(db);
    expect(second).toMatchObject({ loaded: 0, skipped: true });
    expect(await stationCount()).toBe(7501);
  }, 60_000);

  it("brings a database filled by the older July-only import up to date", async () => {
    const db = await getDb();
    const old = readClimateTable().slice(0, 100).map((s) => ({ id: s.id, name: s.name, state: s.state, lat: s.lat, lon: s.lon, julyHighF: s.julyHighF, flag: s.julyFlag }));
    await db.insert(climateStations).values(old);
    const load = await loadClimateTableIfNeeded(db);
    expect(load.skipped).toBe(false);
    expect(await stationCount()).toBe(7501);
    const [withoutJan] = await db.select({ n: count() }).from(climateStations).where(isNull(climateStations.janHighF));
    expect(withoutJan?.n).toBe(0);
  }, 60_000);

  it("answers ZIP 43215 from the loaded table, naming its stations, and says so when nothing is loaded", async () => {
    const empty = await climateGet(new Request("http://localhost/api/climate?zip=43215"), { params: Promise.resolve({}) });
    expect(empty.status).toBe(503);
    await loadClimateTableIfNeeded(await getDb());
    forgetIndex();
    const res = await climateGet(new Request("http://localhost/api/climate?zip=43215"), { params: Promise.resolve({}) });
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.source).toMatchObject({ kind: "zip", zip: "43215" });
    expect(body.warmestMonth).toBe("july");
    expect(body.stations).toHaveLength(3);
    expect(body.stations.map((s: { name: string }) => s.name).join(" ")).toMatch(/COLUMBUS/);
    expect(body.credit).toBe("NOAA NCEI, U.S. Climate Normals 1981–2010");
  }, 60_000);
});
