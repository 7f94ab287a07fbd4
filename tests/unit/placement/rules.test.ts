// Placement rules P1, P2 and P5–P10 at their boundaries, and the worst-of label (PRODUCT.md §4).
// Sources, as beside each rule in lib/placement/rules.ts:
//   P1 agency guides (tree-mounted houses seldom occupied); P2 12 ft minimum in agency guides,
//   15–20 ft better (common practice); P5 Tuttle & Hensley, "The Bat House Study", BATS 11(1),
//   1993 (1/4 mi); P6–P10 common practice, no source.
import { describe, expect, it } from "vitest";
import {
  checkFlightPath,
  checkHeight,
  checkLight,
  checkMount,
  checkPlacement,
  checkPredators,
  checkStacking,
  checkWater,
  checkWoodsEdge,
  findWorstStatus,
} from "@/lib/placement/rules";
import type { PlacementSite, RuleResult } from "@/lib/placement/types";

const goodSite: PlacementSite = {
  lat: 40,
  lon: -75,
  mount: "pole",
  heightFt: 16,
  facingDeg: 157,
  pairedBackToBack: false,
  stacked: false,
  waterMi: 0.1,
  woodsEdgeFt: 40,
  clearFlightPath: true,
  brightLight: false,
  predators: false,
};
const goodSun = {
  julyHighF: 88,
  sun: {
    mount: "pole" as const,
    pairedBackToBack: false,
    house: { hours: 14, morningShare: 0.5 },
    face: { hours: 8, morningShare: 0.7, deg: 157 },
    bestWall: { deg: 150, hours: 9 },
    openPoleHours: 14,
    skyline: { described: false, lostHours: 0, mainDirection: null },
  },
};

function expectWellFormed(rule: RuleResult) {
  expect(rule.reason.length).toBeGreaterThan(10);
  expect(rule.source.length).toBeGreaterThan(5);
  if (rule.status === "good") expect(rule.change).toBeUndefined();
  else expect(rule.change?.length ?? 0).toBeGreaterThan(10);
}

describe("P1 mount", () => {
  it.each([
    ["pole", "good"],
    ["building", "good"],
    ["tree", "poor"],
  ] as const)("%s → %s", (mount, status) => {
    const rule = checkMount({ mount });
    expect(rule.status).toBe(status);
    expectWellFormed(rule);
  });
});

describe("P2 height", () => {
  it.each([
    [20, "good"],
    [15, "good"],
    [14.99, "fair"],
    [12, "fair"],
    [11.99, "poor"],
    [0, "poor"],
  ] as const)("%s ft → %s", (heightFt, status) => {
    const rule = checkHeight({ heightFt });
    expect(rule.status).toBe(status);
    expectWellFormed(rule);
  });

  it("shows metres alongside feet", () => {
    expect(checkHeight({ heightFt: 15 }).value).toBe("15 ft (4.57 m)");
  });
});

describe("P5 water", () => {
  it.each([
    [0, "good"],
    [0.25, "good"],
    [0.26, "fair"],
    [1.0, "fair"],
    [1.01, "poor"],
  ] as const)("%s mi → %s", (waterMi, status) => {
    const rule = checkWater({ waterMi });
    expect(rule.status).toBe(status);
    expectWellFormed(rule);
  });
});

describe("P6 woods edge, pole mounts only", () => {
  it.each([
    [20, "good"],
    [19.99, "fair"],
    [0, "fair"],
  ] as const)("pole %s ft → %s", (woodsEdgeFt, status) => {
    const rule = checkWoodsEdge({ mount: "pole", woodsEdgeFt });
    expect(rule.status).toBe(status);
    expectWellFormed(rule);
  });

  it.each(["building", "tree"] as const)("does not apply to a %s mount", (mount) => {
    const rule = checkWoodsEdge({ mount, woodsEdgeFt: 2 });
    expect(rule.status).toBe("good");
    expect(rule.reason).toMatch(/pole mounts only/);
    expect(rule.value).toMatch(/Not applicable/);
  });
});

