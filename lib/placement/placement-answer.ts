// The whole answer of a placement check, as `POST /api/placement` sends it and a saved site
// keeps it: the band used, the sun on the house (by mount, under the skyline) and on its front
// face, what the skyline takes, the sun's paths for the chart, the ten rules and the label.
// Pure: location and climate are resolved by the caller.
import type { BandId, ClimateBand } from "@/lib/catalog/climate-bands";
import type { ClimateDisplay } from "@/lib/climate/display";
import type { Climate } from "@/lib/climate/resolve";
import type { NearbyStation } from "@/lib/climate/station-index";
import type { WarmestMonth } from "@/lib/climate/warmest-month";
import { describeBearing, normalizeBearing } from "./bearing";
import type { PlacementInput } from "./schema";
import { checkPlacement, findSunFaceBearing } from "./rules";
import type { Skyline } from "./skyline";
import { describeSkylineEffect, findMainLoss, type SkylineEffect } from "./skyline-words";
import {
  seasonSunOnHouse,
  type Hemisphere,
  type SeasonDayOnHouse,
  type SeasonOnHouse,
  type SunExposure,
} from "./sun";
import { listSeasonDates } from "./sun-calendar";
import { traceSunPath, type SunPath } from "./sun-path";
import type { Mount, PlacementSite, RuleResult, RuleStatus, SunOnHouseSummary } from "./types";

export type SiteLocation = {
  lat: number;
  lon: number;
  /** How the buyer gave it: typed coordinates win over a ZIP when both arrive. */
  source: "coordinates" | "zip";
  zip?: string;
};

/** The site's climate as the answer (and a saved site) keeps it: from lib/climate's one result. */
export type SiteClimate = {
  /** The warmest month's average daily high, °F, unrounded (the older name is kept for saved sites). */
  julyHighF: number;
  julyHighC: number;
  warmestMonth: WarmestMonth;
  /** Rounded for display, never across the band's edge. */
  display: ClimateDisplay;
  source: "typed" | "stations";
  /** The stations used, nearest first (stations only). */
  stations?: NearbyStation[];
  /** A sentence when the value lies within 1 °F of a band edge, else null. */
  nearEdgeNote: string | null;
  band: ClimateBand;
};

export function toSiteClimate(climate: Climate): SiteClimate {
  return {
    julyHighF: climate.valueF,
    julyHighC: climate.valueC,
    warmestMonth: climate.warmestMonth,
    display: climate.display,
    source: climate.source.kind === "typed" ? "typed" : "stations",
    ...(climate.stations.length > 0 ? { stations: climate.stations } : {}),
    nearEdgeNote: climate.nearEdge?.note ?? null,
    band: climate.band,
  };
}

type Figure = {
  /** Mean hours a day over the season days. */
  hours: number;
  morningHours: number;
  morningShare: number;
  /** Hours on the midsummer day (June 21 north, December 21 south). */
  solsticeHours: number;
  /** The season mean with nothing blocking the sky. */
  openSkyHours: number;
};

export type PlacementSun = {
  seasonLabel: string;
  mount: Mount;
  exposure: SunExposure;
  /** P4 rates this: by mount, under the skyline. */
  house: Figure;
  /** The front face (the better half of a back-to-back pair), under the skyline. */
  face: Figure & { deg: number; words: string };
  /** A pole in the open here: the most sun any house at this place can get. */
  openPoleHours: number;
  /** The sunniest wall here under this skyline. */
  bestWall: { deg: number; words: string; hours: number };
  skyline: {
    /** The 16 angles given (all zeros for a described open field), or null when none was given. */
    profile: number[] | null;
    effect: SkylineEffect;
    /** Plain words: what was assumed, or what the skyline takes in all … */
    summary: string;
    /** … and where (one sentence per stretch of skyline that takes sun). */
    parts: string[];
  };
  byDate: SeasonDayOnHouse[];
  /** Minutes per local solar hour (24 entries each): season means and the midsummer day. */
  byHour: {
    seasonHouse: number[];
    seasonFace: number[];
    solsticeHouse: number[];
    solsticeFace: number[];
  };
  solsticeDate: string;
  /** The sun's path at midsummer and on the season day with the lowest sun, for the chart. */
  paths: { solstice: SunPath; seasonLow: SunPath };
};

export type PlacementAnswer = {
  location: SiteLocation & { hemisphere: Hemisphere };
  climate: Omit<SiteClimate, "band">;
  band: {
    id: BandId;
    label: string;
    rangeText: string;
    shades: readonly string[];
    ventsNeeded: boolean;
  };
  sun: PlacementSun;
  rules: RuleResult[];
  label: RuleStatus;
};

