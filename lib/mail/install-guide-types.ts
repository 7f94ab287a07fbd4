import type { BandId } from "@/lib/catalog/climate-bands";
import type { FitLabel } from "@/lib/catalog/fit";
import type { Shade } from "@/lib/catalog/spec";
import type { SkylineEffect } from "@/lib/placement/skyline-words";
import type { Caution } from "@/lib/safety/cautions";
import type { WarmestMonth } from "@/lib/climate/warmest-month";
import type { UpkeepSeason } from "./upkeep-calendar";
import type { Rating } from "@/lib/shared/rating";

// The shapes of the install guide: what goes in (the order's houses, climate and site) and what
// comes out. Apart from the content rules so band-advice.ts and install-guide-content.ts can both
// use them without importing each other.

export type GuideHouse = {
  name: string;
  quantity: number;
  exteriorShade: Shade;
  vented: boolean;
  chamberCount: number;
  /** Mounts the model is built for: "pole", "building". */
  mounts: readonly string[];
  backToBackKit: boolean;
};

export type GuideClimate =
  | {
      known: true;
      bandId: BandId;
      /** The warmest month's average daily high, °F, unrounded (older name kept); null when the band came without one. */
      julyHighF: number | null;
      /** July north of the equator, January south of it. */
      warmestMonth?: WarmestMonth;
      /** Where the band came from, in words: "your saved site check", "ZIP 85281", … */
      basis: string;
      nearEdgeNote: string | null;
    }
  | { known: false; reason: string };

export type GuideSiteRule = {
  name: string;
  status: Rating;
  reason: string;
  change?: string;
};
export type GuideSite = {
  name: string;
  label: Rating;
  rules: readonly GuideSiteRule[];
  /** What the saved check found the skyline does; null for a check that kept none. */
  skylineEffect?: SkylineEffect | null;
};

export type InstallGuideInput = {
  houses: readonly GuideHouse[];
  climate: GuideClimate;
  site: GuideSite | null;
  hemisphere: "north" | "south";
};

export type GuideItem = { topic: string; text: string };

export type InstallGuide = {
  climate: { heading: string; paragraphs: string[]; advice: GuideItem[] };
  /** Where and how to mount, the same for every house of the order. */
  mounting: GuideItem[];
  /** Per model: how it suits the band, and what is particular to it. */
  houses: {
    name: string;
    quantity: number;
    fit: { label: FitLabel; words: string; reasons: string[] } | null;
    notes: GuideItem[];
  }[];
  site: {
    heading: string;
    summary: string;
    toChange: GuideItem[];
    /** The skyline's effect on the sun in plain words (PRODUCT.md §4). */
    skyline: string;
  } | null;
  calendar: readonly UpkeepSeason[];
  patience: { title: string; text: string };
  cautions: readonly Caution[];
};
