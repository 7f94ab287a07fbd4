// The placement path through the one climate module (PRODUCT.md §2 and §4): band edges from a typed
// °F or °C value, the unrounded value behind the band, and the warmest month south of the equator
// (Pago Pago, American Samoa: January normal 87.6 °F at the airport, NOAA NCEI 1981–2010).
import { beforeAll, describe, expect, it, vi } from "vitest";
import { getDb } from "@/db/client";
import { POST as placementPost } from "@/app/api/placement/route";
import { jsonRequest, loadStations, noParams, siteInput } from "./helpers";

vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => null }));

const check = async (body: Record<string, unknown>) => {
  const res = await placementPost(jsonRequest("http://localhost/api/placement", siteInput(body)), noParams);
  return { status: res.status, body: await res.json() };
};

describe("POST /api/placement: the climate of the site", () => {
  beforeAll(async () => loadStations(await getDb()), 120_000);

  it.each([
    [{ julyHighF: 84.99 }, "cool", "84.9"],
    [{ julyHighF: 85 }, "warm", "85.0"],
    [{ julyHighF: 94.96 }, "warm", "94.9"],
    [{ julyHighF: 95 }, "hot", "95.0"],
    [{ julyHighF: 99.99 }, "hot", "99.9"],
    [{ julyHighF: 100 }, "very-hot", "100.0"],
    [{ julyHighC: 29.4 }, "cool", "84.9"],
    [{ julyHighC: 30 }, "warm", "86.0"],
    [{ julyHighC: 35 }, "hot", "95.0"],
    [{ julyHighC: 37.8 }, "very-hot", "100.0"],
  ])("%j → %s, shown as %s °F", async (typed, band, shown) => {
    const { status, body } = await check(typed);
    expect(status).toBe(200);
    expect(body.band.id).toBe(band);
    expect(body.climate.display.f).toBe(shown);
    expect(body.climate.source).toBe("typed");
  });

  it("refuses both units at once", async () => {
    const { status, body } = await check({ julyHighF: 86, julyHighC: 30 });
    expect(status).toBe(400);
    expect(body.error.fields.julyHighC).toMatch(/not both/);
  });

  it("keys a site at 14.33° S, 170.71° W to the January normal: about 88 °F, warm summers, vents needed", async () => {
    const { status, body } = await check({ zip: undefined, lat: -14.33, lon: -170.71 });
    expect(status).toBe(200);
    expect(body.location.hemisphere).toBe("south");
    expect(body.climate.warmestMonth).toBe("january");
    expect(body.climate.stations[0]).toMatchObject({ name: "PAGO PAGO WSO AP", highF: 87.6 });
    expect(body.climate.julyHighF).toBeGreaterThan(87.5);
    expect(body.climate.julyHighF).toBeLessThan(88.5);
    expect(body.band).toMatchObject({ id: "warm", ventsNeeded: true });
  });
});