export function toPlacementSite({
  input,
  location,
}: {
  input: PlacementInput;
  location: Pick<SiteLocation, "lat" | "lon">;
}): PlacementSite {
  return {
    lat: location.lat,
    lon: location.lon,
    mount: input.mount,
    heightFt: input.heightFt,
    facingDeg: input.facingDeg,
    pairedBackToBack: input.pairedBackToBack,
    stacked: input.stacked,
    waterMi: input.waterMi,
    woodsEdgeFt: input.woodsEdgeFt,
    clearFlightPath: input.clearFlightPath,
    brightLight: input.brightLight,
    predators: input.predators,
  };
}

export function toSkylineEffect({
  season,
  skyline,
}: {
  season: Pick<SeasonOnHouse, "lostMorning" | "lostAfternoon" | "openSky" | "house">;
  skyline: Skyline | null | undefined;
}): SkylineEffect {
  return {
    described: skyline !== null && skyline !== undefined,
    lostMorning: season.lostMorning,
    lostAfternoon: season.lostAfternoon,
    openSkyHours: season.openSky.houseHours,
    hours: season.house.hours,
  };
}

/** The figures P4 reads, from a season computed at the site's sun face. */
export function summarizeSeasonSun({
  season,
  site,
  faceDeg,
  skyline,
}: {
  season: SeasonOnHouse;
  site: Pick<PlacementSite, "mount" | "pairedBackToBack">;
  faceDeg: number;
  skyline: Skyline | null | undefined;
}): SunOnHouseSummary {
  const effect = toSkylineEffect({ season, skyline });
  return {
    mount: site.mount,
    pairedBackToBack: site.pairedBackToBack,
    house: season.house,
    face: { ...season.face, deg: faceDeg },
    bestWall: season.bestWall,
    openPoleHours: season.openSky.allRoundHours,
    skyline: {
      described: effect.described,
      lostHours: Math.max(0, season.openSky.houseHours - season.house.hours),
      mainDirection: effect.described ? findMainLoss(effect) : null,
    },
  };
}

/** The season day whose sun stands lowest at noon: the lower edge of the season's band of paths. */
function traceSeasonLowPath({ lat, lon }: { lat: number; lon: number }): SunPath {
  const dates = listSeasonDates({ lat });
  const edges = [dates[0], dates.at(-1)].filter((d): d is string => Boolean(d));
  const paths = edges.map((date) => traceSunPath({ lat, lon, date }));
  const peak = (path: SunPath) => Math.max(-90, ...path.points.map((p) => p.altitude));
  return paths.reduce((low, path) => (peak(path) < peak(low) ? path : low));
}

export function buildPlacementAnswer({
  input,
  location,
  climate,
}: {
  input: PlacementInput;
  location: SiteLocation;
  climate: SiteClimate;
}): PlacementAnswer {
  const site = toPlacementSite({ input, location });
  // Given (even as all zeros, "open field") or not: only an absent skyline is "assumed open".
  const skyline = input.skyline ?? null;
  const faceDeg = normalizeBearing(findSunFaceBearing(site));
  const season = seasonSunOnHouse({
    lat: site.lat,
    lon: site.lon,
    facingDeg: faceDeg,
    mount: site.mount,
    skyline,
  });
  const summary = summarizeSeasonSun({ season, site, faceDeg, skyline });
  const { rules, label } = checkPlacement(site, { julyHighF: climate.julyHighF, sun: summary });
  const { band, ...climateRest } = climate;
  const effect = toSkylineEffect({ season, skyline });
  const words = describeSkylineEffect(effect);

  return {
    location: { ...location, hemisphere: season.hemisphere },
    climate: climateRest,
    band: {
      id: band.id,
      label: band.label,
      rangeText: band.rangeText,
      shades: band.shades,
      ventsNeeded: band.ventsNeeded,
    },
    sun: {
      seasonLabel: season.seasonLabel,
      mount: site.mount,
      exposure: season.exposure,
      house: {
        ...pickTally(season.house),
        solsticeHours: season.solstice.house.hours,
        openSkyHours: season.openSky.houseHours,
      },
      face: {
        ...pickTally(season.face),
        solsticeHours: season.solstice.face.hours,
        openSkyHours: season.openSky.faceHours,
        deg: faceDeg,
        words: describeBearing(faceDeg),
      },
      openPoleHours: season.openSky.allRoundHours,
      bestWall: { ...season.bestWall, words: describeBearing(season.bestWall.deg) },
      skyline: { profile: skyline ? [...skyline] : null, effect, ...words },
      byDate: season.byDate,
      byHour: {
        seasonHouse: season.house.byHour,
        seasonFace: season.face.byHour,
        solsticeHouse: season.solstice.house.byHour,
        solsticeFace: season.solstice.face.byHour,
      },
      solsticeDate: season.solstice.date,
      paths: {
        solstice: traceSunPath({ lat: site.lat, lon: site.lon, date: season.solstice.date }),
        seasonLow: traceSeasonLowPath(site),
      },
    },
    rules,
    label,
  };
}

const pickTally = ({ hours, morningHours, morningShare }: SeasonOnHouse["house"]) => ({
  hours,
  morningHours,
  morningShare,
});
