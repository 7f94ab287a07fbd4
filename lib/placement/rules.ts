// The placement check (PRODUCT.md §4): ten rules P1–P10 on a planned site, and the overall
// label, which is the worst of them. Pure functions; the season sun (P4) is computed by the
// caller with seasonSunOnHouse() at findSunFaceBearing(site) and passed in as a summary.
import { checkFacing } from "./facing-rule";
import { formatFeet, formatMiles } from "./format";
import { getHemisphere } from "./sun";
import { checkSun } from "./sun-rule";
import type {
  PlacementResult,
  PlacementSite,
  RuleResult,
  RuleStatus,
  SunOnHouseSummary,
} from "./types";

export { checkFacing, findSunFaceBearing, rateFacing } from "./facing-rule";
export { checkSun, getSunRegime, rateSun } from "./sun-rule";

const COMMON_PRACTICE = "Common practice (no published source)";

type Verdict = Omit<RuleResult, "id" | "name" | "source" | "value">;

function good(reason: string): Verdict {
  return { status: "good", reason };
}

function flag(verdict: {
  status: Exclude<RuleStatus, "good">;
  reason: string;
  change: string;
}): Verdict {
  return verdict;
}

// P1. Source: agency guides ("houses mounted on trees are seldom occupied"); common practice
// (tree houses get too little sun and let climbing predators reach them).
export function checkMount({ mount }: Pick<PlacementSite, "mount">): RuleResult {
  const verdict =
    mount === "tree"
      ? flag({
          status: "poor",
          reason:
            "Houses on trees are seldom occupied: leaves shade them and climbing predators reach them.",
          change: "Mount the house on a pole or on a building wall instead.",
        })
      : good(`A ${mount === "pole" ? "pole" : "building wall"} is a mount bats take to.`);
  const value = { pole: "Pole", building: "Building wall", tree: "Tree" }[mount];
  return {
    id: "P1",
    name: "Mount",
    value,
    source: "Agency bat-house guides (tree-mounted houses are seldom occupied); common practice",
    ...verdict,
  };
}

// P2. Source: 12 ft minimum in agency guides; common practice: 15–20 ft is better.
// good ≥ 15 ft; fair 12 ft to below 15 ft; poor below 12 ft.
export function checkHeight({ heightFt }: Pick<PlacementSite, "heightFt">): RuleResult {
  const verdict =
    heightFt >= 15
      ? good("15 ft or more keeps the roost warm and out of reach of predators.")
      : heightFt >= 12
        ? flag({
            status: "fair",
            reason: "Above the 12 ft minimum, but houses at 15–20 ft do better.",
            change: "Raise the house to 15–20 ft (4.6–6.1 m) above the ground.",
          })
        : flag({
            status: "poor",
            reason: "Below 12 ft the house is easy for predators to reach and bats seldom use it.",
            change: "Raise the house to at least 12 ft (3.7 m), better 15–20 ft (4.6–6.1 m).",
          });
  return {
    id: "P2",
    name: "Height",
    value: formatFeet(heightFt),
    source: "Agency guides (12 ft minimum); common practice (15–20 ft is better)",
    ...verdict,
  };
}

// P5. Source: Tuttle & Hensley, "The Bat House Study", BATS 11(1), 1993, for the quarter-mile
// threshold (as PRODUCT.md §4 cites it); the 1 mi fair band is the store's own.
// good ≤ 1/4 mi; fair ≤ 1 mi; poor beyond.
export function checkWater({ waterMi }: Pick<PlacementSite, "waterMi">): RuleResult {
  const verdict =
    waterMi <= 0.25
      ? good("Within a quarter mile of water, where bats drink and feed.")
      : waterMi <= 1
        ? flag({
            status: "fair",
            reason: "Water within a mile helps, but a quarter mile or less is better.",
            change:
              "If you can, choose a site within a quarter mile (0.4 km) of a pond, stream or lake.",
          })
        : flag({
            status: "poor",
            reason: "More than a mile from water: nursing bats need to drink close to the roost.",
            change: "Choose a site within a mile (1.6 km) of water, ideally within a quarter mile.",
          });
  return {
    id: "P5",
    name: "Water nearby",
    value: formatMiles(waterMi),
    source: "Published bat-house occupancy survey (1993)",
    ...verdict,
  };
}

