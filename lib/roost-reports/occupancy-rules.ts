import { isOccupiedAnswer, type RoostAnswer } from "./answers";
import { wilsonInterval, type Interval } from "./wilson-interval";

// Observed occupancy (PRODUCT.md §8): the share of houses reported occupied (signs or bats seen)
// within their first two summers, with a 95% Wilson score interval, shown only where at least
// 5 houses were reported. The published model for such figures is the owners'-report tally of
// Tuttle & Hensley, "The Bat House Study", BATS 11(1), 1993; ours come only from our buyers.
//
// Which houses count (common practice for survey data with follow-up, no source): a house whose
// two-summer outcome is known. It counts as occupied when any report for its first two summers
// (or the part-summer it arrived in) says signs or bats seen; as empty when its second summer
// was reported as "no sign yet" and no earlier report said otherwise. A house still in its
// first two summers, one whose second summer went unreported, and one reported gone before it
// showed signs tell us nothing yet about two summers, so they are left out rather than guessed.

export const MIN_HOUSES_FOR_RATE = 5;
export const SUMMERS_WINDOW = 2;

/** One current, counted report (doubtful ones are left out before this point). */
export type ReportFact = {
  houseKey: string;
  modelId: string;
  season: number;
  summer: number;
  answer: RoostAnswer;
  bandId: string | null;
  mount: string | null;
  state: string | null;
  siteRating: string | null;
  demo: boolean;
};

export type HouseOutcome = {
  houseKey: string;
  modelId: string;
  bandId: string | null;
  mount: string | null;
  state: string | null;
  siteRating: string | null;
  demo: boolean;
  /** "open": not known yet (or no longer knowable) for the two-summer window. */
  outcome: "occupied" | "empty" | "open";
  /** The first summer with signs or bats (a part-summer on arrival counts as the first), or null. */
  firstOccupiedSummer: number | null;
};

/** Folds each house's reports into its two-summer outcome. */
export function houseOutcomes(facts: readonly ReportFact[]): HouseOutcome[] {
  const byHouse = new Map<string, ReportFact[]>();
  for (const fact of facts) {
    const list = byHouse.get(fact.houseKey);
    if (list) list.push(fact);
    else byHouse.set(fact.houseKey, [fact]);
  }
  const outcomes: HouseOutcome[] = [];
  for (const [houseKey, reports] of byHouse) {
    reports.sort((a, b) => a.summer - b.summer || a.season - b.season);
    // The newest report describes the house as it stands (site, band and mount rarely change).
    const latest = reports[reports.length - 1]!;
    const occupiedSummers = reports.filter((r) => isOccupiedAnswer(r.answer)).map((r) => Math.max(1, r.summer));
    const firstOccupiedSummer = occupiedSummers.length > 0 ? Math.min(...occupiedSummers) : null;
    let outcome: HouseOutcome["outcome"] = "open";
    if (firstOccupiedSummer !== null && firstOccupiedSummer <= SUMMERS_WINDOW) outcome = "occupied";
    else if (reports.some((r) => r.summer === SUMMERS_WINDOW && r.answer === "no_sign")) outcome = "empty";
    outcomes.push({
      houseKey,
      modelId: latest.modelId,
      bandId: latest.bandId,
      mount: latest.mount,
      state: latest.state,
      siteRating: latest.siteRating,
      demo: reports.some((r) => r.demo),
      outcome,
      firstOccupiedSummer,
    });
  }
  return outcomes;
}

export type OccupancyStat = {
  /** Houses whose two-summer outcome is known. */
  n: number;
  /** Of them, occupied within two summers. */
  k: number;
  /** k / n and its interval, only where n ≥ 5. */
  rate: number | null;
  interval: Interval | null;
  shown: boolean;
  /** How many of the n houses are invented demo houses. */
  demoHouses: number;
};

export function occupancyStat(outcomes: readonly HouseOutcome[]): OccupancyStat {
  const known = outcomes.filter((o) => o.outcome !== "open");
  const n = known.length;
  const k = known.filter((o) => o.outcome === "occupied").length;
  const demoHouses = known.filter((o) => o.demo).length;
  if (n < MIN_HOUSES_FOR_RATE) return { n, k, rate: null, interval: null, shown: false, demoHouses };
  return { n, k, rate: k / n, interval: wilsonInterval({ successes: k, trials: n }), shown: true, demoHouses };
}

/** One stat per value of `key` (houses whose key is null are left out of this breakdown). */
export function occupancyBy(
  outcomes: readonly HouseOutcome[],
  key: (o: HouseOutcome) => string | null,
): Map<string, OccupancyStat> {
  const groups = new Map<string, HouseOutcome[]>();
  for (const o of outcomes) {
    const value = key(o);
    if (value === null) continue;
    const list = groups.get(value);
    if (list) list.push(o);
    else groups.set(value, [o]);
  }
  return new Map([...groups].map(([value, list]) => [value, occupancyStat(list)]));
}

export type FirstOccupancy = {
  /** Houses that ever had signs or bats. */
  houses: number;
  bySummer: { summer: 1 | 2 | 3; label: string; houses: number }[];
  /** The median summer of first occupancy, or null with none. */
  medianSummer: number | null;
};

/** Time to first occupancy, in summers, over the houses that became occupied (any summer). */
export function firstOccupancy(outcomes: readonly HouseOutcome[]): FirstOccupancy {
  const summers = outcomes
    .map((o) => o.firstOccupiedSummer)
    .filter((s): s is number => s !== null)
    .sort((a, b) => a - b);
  const count = (test: (s: number) => boolean) => summers.filter(test).length;
  let medianSummer: number | null = null;
  if (summers.length > 0) {
    const mid = Math.floor(summers.length / 2);
    medianSummer = summers.length % 2 === 1 ? summers[mid]! : (summers[mid - 1]! + summers[mid]!) / 2;
  }
  return {
    houses: summers.length,
    bySummer: [
      { summer: 1, label: "first summer", houses: count((s) => s === 1) },
      { summer: 2, label: "second summer", houses: count((s) => s === 2) },
      { summer: 3, label: "third summer or later", houses: count((s) => s >= 3) },
    ],
    medianSummer,
  };
}

/** What a public page or API may show of a stat: n always, the rate only where n ≥ 5. */
export function publicStat(stat: OccupancyStat): {
  n: number;
  shown: boolean;
  k?: number;
  rate?: number;
  interval?: Interval;
  demo: boolean;
} {
  const base = { n: stat.n, shown: stat.shown, demo: stat.demoHouses > 0 };
  if (!stat.shown || stat.rate === null || !stat.interval) return base;
  return { ...base, k: stat.k, rate: stat.rate, interval: stat.interval };
}
