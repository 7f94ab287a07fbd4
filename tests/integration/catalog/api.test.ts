import { beforeAll, describe, expect, it, vi } from "vitest";
import { getDb } from "@/db/client";
import { seedDemo } from "@/lib/demo/commands";
import { loadClimateTableIfNeeded } from "@/lib/climate/commands";
import { resetDb } from "../../support/db";

vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => null }));

const { GET: housesGet } = await import("@/app/api/houses/route");
const { GET: houseGet } = await import("@/app/api/houses/[slug]/route");
const { GET: climateGet } = await import("@/app/api/climate/route");
const { POST: designCheckPost } = await import("@/app/api/design-check/route");

// Any route handler, whatever its params' shape: the test passes the params it needs.
type Handler = (r: Request, c: { params: Promise<never> }) => Promise<Response>;
const call = (handler: Handler, url: string, params: Record<string, string> = {}, init?: RequestInit) =>
  handler(new Request(`http://localhost${url}`, init), { params: Promise.resolve(params) as Promise<never> });

beforeAll(async () => {
  const db = await resetDb();
  await seedDemo(db);
  await loadClimateTableIfNeeded(await getDb());
  (globalThis as { __roostwrightStations?: unknown }).__roostwrightStations = undefined;
}, 120_000);

describe("GET /api/houses", () => {
  it("lists only published models, with a fit label when a band is given", async () => {
    const res = await call(housesGet, "/api/houses?band=very-hot");
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.total).toBe(10);
    expect(body.items.map((i: { slug: string }) => i.slug)).not.toContain("wide-gap-prototype");
    const saltbush = body.items.find((i: { slug: string }) => i.slug === "saltbush-white");
    expect(saltbush.fit.label).toBe("good");
    // Best fits come first.
    expect(body.items[0].fit.label).toBe("good");
    const northwind = body.items.find((i: { slug: string }) => i.slug === "northwind-six");
    expect(northwind.fit.label).toBe("poor");
  });

  it("filters by chambers, mount, price and stock", async () => {
    const body = await (await call(housesGet, "/api/houses?chambers=6&mount=pole&maxPriceCents=25000&inStock=true")).json();
    expect(body.items.map((i: { slug: string }) => i.slug).sort()).toEqual(["backwoods-pair", "northwind-six"]);
  });

  it("answers bad filters with 400 and the field", async () => {
    for (const [q, field] of [
      ["band=scorching", "band"],
      ["chambers=two", "chambers"],
      ["mount=roof", "mount"],
      ["maxPriceCents=-1", "maxPriceCents"],
      ["inStock=maybe", "inStock"],
    ]) {
      const res = await call(housesGet, `/api/houses?${q}`);
      expect(res.status, q).toBe(400);
      expect(Object.keys((await res.json()).error.fields)).toContain(field);
    }
  });
});

describe("GET /api/houses/[slug]", () => {
  it("returns the spec, the criteria results and the fit", async () => {
    const body = await (await call(houseGet, "/api/houses/hollow-four?band=cool", { slug: "hollow-four" })).json();
    expect(body.spec.chamberCount).toBe(4);
    expect(body.check).toHaveLength(11);
    expect(body.certified).toBe(true);
    expect(body.fit.label).toBe("good");
  });
  it("hides drafts and unknown slugs behind 404", async () => {
    expect((await call(houseGet, "/api/houses/wide-gap-prototype", { slug: "wide-gap-prototype" })).status).toBe(404);
    expect((await call(houseGet, "/api/houses/nope", { slug: "nope" })).status).toBe(404);
  });
});

describe("GET /api/climate", () => {
  it("a ZIP gives the band with the three stations used", async () => {
    const body = await (await call(climateGet, "/api/climate?zip=98101")).json();
    expect(body.band).toMatchObject({ id: "cool", ventsNeeded: false });
    expect(body.stations).toHaveLength(3);
    expect(body.stations[0]).toEqual(expect.objectContaining({ id: expect.any(String), distanceMi: expect.any(Number), flag: expect.any(String) }));
  });
  it("takes °F and °C and marks a reading near a band edge", async () => {
    expect((await (await call(climateGet, "/api/climate?julyHighF=95")).json()).band.id).toBe("hot");
    expect((await (await call(climateGet, "/api/climate?julyHighF=94.9")).json()).band.id).toBe("warm");
    const c = await (await call(climateGet, "/api/climate?julyHighC=37.8")).json();
    expect(c.band.id).toBe("very-hot");
    expect(c.nearEdge.edgeF).toBe(100);
  });
  it("refuses malformed and unknown ZIPs, and asking for two things at once", async () => {
    for (const q of ["zip=123", "zip=00000", "zip=98101&julyHighF=80", "julyHighF=hot"]) {
      const res = await call(climateGet, `/api/climate?${q}`);
      expect(res.status, q).toBe(400);
      expect((await res.json()).error.message.length).toBeGreaterThan(10);
    }
  });
});

describe("POST /api/design-check", () => {
  const spec = {
    chamberCount: 3, chamberGapIn: 1.5, chamberHeightIn: 22, chamberWidthIn: 15, landingAreaIn: 4,
    interiorSurface: "grooved", grooveSpacingIn: 0.375, grooveDepthIn: 0.0625, interiorFinish: "stained",
    seamsSealed: true, wood: "exterior-plywood", outerHeightIn: 27, outerWidthIn: 18, openBottom: true, exteriorShade: "dark", vented: true,
  };
  it("checks anyone's house and says it may not be published when a required criterion fails", async () => {
    const res = await call(designCheckPost, "/api/design-check", {}, { method: "POST", body: JSON.stringify(spec) });
    const body = await res.json();
    expect(body.publishable).toBe(false);
    expect(body.results.find((r: { id: string }) => r.id === "D1").status).toBe("fail");
  });
  it("refuses a spec with a missing or wrong field", async () => {
    const res = await call(designCheckPost, "/api/design-check", {}, { method: "POST", body: JSON.stringify({ ...spec, chamberGapIn: "wide" }) });
    expect(res.status).toBe(400);
    expect(Object.keys((await res.json()).error.fields)).toContain("chamberGapIn");
  });
});
