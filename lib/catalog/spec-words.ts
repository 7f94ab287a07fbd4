// The enum values of a house's specification and our own plain words for them, apart from the
// schema (lib/catalog/spec.ts) so the catalog's browser script can show them without zod.

export const SHADES = ["black", "dark", "medium", "light", "white"] as const;
export type Shade = (typeof SHADES)[number];

export const INTERIOR_SURFACES = ["grooved", "plastic-mesh", "metal-mesh", "smooth"] as const;
export type InteriorSurface = (typeof INTERIOR_SURFACES)[number];

export const INTERIOR_FINISHES = ["bare", "stained", "painted"] as const;
export type InteriorFinish = (typeof INTERIOR_FINISHES)[number];

export const WOODS = ["exterior-plywood", "cedar", "pressure-treated", "other"] as const;
export type Wood = (typeof WOODS)[number];

// Our own plain words for the enum values, shown to staff and buyers.
export const SHADE_LABELS: Record<Shade, string> = {
  black: "Black",
  dark: "Dark (deep brown or charcoal)",
  medium: "Medium (mid brown or grey)",
  light: "Light (tan or pale grey)",
  white: "White",
};

export const INTERIOR_SURFACE_LABELS: Record<InteriorSurface, string> = {
  grooved: "Grooved wood",
  "plastic-mesh": "Plastic mesh",
  "metal-mesh": "Metal mesh",
  smooth: "Smooth wood",
};

export const INTERIOR_FINISH_LABELS: Record<InteriorFinish, string> = {
  bare: "Bare wood",
  stained: "Stained",
  painted: "Painted",
};

export const WOOD_LABELS: Record<Wood, string> = {
  "exterior-plywood": "Exterior-grade plywood",
  cedar: "Cedar",
  "pressure-treated": "Pressure-treated lumber",
  other: "Other wood",
};