// P6. Source: common practice, no source: a pole house close to branches gets shaded and gives
// owls and climbing predators a perch. Pole mounts only.
export function checkWoodsEdge({
  mount,
  woodsEdgeFt,
}: Pick<PlacementSite, "mount" | "woodsEdgeFt">): RuleResult {
  const applies = mount === "pole";
  const verdict = !applies
    ? good("Applies to pole mounts only, so it does not count against this site.")
    : woodsEdgeFt >= 20
      ? good("At least 20 ft from trees: open flight and no perch for predators.")
      : flag({
          status: "fair",
          reason:
            "Closer than 20 ft to trees: branches shade the house and give predators a perch.",
          change: "Set the pole at least 20 ft (6.1 m) from the nearest trees or woods edge.",
        });
  return {
    id: "P6",
    name: "Distance from trees",
    value: applies ? formatFeet(woodsEdgeFt) : "Not applicable (not a pole mount)",
    source: COMMON_PRACTICE,
    ...verdict,
  };
}

// P7. Source: common practice, no source: bats drop before flying and need open air below.
export function checkFlightPath({
  clearFlightPath,
}: Pick<PlacementSite, "clearFlightPath">): RuleResult {
  const verdict = clearFlightPath
    ? good("Bats can drop from the house and fly off freely.")
    : flag({
        status: "poor",
        reason:
          "Bats drop a few feet before they fly; branches, wires or shrubs below get in the way.",
        change: "Clear branches, wires and shrubs from below and around the house.",
      });
  return describeYesNo({ id: "P7", name: "Clear flight path", answer: clearFlightPath, verdict });
}

// P8. Source: agency guides; common practice: lights heat the box and expose bats to predators.
export function checkLight({ brightLight }: Pick<PlacementSite, "brightLight">): RuleResult {
  const verdict = brightLight
    ? flag({
        status: "poor",
        reason:
          "Bright light on or near the house keeps bats in late and exposes them to predators.",
        change: "Move the house away from lights, or turn off or shield the light.",
      })
    : good("No bright light on the house.");
  return describeYesNo({
    id: "P8",
    name: "Bright light",
    answer: brightLight,
    verdict,
    source: "Agency guides; common practice (lights heat the box and expose bats)",
  });
}

// P9. Source: common practice, no source: back-to-back pairs are good, stacking is not
// (the upper house shades the lower one and guano falls on its bats).
export function checkStacking({ stacked }: Pick<PlacementSite, "stacked">): RuleResult {
  const verdict = stacked
    ? flag({
        status: "poor",
        reason: "A house above another shades it and drops guano on it.",
        change: "Mount the houses side by side or back to back instead of one above the other.",
      })
    : good("No house stacked above another.");
  return describeYesNo({ id: "P9", name: "One house above another", answer: stacked, verdict });
}

// P10. Source: common practice, no source: a smooth metal guard stops climbing predators.
export function checkPredators({ predators }: Pick<PlacementSite, "predators">): RuleResult {
  const verdict = predators
    ? flag({
        status: "fair",
        reason: "Cats, raccoons or snakes nearby can catch bats at the house.",
        change: "Fit a smooth metal predator guard around the pole or wall below the house.",
      })
    : good("No predators reported nearby.");
  return describeYesNo({ id: "P10", name: "Predators nearby", answer: predators, verdict });
}

function describeYesNo({
  id,
  name,
  answer,
  verdict,
  source = COMMON_PRACTICE,
}: {
  id: RuleResult["id"];
  name: string;
  answer: boolean;
  verdict: Verdict;
  source?: string;
}): RuleResult {
  return { id, name, value: answer ? "Yes" : "No", source, ...verdict };
}

const SEVERITY: Record<RuleStatus, number> = { good: 0, fair: 1, poor: 2 };

/** The worst status of the rules; an empty list is good (nothing found against it). */
export function findWorstStatus(rules: Pick<RuleResult, "status">[]): RuleStatus {
  return rules.reduce<RuleStatus>(
    (worst, { status }) => (SEVERITY[status] > SEVERITY[worst] ? status : worst),
    "good",
  );
}

export function checkPlacement(
  site: PlacementSite,
  { julyHighF, sun }: { julyHighF: number; sun: SunOnHouseSummary },
): PlacementResult {
  const rules = [
    checkMount(site),
    checkHeight(site),
    checkFacing(site),
    checkSun({ julyHighF, sun, hemisphere: getHemisphere(site.lat) }),
    checkWater(site),
    checkWoodsEdge(site),
    checkFlightPath(site),
    checkLight(site),
    checkStacking(site),
    checkPredators(site),
  ];
  return { rules, label: findWorstStatus(rules) };
}
