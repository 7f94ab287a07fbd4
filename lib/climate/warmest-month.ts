// "July" in the store's climate rules means the warmest month (PRODUCT.md §2): north of the
// equator that is July, south of it January. Source: the seasons are reversed across the equator
// (common knowledge; NOAA's own normals show it: Pago Pago, American Samoa, 14.33° S, January normal
// high 87.6 °F against July 84.2 °F). A point on the equator itself counts as north: no station of
// the table lies between 1° S and 1° N, so the choice never decides a lookup.

export type WarmestMonth = "july" | "january";
export type Hemisphere = "north" | "south";

export function hemisphereAt(lat: number): Hemisphere {
  if (!Number.isFinite(lat) || Math.abs(lat) > 90) throw new RangeError(`Not a latitude: ${lat}.`);
  return lat < 0 ? "south" : "north";
}

export function warmestMonthOf(hemisphere: Hemisphere): WarmestMonth {
  return hemisphere === "south" ? "january" : "july";
}

export function warmestMonthAt(lat: number): WarmestMonth {
  return warmestMonthOf(hemisphereAt(lat));
}

export const MONTH_WORDS: Record<WarmestMonth, string> = { july: "July", january: "January" };