describe("P7–P10 yes/no rules", () => {
  it("P7 clear flight path: yes good, no poor", () => {
    expect(checkFlightPath({ clearFlightPath: true }).status).toBe("good");
    expectWellFormed(checkFlightPath({ clearFlightPath: false }));
    expect(checkFlightPath({ clearFlightPath: false }).status).toBe("poor");
  });

  it("P8 bright light: no good, yes poor", () => {
    expect(checkLight({ brightLight: false }).status).toBe("good");
    expect(checkLight({ brightLight: true }).status).toBe("poor");
    expectWellFormed(checkLight({ brightLight: true }));
  });

  it("P9 stacked: no good, yes poor", () => {
    expect(checkStacking({ stacked: false }).status).toBe("good");
    expect(checkStacking({ stacked: true }).status).toBe("poor");
    expectWellFormed(checkStacking({ stacked: true }));
  });

  it("P10 predators: no good, yes fair with a pole guard", () => {
    expect(checkPredators({ predators: false }).status).toBe("good");
    const rule = checkPredators({ predators: true });
    expect(rule.status).toBe("fair");
    expect(rule.change).toMatch(/guard/);
  });
});

describe("checkPlacement: worst-of label", () => {
  it("returns P1–P10 in order, all good for a good site", () => {
    const result = checkPlacement(goodSite, goodSun);
    expect(result.rules.map((r) => r.id)).toEqual([
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
    expect(result.rules.every((r) => r.status === "good")).toBe(true);
    expect(result.label).toBe("good");
  });

  it("one fair rule makes the site fair", () => {
    const result = checkPlacement({ ...goodSite, predators: true }, goodSun);
    expect(result.label).toBe("fair");
  });

  it("one poor rule among fair ones makes the site poor", () => {
    const site = { ...goodSite, predators: true, heightFt: 13, brightLight: true };
    const result = checkPlacement(site, goodSun);
    expect(result.rules.filter((r) => r.status === "fair").map((r) => r.id)).toEqual(["P2", "P10"]);
    expect(result.label).toBe("poor");
  });

  it("a poor sun rule alone makes the site poor", () => {
    const result = checkPlacement(goodSite, {
      julyHighF: 88,
      sun: { ...goodSun.sun, house: { hours: 3, morningShare: 1 } },
    });
    expect(result.label).toBe("poor");
  });

  it("every fair or poor rule says what to change", () => {
    const worst: PlacementSite = {
      ...goodSite,
      mount: "tree",
      heightFt: 8,
      facingDeg: 300,
      stacked: true,
      waterMi: 3,
      clearFlightPath: false,
      brightLight: true,
      predators: true,
    };
    const result = checkPlacement(worst, {
      julyHighF: 75,
      sun: { ...goodSun.sun, mount: "tree", house: { hours: 2, morningShare: 0 } },
    });
    result.rules.forEach(expectWellFormed);
    expect(result.rules.filter((r) => r.status !== "good")).toHaveLength(9);
  });

  it("mirrors in the southern hemisphere: north-northeast is good, advice leans north", () => {
    const site = { ...goodSite, lat: -33.9, lon: 151.2, facingDeg: 22 };
    const result = checkPlacement(site, {
      julyHighF: 104,
      sun: { ...goodSun.sun, house: { hours: 7, morningShare: 0.3 } },
    });
    expect(result.rules.find((r) => r.id === "P3")?.status).toBe("good");
    const sun = result.rules.find((r) => r.id === "P4");
    expect(sun?.status).toBe("fair");
    expect(sun?.change).toMatch(/east to northeast/);
  });

  it("findWorstStatus orders good < fair < poor", () => {
    expect(findWorstStatus([])).toBe("good");
    expect(findWorstStatus([{ status: "fair" }, { status: "good" }])).toBe("fair");
    expect(findWorstStatus([{ status: "fair" }, { status: "poor" }, { status: "good" }])).toBe(
      "poor",
    );
  });
});
