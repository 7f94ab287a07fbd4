import { CLIMATE_BANDS } from "@/lib/catalog/climate-bands";
import { FIT_LABEL_WORDS, fitForBand, type Fit } from "@/lib/catalog/fit";
import { SHADE_LABELS } from "@/lib/catalog/spec";
import { describeSkylineEffect } from "@/lib/placement/skyline-words";
import { cautionsFor, MOVE_IN_PATIENCE } from "@/lib/safety/cautions";
import { climateSection, describeSunWanted } from "./band-advice";
import type { GuideHouse, GuideItem, GuideSite, InstallGuide, InstallGuideInput } from "./install-guide-types";
import { upkeepCalendarFor } from "./upkeep-calendar";

export { describeSunWanted } from "./band-advice";

// What the install guide says, worked out from the buyer's houses, climate band and site (the
// calendar and the cautions in the site's hemisphere); the
// e-mail template only lays it out. The mounting figures are the placement rules of PRODUCT.md
// §4 (P1–P10, sources in lib/placement/rules.ts) and the band advice is §2 (sources in
// lib/catalog/climate-bands.ts); metric alongside per PRODUCT.md "Units" (1 ft = 0.3048 m,
// 1 mi = 1.609344 km). Height: out of predators' reach and more sun (agency guides; common
// practice). Predator guards fit poles; on a wall, distance from climbable ledges is what helps
// (common practice, no source). Flat water-based exterior paint, cured before mounting (the
// handbook's finishing advice, as reproduced by agency guides; curing time: common practice).

export type {
  GuideClimate,
  GuideHouse,
  GuideItem,
  GuideSite,
  GuideSiteRule,
  InstallGuide,
  InstallGuideInput,
} from "./install-guide-types";
const SITE_LABEL_WORDS = {
  good: "a good spot",
  fair: "a workable spot with changes to make",
  poor: "a spot that needs changes first",
} as const;

function facingText(hemisphere: "north" | "south"): string {
  return hemisphere === "north"
    ? "Face it south to southeast (a compass bearing between 135° and 180°), so it warms in the morning sun."
    : "Face it north to northeast (a compass bearing between 0° and 45°), so it warms in the morning sun south of the equator.";
}

function mountWords(mounts: readonly string[]): string {
  const words = mounts.map((m) =>
    m === "pole" ? "a pole" : m === "building" ? "a building wall" : m,
  );
  return words.length > 0 ? words.join(" or ") : "a pole or a building wall";
}

/** What holds for every house: P2–P10 of the placement check, with the band's sun hours. */
function mountingPlan(input: InstallGuideInput): GuideItem[] {
  const sun = input.climate.known
    ? describeSunWanted({ bandId: input.climate.bandId, julyHighF: input.climate.julyHighF })
    : "Give it at least 6 hours of direct sun a day, and 10 or more where July highs stay at or below 80 °F.";
  return [
    {
      topic: "Height",
      text: "The bottom of the house 15 to 20 ft (4.6 to 6.1 m) above the ground; 12 ft (3.7 m) is the least that works. Up there it is out of reach of cats, raccoons and other climbing predators, and it gets more hours of sun.",
    },
    { topic: "Facing", text: facingText(input.hemisphere) },
    { topic: "Sun", text: sun },
    {
      topic: "Water",
      text: "Within 1/4 mile (0.4 km) of a stream, pond or lake is best; within 1 mile (1.6 km) still works.",
    },
    {
      topic: "Trees",
      text: "On a pole, keep it at least 20 ft (6.1 m) from the nearest trees or woods edge, so owls and hawks have no perch beside it.",
    },
    {
      topic: "Flight path",
      text: "Leave a clear drop below the entrance: no branches, shrubs, wires or fences right under it.",
    },
    {
      topic: "Lights",
      text: "Keep it away from bright lights: a porch, yard or street light on or near the house heats it and exposes the bats.",
    },
    {
      topic: "Pairs",
      text: "Two houses back to back on one pole work well (the half facing away from the sun is fine); never mount one house above another.",
    },
    {
      topic: "Predators",
      text: "If cats, raccoons or snakes are about: on a pole, fit a smooth metal guard around the pole below the house; on a building wall, hang it well clear of roofs, ledges, railings and anything else a cat or raccoon can climb or jump from.",
    },
    {
      topic: "Checking from the ground",
      text: "Check the house from the ground, never by climbing to it: look (with binoculars if you have them) for droppings on the ground or the wall below, dark stains at the entrance, wasp or mud-dauber nests, gaps in the caulk, loose boards or a leaning pole; at dusk, count the bats as they leave. Bats clustered at the entrance or hanging outside on a hot afternoon mean the house is running too hot.",
    },
  ];
}

