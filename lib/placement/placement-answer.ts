// The whole answer of a placement check, as `POST /api/placement` sends it and a saved site
// keeps it: the band used, the sun on the face (season, midsummer day, hour by hour), the ten
// rules and the label. Pure: location and climate are resolved by the caller.
import type { BandId } from "@/lib/catalog/climate-bands";
import { describeBearing, normalizeBearing } from "./bearing";
import type { PlacementInput } from "./schema";
import { checkPlacement, findSunFaceBearing } from "./rules";
import type { SiteClimate, SiteLocation } from "./site-climate";
import { seasonSunHours, type Hemisphere, type SeasonDay } from "./sun";
import type { PlacementSite, RuleResult, RuleStatus } from "./types";

/** Said wherever sun hours are shown (PRODUCT.md §4: "say plainly"). */
export const NOT_MODELLED_NOTE =
  "Sun hours are for open sky: trees, buildings and hills around the site are not modelled, so the sun your house really gets can only be less.";

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
  sun: {
    /** Mean hours a day over the season days (P4 rates this). */
    seasonMeanHours: number;
    /** Hours on the midsummer day (June 21 north, December 21 south). */
    solsticeHours: number;
    /** Share of the season's sun that comes before solar noon. */
    morningShare: number;
    seasonLabel: string;
    /** The face the hours are for: the house, or the better half of a back-to-back pair. */
    faceDeg: number;
    faceWords: string;
    byDate: SeasonDay[];
    /** Mean minutes of sun in each local solar hour over the season (24 entries). */
    seasonByHour: number[];
    solstice: { date: string; hours: number; morningHours: number; byHour: number[] };
  };
  rules: RuleResult[];
  label: RuleStatus;
  notModelled: string;
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
  const faceDeg = normalizeBearing(findSunFaceBearing(site));
  const season = seasonSunHours({ lat: site.lat, lon: site.lon, facingDeg: faceDeg });
  const { rules, label } = checkPlacement(site, { julyHighF: climate.julyHighF, sun: season });
  const { band, ...climateRest } = climate;

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
      seasonMeanHours: season.hours,
      solsticeHours: season.solstice.hours,
      morningShare: season.morningShare,
      seasonLabel: season.seasonLabel,
      faceDeg,
      faceWords: describeBearing(faceDeg),
      byDate: season.byDate,
      seasonByHour: season.meanByHour,
      solstice: {
        date: season.solstice.date,
        hours: season.solstice.hours,
        morningHours: season.solstice.morningHours,
        byHour: season.solstice.byHour,
      },
    },
    rules,
    label,
    notModelled: NOT_MODELLED_NOTE,
  };
}
