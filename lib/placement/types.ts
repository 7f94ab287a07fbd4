import type { Rating } from "@/lib/shared/rating";

// Shared shapes of the placement check (PRODUCT.md §4). Plain types: the rules stay free of
// framework and validation imports; lib/placement/schema.ts validates what arrives from outside.

export type Mount = "pole" | "building" | "tree";

/** A planned site, already resolved to coordinates (a ZIP is turned into lat/lon upstream). */
export type PlacementSite = {
  lat: number;
  lon: number;
  mount: Mount;
  heightFt: number;
  /** Compass bearing the house face (its open bottom side and front) points to, degrees from north. */
  facingDeg: number;
  /** Two houses mounted back to back, the second facing facingDeg + 180°. */
  pairedBackToBack: boolean;
  /** One house mounted above another. */
  stacked: boolean;
  waterMi: number;
  woodsEdgeFt: number;
  clearFlightPath: boolean;
  brightLight: boolean;
  predators: boolean;
};

export type RuleId = "P1" | "P2" | "P3" | "P4" | "P5" | "P6" | "P7" | "P8" | "P9" | "P10";

export type RuleStatus = Rating;

export type RuleResult = {
  id: RuleId;
  /** Short name for a table row, e.g. "Height". */
  name: string;
  status: RuleStatus;
  /** The site's own value in words, e.g. "14 ft (4.27 m)". */
  value: string;
  /** One line a buyer can read: why this status. */
  reason: string;
  /** What to change; present on every fair or poor rule. */
  change?: string;
  /** Where the threshold comes from, in plain words safe to show (full citations sit in code). */
  source: string;
};

/** Hours a day and the share of them before solar noon (a season tally fits). */
export type SunSummary = { hours: number; morningShare: number };

/** What P4 needs of a season's sun (PRODUCT.md §4): lib/placement/sun-rule.ts rates `house`. */
export type SunOnHouseSummary = {
  mount: Mount;
  pairedBackToBack: boolean;
  /** By mount, under the skyline: a wall from the front only, a pole (or tree) all round. */
  house: SunSummary;
  /** The front face, under the skyline (shown beside the house figure). */
  face: SunSummary & { deg: number };
  /** The sunniest whole-degree wall bearing here, under the skyline. */
  bestWall: { deg: number; hours: number };
  /** A pole in the open (no skyline) at this place: the most sun any house here can get. */
  openPoleHours: number;
  skyline: {
    described: boolean;
    /** Hours a day the skyline takes from the house figure. */
    lostHours: number;
    /** Where most of that loss lies, in words ("east"), when it is worth naming. */
    mainDirection: string | null;
  };
};

export type PlacementResult = { rules: RuleResult[]; label: RuleStatus };