/** What is particular to one model: its mounts (P1), a pair kit, and paint or vents its fit calls for. */
function houseNotes(house: GuideHouse, fit: Fit | null, input: InstallGuideInput): GuideItem[] {
  const notes: GuideItem[] = [
    {
      topic: "Mount",
      text: `On ${mountWords(house.mounts)}, never on a tree: houses on trees are seldom occupied, stay shaded and let climbing predators in.`,
    },
  ];
  if (house.backToBackKit) {
    notes.push({
      topic: "Pair kit",
      text: "This model is a back-to-back pair: bolt both houses to one pole with the gap and roof cap in place; bats move front to back as the sun comes round.",
    });
  } else if (house.quantity > 1) {
    notes.push({
      topic: `${house.quantity} houses`,
      text: "Mount them back to back on one pole, or each on its own pole or wall nearby; not one above another.",
    });
  }
  if (fit?.repaintTo) {
    notes.push({
      topic: "Paint",
      text: `Before mounting, paint the outside ${SHADE_LABELS[fit.repaintTo].toLowerCase()} with a flat (matte), water-based exterior paint, and let it cure for several days, until it no longer smells, before you mount the house; keep paint out of the chambers.`,
    });
  }
  if (input.climate.known && CLIMATE_BANDS[input.climate.bandId].ventsNeeded && !house.vented) {
    notes.push({
      topic: "No vents",
      text: "Without vents it can overheat in your summers: give it shade from early afternoon, and on the hottest days look from the ground for bats clustered at the entrance or hanging outside, a sign it is too hot.",
    });
  }
  return notes;
}

function houseSection(house: GuideHouse, input: InstallGuideInput): InstallGuide["houses"][number] {
  const fit = input.climate.known ? fitForBand(house, input.climate.bandId) : null;
  return {
    name: house.name,
    quantity: house.quantity,
    fit: fit ? { label: fit.label, words: FIT_LABEL_WORDS[fit.label], reasons: fit.reasons } : null,
    notes: houseNotes(house, fit, input),
  };
}

function siteSection(site: GuideSite | null): InstallGuide["site"] {
  if (!site) return null;
  const toChange = site.rules
    .filter((rule) => rule.status !== "good")
    .map((rule) => ({
      topic: rule.name,
      text: rule.change ? `${rule.reason} ${rule.change}` : rule.reason,
    }));
  const summary =
    toChange.length === 0
      ? `Your site check "${site.name}" found ${SITE_LABEL_WORDS[site.label]}: every rule passed. Mount the house there as planned.`
      : `Your site check "${site.name}" found ${SITE_LABEL_WORDS[site.label]}. Before mounting, look at ${toChange.length === 1 ? "this point" : `these ${toChange.length} points`}:`;
  const skyline = describeSkylineEffect(site.skylineEffect);
  return {
    heading: "Your saved site",
    summary,
    toChange,
    skyline: [skyline.summary, ...skyline.parts].join(" "),
  };
}

export function buildInstallGuide(input: InstallGuideInput): InstallGuide {
  return {
    climate: climateSection(input.climate),
    mounting: mountingPlan(input),
    houses: input.houses.map((house) => houseSection(house, input)),
    site: siteSection(input.site),
    calendar: upkeepCalendarFor(input.hemisphere),
    patience: MOVE_IN_PATIENCE,
    cautions: cautionsFor({ hemisphere: input.hemisphere }),
  };
}
