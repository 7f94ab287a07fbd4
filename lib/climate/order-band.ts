import { BAND_IDS, bandForJulyHigh, CLIMATE_BANDS, type BandId } from "@/lib/catalog/climate-bands";
import type { BandChoice } from "./band-cookie";

// The band travels with the order (PRODUCT.md §2): what the buyer saw in the catalog, and where it
// came from, is written on the order at checkout, so the confirmation and the install guide say
// what the catalog said. Pure. The cookie is the browser's, so it is not trusted blindly: when it
// carries the value behind the band, the band is worked out again from that value (the server's
// rule wins over a cookie edited by hand). Common practice, no source.

export const ORDER_BAND_SOURCES = ["zip", "typed", "site", "chosen", "none"] as const;
export type OrderBandSource = (typeof ORDER_BAND_SOURCES)[number];

export type OrderBand = {
  bandId: BandId | null;
  bandSource: OrderBandSource;
  bandValueF: number | null;
  bandZip: string | null;
  bandTypedValue: number | null;
  bandTypedUnit: "F" | "C" | null;
};

export const NO_ORDER_BAND: OrderBand = {
  bandId: null,
  bandSource: "none",
  bandValueF: null,
  bandZip: null,
  bandTypedValue: null,
  bandTypedUnit: null,
};

export function orderBandFromChoice(choice: BandChoice | null): OrderBand {
  if (!choice) return NO_ORDER_BAND;
  const valueF = choice.valueF !== undefined && Number.isFinite(choice.valueF) ? choice.valueF : null;
  const bandId = valueF !== null && choice.source !== "chosen" ? bandForJulyHigh(valueF).id : choice.id;
  return {
    bandId,
    bandSource: choice.source,
    bandValueF: choice.source === "chosen" ? null : valueF,
    bandZip: choice.source === "chosen" ? null : (choice.zip ?? null),
    bandTypedValue: choice.source === "typed" ? (choice.typed?.value ?? null) : null,
    bandTypedUnit: choice.source === "typed" ? (choice.typed?.unit ?? null) : null,
  };
}

/** Words for where the band came from, for the confirmation and the guide. */
export function describeOrderBandSource(band: Pick<OrderBand, "bandSource" | "bandZip" | "bandTypedValue" | "bandTypedUnit">): string {
  switch (band.bandSource) {
    case "zip":
      return band.bandZip ? `the climate normals near ZIP ${band.bandZip}, as you looked it up in our store` : "the ZIP code you looked up in our store";
    case "typed":
      return band.bandTypedValue !== null
        ? `the summer high you gave us (${band.bandTypedValue} °${band.bandTypedUnit ?? "F"})`
        : "the summer high you gave us";
    case "site":
      return "your site check";
    case "chosen":
      return "the band you chose in our catalog";
    case "none":
      return "no band";
  }
}

/** The stored band of an order (its database columns) in words, or null when none was stored. */
export function orderBandWords(order: {
  bandId: string | null;
  bandSource: string | null;
  bandZip: string | null;
  bandTypedValue: number | null;
  bandTypedUnit: string | null;
}): { bandId: BandId; label: string; basis: string } | null {
  const bandId = BAND_IDS.find((id) => id === order.bandId);
  if (!bandId) return null;
  const bandSource = ORDER_BAND_SOURCES.find((s) => s === order.bandSource) ?? "chosen";
  const bandTypedUnit = order.bandTypedUnit === "C" ? "C" : order.bandTypedUnit === "F" ? "F" : null;
  return {
    bandId,
    label: CLIMATE_BANDS[bandId].label,
    basis: describeOrderBandSource({ bandSource, bandZip: order.bandZip, bandTypedValue: order.bandTypedValue, bandTypedUnit }),
  };
}
