import { describe, expect, it } from "vitest";
import type { RoostAnswer } from "@/lib/roost-reports/answers";
import {
  firstOccupancy,
  houseOutcomes,
  MIN_HOUSES_FOR_RATE,
  occupancyBy,
  occupancyStat,
  publicStat,
  type ReportFact,
} from "@/lib/roost-reports/occupancy-rules";

function fact(houseKey: string, summer: number, answer: RoostAnswer, extra: Partial<ReportFact> = {}): ReportFact {
  return {
    houseKey,
    modelId: "m1",
    season: 2024 + summer,
    summer,
    answer,
    bandId: "warm",
    mount: "pole",
    state: "WI",
    siteRating: "good",
    demo: false,
    ...extra,
  };
}

describe("houseOutcomes", () => {
  it("counts signs or bats within two summers as occupied, with the first summer they appeared", () => {
    const [a, b, c] = houseOutcomes([
      fact("a", 1, "no_sign"),
      fact("a", 2, "signs"),
      fact("b", 1, "bats_seen"),
      fact("c", 0, "signs"),
    ]);
    expect(a).toMatchObject({ outcome: "occupied", firstOccupiedSummer: 2 });
    expect(b).toMatchObject({ outcome: "occupied", firstOccupiedSummer: 1 });
    // Bats in the part-summer a house arrived in count as its first summer.
    expect(c).toMatchObject({ outcome: "occupied", firstOccupiedSummer: 1 });
  });

  it("counts a house as empty only when its second summer was reported with no sign", () => {
    const outcomes = houseOutcomes([
      fact("empty", 1, "no_sign"),
      fact("empty", 2, "no_sign"),
      fact("young", 1, "no_sign"),
      fact("skipped", 1, "no_sign"),
      fact("skipped", 3, "no_sign"),
      fact("gone", 1, "no_sign"),
      fact("gone", 2, "gone"),
      fact("late", 2, "no_sign"),
      fact("late", 3, "bats_seen"),
    ]);
    const by = Object.fromEntries(outcomes.map((o) => [o.houseKey, o]));
    expect(by.empty!.outcome).toBe("empty");
    expect(by.young!.outcome).toBe("open");
    expect(by.skipped!.outcome).toBe("open");
    expect(by.gone!.outcome).toBe("open");
    expect(by.late).toMatchObject({ outcome: "empty", firstOccupiedSummer: 3 });
  });

  it("marks a house as demo when any of its reports is", () => {
    const [o] = houseOutcomes([fact("d", 1, "signs", { demo: true })]);
    expect(o!.demo).toBe(true);
  });
});

describe("occupancyStat", () => {
  const houses = (occupied: number, empty: number, open = 0) =>
    houseOutcomes([
      ...Array.from({ length: occupied }, (_, i) => fact(`o${i}`, 1, "bats_seen")),
      ...Array.from({ length: empty }, (_, i) => fact(`e${i}`, 2, "no_sign")),
      ...Array.from({ length: open }, (_, i) => fact(`x${i}`, 1, "no_sign")),
    ]);

  it("shows no rate below 5 houses and a rate with its Wilson interval from 5", () => {
    expect(MIN_HOUSES_FOR_RATE).toBe(5);
    const four = occupancyStat(houses(3, 1, 7));
    expect(four).toMatchObject({ n: 4, shown: false, rate: null, interval: null });
    const five = occupancyStat(houses(3, 2, 7));
    expect(five.n).toBe(5);
    expect(five.k).toBe(3);
    expect(five.rate).toBeCloseTo(0.6, 10);
    expect(five.interval!.lower).toBeCloseTo(0.2307, 4);
    expect(five.interval!.upper).toBeCloseTo(0.8824, 4);
  });

  it("never lets the public shape carry k or a rate below the threshold", () => {
    const shown = publicStat(occupancyStat(houses(2, 2)));
    expect(shown).toEqual({ n: 4, shown: false, demo: false });
    expect(publicStat(occupancyStat(houses(1, 29)))).toMatchObject({ n: 30, k: 1, shown: true });
  });

  it("breaks down by a key and leaves out houses without one", () => {
    const outcomes = houseOutcomes([
      fact("a", 1, "signs", { bandId: "cool" }),
      fact("b", 2, "no_sign", { bandId: null }),
      fact("c", 2, "no_sign", { bandId: "cool" }),
    ]);
    const byBand = occupancyBy(outcomes, (o) => o.bandId);
    expect([...byBand.keys()]).toEqual(["cool"]);
    expect(byBand.get("cool")).toMatchObject({ n: 2, k: 1 });
  });
});

describe("firstOccupancy", () => {
  it("counts houses by the summer bats first came, and gives the median", () => {
    const outcomes = houseOutcomes([
      fact("a", 1, "signs"),
      fact("b", 2, "bats_seen"),
      fact("c", 2, "signs"),
      fact("d", 4, "signs"),
      fact("e", 2, "no_sign"),
    ]);
    const result = firstOccupancy(outcomes);
    expect(result.houses).toBe(4);
    expect(result.bySummer.map((s) => s.houses)).toEqual([1, 2, 1]);
    expect(result.medianSummer).toBe(2);
    expect(firstOccupancy([]).medianSummer).toBeNull();
  });
});
