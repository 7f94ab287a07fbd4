import { describe, expect, it } from "vitest";
import { BAND_IDS, type BandId } from "@/lib/catalog/climate-bands";
import {
  buildInstallGuide,
  describeSunWanted,
  type GuideHouse,
  type InstallGuideInput,
} from "@/lib/mail/install-guide-content";
import { CAUTIONS } from "@/lib/safety/cautions";

// Sources: PRODUCT.md §2 (bands: shades and vents from the handbook's colour guidance keyed to
// the average July high, Tuttle, Kiser & Kiser 2004; vents where July highs reach 85 °F, Bat
// Conservation of Wisconsin) and §4 P4 (sun hours: at least 10 h at 80 °F or less, 6 h below
// 100 °F, 4 h mostly before solar noon at 100 °F and above).

const hollowFour: GuideHouse = {
  name: "Hollow Four",
  quantity: 1,
  exteriorShade: "dark",
  vented: true,
  chamberCount: 4,
  mounts: ["building", "pole"],
  backToBackKit: false,
};
const saltbush: GuideHouse = {
  name: "Saltbush",
  quantity: 2,
  exteriorShade: "white",
  vented: true,
  chamberCount: 4,
  mounts: ["building", "pole"],
  backToBackKit: false,
};

function guideFor(
  bandId: BandId,
  julyHighF: number | null,
  houses: GuideHouse[] = [hollowFour],
  extra: Partial<InstallGuideInput> = {},
) {
  return buildInstallGuide({
    houses,
    climate: { known: true, bandId, julyHighF, basis: "ZIP 00000", nearEdgeNote: null },
    site: null,
    hemisphere: "north",
    ...extra,
  });
}

function allText(guide: ReturnType<typeof buildInstallGuide>): string {
  return JSON.stringify(guide);
}

describe("the install guide's band advice", () => {
  it("for very hot summers speaks of light shades, vents and afternoon shade", () => {
    const guide = guideFor("very-hot", 106);
    const advice = guide.climate.advice.map((a) => `${a.topic}: ${a.text}`).join("\n");
    expect(advice).toMatch(/light or white outside/);
    expect(advice).toMatch(/Vents are needed/);
    expect(advice).toMatch(/Afternoon shade:/);
    expect(advice).toMatch(
      /at least 4 hours .* mostly in the morning \(60% or more before midday\)/,
    );
    expect(advice).not.toMatch(/black or dark/);
  });

  it("for cool summers speaks of dark shades and more sun, with vents optional", () => {
    const guide = guideFor("cool", 76);
    const advice = guide.climate.advice.map((a) => a.text).join("\n");
    expect(advice).toMatch(/black or dark outside/);
    expect(advice).toMatch(/more sun/);
    expect(advice).toMatch(/at least 10 hours/);
    expect(advice).toMatch(/Vents are optional/);
    expect(guide.climate.advice.map((a) => a.topic)).not.toContain("Afternoon shade");
  });

  it("asks 10 h of sun at a July high of 80.0 °F and 6 h just above it (P4's edge, inside the cool band)", () => {
    expect(describeSunWanted({ bandId: "cool", julyHighF: 80 })).toMatch(/at least 10 hours/);
    expect(describeSunWanted({ bandId: "cool", julyHighF: 80.1 })).toMatch(/at least 6 hours/);
    // Unknown July high inside the cool band: the stricter figure.
    expect(describeSunWanted({ bandId: "cool", julyHighF: null })).toMatch(/at least 10 hours/);
  });

  it("asks 6 h of sun for warm and hot summers, and vents in both", () => {
    for (const [bandId, shades] of [
      ["warm", /dark or medium/],
      ["hot", /medium or light/],
    ] as const) {
      const guide = guideFor(bandId, bandId === "warm" ? 90 : 97);
      const text = guide.climate.advice.map((a) => a.text).join("\n");
      expect(text).toMatch(shades);
      expect(text).toMatch(/at least 6 hours/);
      expect(text).toMatch(/Vents are needed/);
    }
  });

  it("explains all four bands when the band is unknown", () => {
    const guide = buildInstallGuide({
      houses: [hollowFour],
      climate: { known: false, reason: "No lookup." },
      site: null,
      hemisphere: "north",
    });
    const text = guide.climate.paragraphs.join(" ");
    expect(text).toMatch(/below 85 °F black or dark/);
    expect(text).toMatch(/100 °F and above light or white, vented, with afternoon shade/);
    expect(guide.houses[0]?.fit).toBeNull();
  });
});

