import "server-only";
import { z } from "zod";
import type { OrderRow, SiteRow } from "@/db/schema";
import { BAND_IDS, nearBandEdge } from "@/lib/catalog/climate-bands";
import { orderBandWords } from "@/lib/climate/order-band";
import { lookupClimate } from "@/lib/climate/queries";
import { hemisphereAt, warmestMonthOf, type Hemisphere } from "@/lib/climate/warmest-month";
import { skylineEffectSchema } from "@/lib/placement/skyline-words";
import type { GuideClimate, GuideSite } from "./install-guide-content";
import type { OrgFooter } from "./message-types";

// Which summers the install guide is written for, in order of trust: the buyer's saved site
// check (they told us where the house goes), else the ship-to ZIP, else, for a pickup, the
// center's own ZIP; every lookup goes through lib/climate. The saved site's JSON is written by
// lib/placement; only the fields the guide needs are read, leniently, so a newer site format does
// not stop the guide.

const ruleSchema = z.object({
  name: z.string(),
  status: z.enum(["good", "fair", "poor"]),
  reason: z.string(),
  change: z.string().optional(),
});
const siteInputSchema = z.looseObject({
  lat: z.number().optional(),
  julyHighF: z.number().nullish(),
});
// A saved site's result is the placement answer (lib/placement/placement-answer.ts): the value
// sits under `climate`, the hemisphere under `location`.
const siteResultSchema = z.looseObject({
  label: z.enum(["good", "fair", "poor"]).optional(),
  julyHighF: z.number().nullish(),
  climate: z.looseObject({ julyHighF: z.number().nullish() }).optional(),
  location: z.looseObject({ lat: z.number().optional(), hemisphere: z.enum(["north", "south"]).optional() }).optional(),
  rules: z.array(ruleSchema).catch([]),
  sun: z
    .looseObject({ skyline: z.looseObject({ effect: skylineEffectSchema }) })
    .optional()
    .catch(undefined),
});

const addressSchema = z.looseObject({ zip: z.string() });

export type GuideContext = {
  climate: GuideClimate;
  site: GuideSite | null;
  hemisphere: Hemisphere;
};

function fromSite(site: SiteRow): GuideContext | null {
  const bandId = BAND_IDS.find((id) => id === site.bandId);
  if (!bandId) return null;
  const input = siteInputSchema.safeParse(site.input);
  const result = siteResultSchema.safeParse(site.result);
  const valueF =
    (result.success ? (result.data.climate?.julyHighF ?? result.data.julyHighF) : null) ??
    (input.success ? input.data.julyHighF : null) ??
    null;
  const label = result.success ? (result.data.label ?? (site.label as GuideSite["label"])) : null;
  const lat = (input.success ? input.data.lat : undefined) ?? (result.success ? result.data.location?.lat : undefined);
  const hemisphere =
    (result.success ? result.data.location?.hemisphere : undefined) ?? (lat !== undefined ? hemisphereAt(lat) : "north");
  return {
    climate: {
      known: true,
      bandId,
      julyHighF: valueF,
      warmestMonth: warmestMonthOf(hemisphere),
      basis: `your saved site check "${site.name}"`,
      nearEdgeNote: valueF === null ? null : (nearBandEdge(valueF)?.note ?? null),
    },
    site:
      result.success && label && ["good", "fair", "poor"].includes(label)
        ? {
            name: site.name,
            label,
            rules: result.data.rules,
            skylineEffect: result.data.sun?.skyline.effect ?? null,
          }
        : null,
    hemisphere,
  };
}

async function fromZip({ zip, basis }: { zip: string; basis: string }): Promise<{ climate: GuideClimate; hemisphere: Hemisphere }> {
  const found = await lookupClimate({ zip });
  if (!found.ok) {
    return {
      climate: {
        known: false,
        reason:
          found.code === "no-station-data"
            ? "We could not look up your summers just now, so here is the advice for every band; pick the line for the average daily high of your warmest month."
            : `We could not place ZIP ${zip} on our climate map, so here is the advice for every band; pick the line for the average daily high of your warmest month (our climate page finds it from any U.S. ZIP code).`,
      },
      hemisphere: "north",
    };
  }
  const { climate } = found;
  return {
    climate: {
      known: true,
      bandId: climate.band.id,
      julyHighF: climate.valueF,
      warmestMonth: climate.warmestMonth,
      basis,
      nearEdgeNote: climate.nearEdge?.note ?? null,
    },
    hemisphere: climate.hemisphere,
  };
}

/**
 * The band stored on the order at checkout (the one the catalog showed) wins: the guide says what
 * the catalog said. The site, or else the ZIP, still gives the hemisphere and the site's rules.
 */
export async function resolveGuideContext({
  order,
  site,
  org,
}: {
  order: OrderRow;
  site: SiteRow | null;
  org: OrgFooter;
}): Promise<GuideContext> {
  const fallback = await resolveFallbackContext({ order, site, org });
  const stored = orderBandWords(order);
  if (!stored) return fallback;
  const valueF = order.bandValueF ?? null;
  return {
    ...fallback,
    climate: {
      known: true,
      bandId: stored.bandId,
      julyHighF: valueF,
      warmestMonth: warmestMonthOf(fallback.hemisphere),
      basis: stored.basis,
      nearEdgeNote: valueF === null ? null : (nearBandEdge(valueF)?.note ?? null),
    },
  };
}

async function resolveFallbackContext({
  order,
  site,
  org,
}: {
  order: OrderRow;
  site: SiteRow | null;
  org: OrgFooter;
}): Promise<GuideContext> {
  const saved = site ? fromSite(site) : null;
  if (saved) return saved;
  const shipTo = addressSchema.safeParse(order.shipTo);
  if (order.method === "parcel" && shipTo.success) {
    const zip = shipTo.data.zip.slice(0, 5);
    return {
      ...(await fromZip({ zip, basis: `the climate normals near ZIP ${zip}, where we ship your order` })),
      site: null,
    };
  }
  const zip = org.zip.slice(0, 5);
  return {
    ...(await fromZip({
      zip,
      basis: `the climate normals near ZIP ${zip}, where you pick up your order (if the house goes somewhere with hotter or cooler summers, check your band on our climate page)`,
    })),
    site: null,
  };
}