describe("every guide", () => {
  it("carries all the cautions, the year's upkeep and the patience note, in every band", () => {
    for (const bandId of BAND_IDS) {
      const guide = guideFor(bandId, null);
      expect(guide.cautions.map((c) => c.id)).toEqual(CAUTIONS.map((c) => c.id));
      expect(guide.calendar.map((s) => s.id)).toEqual(["winter", "spring", "maternity", "autumn"]);
      expect(guide.patience.text).toMatch(/two years/);
      const text = allText(guide);
      expect(text).toMatch(/wasp/);
      expect(text).toMatch(/Re-caulk/);
      expect(text).toMatch(/repaint/);
    }
  });

  it("gives the mounting plan of PRODUCT.md §4, and each house its mount", () => {
    const guide = guideFor("warm", 90);
    const byTopic = Object.fromEntries(guide.mounting.map((p) => [p.topic, p.text]));
    expect(byTopic.Height).toMatch(/15 to 20 ft \(4.6 to 6.1 m\).*12 ft \(3.7 m\)/);
    expect(byTopic.Facing).toMatch(/south to southeast .*135° and 180°/);
    expect(byTopic.Sun).toMatch(/at least 6 hours/);
    expect(byTopic.Water).toMatch(/1\/4 mile \(0.4 km\).*1 mile \(1.6 km\)/);
    expect(byTopic.Trees).toMatch(/20 ft \(6.1 m\)/);
    expect(byTopic["Flight path"]).toMatch(/clear drop/);
    expect(byTopic.Lights).toMatch(/bright lights/);
    expect(byTopic.Pairs).toMatch(/back to back .*never mount one house above another/);
    expect(byTopic.Predators).toMatch(/guard/);
    expect(guide.houses[0]?.notes[0]).toEqual({
      topic: "Mount",
      text: expect.stringMatching(/^On a building wall or a pole, never on a tree/),
    });
  });

  it("says how to mount a pair kit, several houses, and a house without the vents the band needs", () => {
    const pair: GuideHouse = {
      ...hollowFour,
      name: "Backwoods Pair",
      mounts: ["pole"],
      backToBackKit: true,
    };
    const unvented: GuideHouse = { ...hollowFour, name: "Twin Ridge", vented: false };
    const [p, s, u] = guideFor("warm", 90, [pair, saltbush, unvented]).houses;
    expect(p?.notes.map((n) => n.topic)).toEqual(["Mount", "Pair kit"]);
    expect(p?.notes[0]?.text).toMatch(/^On a pole, never/);
    expect(s?.notes.map((n) => n.topic)).toContain("2 houses");
    expect(u?.notes.find((n) => n.topic === "No vents")?.text).toMatch(
      /shade from early afternoon/,
    );
    expect(guideFor("cool", 70, [unvented]).houses[0]?.notes.map((n) => n.topic)).not.toContain(
      "No vents",
    );
  });

  it("labels each house's fit for the band and says what to repaint", () => {
    const [dark, white] = guideFor("hot", 97, [hollowFour, saltbush]).houses;
    // Hot summers suit medium or light: dark is one step off (repaint medium), white one step off (light).
    expect(dark?.fit?.label).toBe("fair");
    expect(dark?.fit?.reasons.join(" ")).toMatch(/repaint it medium/);
    expect(dark?.notes.find((n) => n.topic === "Paint")?.text).toMatch(/paint the outside medium/);
    expect(white?.fit?.label).toBe("fair");
    expect(guideFor("very-hot", 104, [saltbush]).houses[0]?.fit?.label).toBe("good");
    expect(guideFor("very-hot", 104, [saltbush]).houses[0]?.quantity).toBe(2);
  });

  it("lists only the fair and poor rules of a saved site, with what to change", () => {
    const guide = guideFor("warm", 88, [hollowFour], {
      site: {
        name: "Barn wall",
        label: "fair",
        rules: [
          { name: "Mount", status: "good", reason: "A building wall is a mount bats take to." },
          {
            name: "Height",
            status: "fair",
            reason: "Above the 12 ft minimum.",
            change: "Raise it to 15 ft.",
          },
        ],
      },
    });
    expect(guide.site?.summary).toMatch(/"Barn wall" found a workable spot/);
    expect(guide.site?.toChange).toEqual([
      { topic: "Height", text: "Above the 12 ft minimum. Raise it to 15 ft." },
    ]);
  });
});

describe("the guide for a site south of the equator, and the content fixes", () => {
  // PRODUCT.md §2 and §7: Pago Pago (14.33° S) keys to its January normal, 87.6 °F at the airport:
  // warm summers, vents needed; its calendar and maternity caution are the southern ones.
  const pagoPago = buildInstallGuide({
    houses: [{ ...hollowFour, vented: false }],
    climate: { known: true, bandId: "warm", julyHighF: 87.6, warmestMonth: "january", basis: "your saved site check", nearEdgeNote: null },
    site: null,
    hemisphere: "south",
  });
  const text = allText(pagoPago);

  it("names January as the warmest month, warm summers and vents", () => {
    expect(pagoPago.climate.paragraphs[0]).toMatch(/warm summers \(average daily high in January, your warmest month, about 88 °F, 31 °C\)/);
    expect(text).toMatch(/Vents are needed/);
  });

  it("uses the southern calendar and maternity caution", () => {
    expect(pagoPago.calendar.map((s) => s.months)).toEqual(["June to August", "September", "October to mid-February", "Mid-February to May"]);
    expect(pagoPago.cautions.find((c) => c.id === "maternity-season")?.text).toMatch(/October to mid-February/);
    expect(text).not.toMatch(/April to mid-August/);
  });

  it("never shows a rounded value over the band's edge: 84.96 °F reads about 84 °F, cool summers", () => {
    const guide = guideFor("cool", 84.96);
    expect(guide.climate.paragraphs[0]).toMatch(/cool summers \(average daily high in July, your warmest month, about 84 °F/);
  });

  it("says a predator guard is for poles, and how to keep a wall house out of reach", () => {
    const predators = guideFor("warm", 88).mounting.find((m) => m.topic === "Predators")?.text ?? "";
    expect(predators).toMatch(/on a pole, fit a smooth metal guard/);
    expect(predators).toMatch(/on a building wall, hang it well clear of roofs, ledges, railings/);
  });

  it("gives height its accepted reasons, and says what to look for from the ground", () => {
    const mounting = guideFor("warm", 88).mounting;
    const height = mounting.find((m) => m.topic === "Height")?.text ?? "";
    expect(height).toMatch(/out of reach of cats, raccoons and other climbing predators/);
    expect(height).toMatch(/more hours of sun/);
    expect(height).not.toMatch(/warmer/);
    expect(mounting.find((m) => m.topic === "Checking from the ground")?.text).toMatch(/droppings on the ground.*dark stains at the entrance/);
  });

  it("asks for flat water-based exterior paint, cured before mounting", () => {
    const black = { ...hollowFour, exteriorShade: "black" as const };
    const notes = guideFor("warm", 88, [black]).houses[0]?.notes ?? [];
    const paint = notes.find((n) => n.topic === "Paint")?.text ?? "";
    expect(paint).toMatch(/flat \(matte\), water-based exterior paint/);
    expect(paint).toMatch(/cure .* before you mount/);
  });
});
