// The demo scenario: an invented rehabilitation center in an invented town, invented people
// and invented house models. Local-only passwords; the README lists them.

export const DEMO_ORGANIZATION = {
  legalName: "Cedar Hollow Wildlife Rescue, Inc.",
  displayName: "Cedar Hollow Wildlife Rescue",
  street: "2180 Alder Bend Road",
  city: "Larkspur Falls",
  state: "OR",
  zip: "97399",
  taxId: "93-0000000",
  email: "hello@cedarhollow.example",
  phone: "(541) 555-0148",
};

export const DEMO_USERS = [
  { email: "supporter@cedarhollow.example", name: "Juniper Ames", role: "customer", password: "dusk-meadow-lantern" },
  { email: "workshop@cedarhollow.example", name: "Tobias Marlow", role: "staff", password: "cedar-shavings-42" },
  { email: "shipping@cedarhollow.example", name: "Priya Holloway", role: "fulfillment", password: "parcel-twine-88" },
  { email: "admin@cedarhollow.example", name: "Della Quist", role: "admin", password: "hollow-keeper-2026" },
] as const;

/** Parcel rates by billable-weight tier (the center's own table; the admin edits it). */
export const DEMO_SHIPPING_RATES = [
  { maxBillableLb: 10, cents: 1400 },
  { maxBillableLb: 20, cents: 1900 },
  { maxBillableLb: 30, cents: 2600 },
  { maxBillableLb: 50, cents: 3800 },
  { maxBillableLb: 70, cents: 5200 },
  { maxBillableLb: 150, cents: 9500 },
];

/** Sales tax in basis points by state: the center's settings, edited by the admin. */
export const DEMO_TAX_RATES: Record<string, number> = {
  WI: 500, MN: 688, IL: 625, IA: 600, MI: 600, CA: 725, TX: 625, NY: 400, WA: 650, AZ: 560, FL: 600, CO: 290,
  GA: 400, NC: 475, PA: 600, OH: 575, OR: 0, MT: 0, NH: 0, DE: 0,
};

type DemoSpec = {
  chamberCount: number;
  chamberGapIn: number;
  chamberHeightIn: number;
  chamberWidthIn: number;
  landingAreaIn: number;
  interiorSurface: "grooved" | "plastic-mesh" | "metal-mesh" | "smooth";
  grooveSpacingIn?: number;
  grooveDepthIn?: number;
  interiorFinish: "bare" | "stained" | "painted";
  seamsSealed: boolean;
  wood: "exterior-plywood" | "cedar" | "pressure-treated" | "other";
  outerHeightIn: number;
  outerWidthIn: number;
  openBottom: boolean;
  exteriorShade: "black" | "dark" | "medium" | "light" | "white";
  vented: boolean;
};

export type DemoModel = {
  slug: string;
  name: string;
  tagline: string;
  description: string;
  status: "draft" | "published";
  priceCents: number;
  mounts: ("pole" | "building")[];
  backToBackKit?: boolean;
  builderName: string;
  carton: { lengthIn: number; widthIn: number; heightIn: number; weightLb: number };
  stock: number;
  lowStockThreshold: number;
  /** Days ago the last inspection was done; null: never inspected. */
  inspectedDaysAgo: number | null;
  spec: DemoSpec;
};

const grooved = { interiorSurface: "grooved" as const, grooveSpacingIn: 0.375, grooveDepthIn: 0.0625 };
const sound = { interiorFinish: "stained" as const, seamsSealed: true, openBottom: true };

export const DEMO_MODELS: DemoModel[] = [
  {
    slug: "sparrowgate-single", name: "Sparrowgate Single", status: "published", priceCents: 6900,
    tagline: "One snug chamber for a garden wall in cool country.",
    description: "A compact single-chamber house for a sunny building wall where summers stay mild. A good first house; a larger one suits a nursery colony better.",
    mounts: ["building"], builderName: "Larkspur Falls Woodworkers' Circle",
    carton: { lengthIn: 26, widthIn: 16, heightIn: 6, weightLb: 9 }, stock: 14, lowStockThreshold: 4, inspectedDaysAgo: 40,
    spec: { chamberCount: 1, chamberGapIn: 0.75, chamberHeightIn: 22, chamberWidthIn: 14, landingAreaIn: 4, ...grooved, ...sound, wood: "cedar", outerHeightIn: 26, outerWidthIn: 16, exteriorShade: "black", vented: false },
  },
  {
    slug: "twin-ridge", name: "Twin Ridge", status: "published", priceCents: 8900,
    tagline: "Two chambers, dark finish, for mild summers.",
    description: "Two roosting crevices let bats shift between a warmer and a cooler spot. Dark exterior for places where July stays under the mid-80s.",
    mounts: ["building", "pole"], builderName: "Larkspur Falls Woodworkers' Circle",
    carton: { lengthIn: 27, widthIn: 18, heightIn: 7, weightLb: 12 }, stock: 9, lowStockThreshold: 3, inspectedDaysAgo: 120,
    spec: { chamberCount: 2, chamberGapIn: 0.875, chamberHeightIn: 22, chamberWidthIn: 15, landingAreaIn: 4, ...grooved, ...sound, wood: "exterior-plywood", outerHeightIn: 26, outerWidthIn: 17, exteriorShade: "dark", vented: false },
  },
  {
    slug: "larkspur-three", name: "Larkspur Three", status: "published", priceCents: 11900,
    tagline: "Three chambers in a medium shade, vented.",
    description: "A three-chamber house lined with plastic mesh, finished in a medium shade with a front vent for hot summers.",
    mounts: ["building", "pole"], builderName: "Hollow Creek Joinery",
    carton: { lengthIn: 29, widthIn: 19, heightIn: 8, weightLb: 15 }, stock: 6, lowStockThreshold: 3, inspectedDaysAgo: 200,
    spec: { chamberCount: 3, chamberGapIn: 0.75, chamberHeightIn: 23, chamberWidthIn: 16, landingAreaIn: 5, interiorSurface: "plastic-mesh", interiorFinish: "bare", seamsSealed: true, openBottom: true, wood: "cedar", outerHeightIn: 28, outerWidthIn: 18, exteriorShade: "medium", vented: true },
  },
  {
    slug: "hollow-four", name: "Hollow Four", status: "published", priceCents: 14900,
    tagline: "Our workhorse nursery house: four chambers, dark, vented.",
    description: "Four chambers give a nursery colony room to move as the day warms. Dark finish and a front vent suit warm summers across much of the country.",
    mounts: ["building", "pole"], builderName: "Larkspur Falls Woodworkers' Circle",
    carton: { lengthIn: 32, widthIn: 22, heightIn: 8.5, weightLb: 19 }, stock: 11, lowStockThreshold: 4, inspectedDaysAgo: 345,
    spec: { chamberCount: 4, chamberGapIn: 0.75, chamberHeightIn: 24, chamberWidthIn: 16, landingAreaIn: 5, ...grooved, ...sound, wood: "exterior-plywood", outerHeightIn: 30, outerWidthIn: 20, exteriorShade: "dark", vented: true },
  },
  {
    slug: "canyon-four-light", name: "Canyon Four", status: "published", priceCents: 15900,
    tagline: "Four chambers in a light shade for hot summers.",
    description: "Light exterior and two vents keep the chambers from overheating where July highs run in the upper 90s.",
    mounts: ["building", "pole"], builderName: "Hollow Creek Joinery",
    carton: { lengthIn: 33, widthIn: 23, heightIn: 9, weightLb: 21 }, stock: 7, lowStockThreshold: 3, inspectedDaysAgo: 90,
    spec: { chamberCount: 4, chamberGapIn: 1, chamberHeightIn: 24, chamberWidthIn: 17, landingAreaIn: 6, ...grooved, ...sound, wood: "cedar", outerHeightIn: 31, outerWidthIn: 21, exteriorShade: "light", vented: true },
  },
  {
    slug: "saltbush-white", name: "Saltbush", status: "published", priceCents: 15900,
    tagline: "White, vented, four chambers for the hottest places.",
    description: "Built for desert summers: a white exterior, vents front and sides. Hang it where it gets morning sun and afternoon shade.",
    mounts: ["building", "pole"], builderName: "Hollow Creek Joinery",
    carton: { lengthIn: 32, widthIn: 22, heightIn: 8.5, weightLb: 20 }, stock: 5, lowStockThreshold: 3, inspectedDaysAgo: 60,
    spec: { chamberCount: 4, chamberGapIn: 0.875, chamberHeightIn: 24, chamberWidthIn: 16, landingAreaIn: 5, ...grooved, ...sound, wood: "exterior-plywood", outerHeightIn: 30, outerWidthIn: 20, exteriorShade: "white", vented: true },
  },
  {
    slug: "ember-five", name: "Ember Five", status: "published", priceCents: 17900,
    tagline: "Five chambers, medium shade, generous height.",
    description: "Tall chambers and five crevices for a growing colony in warm-to-hot country.",
    mounts: ["building", "pole"], builderName: "Larkspur Falls Woodworkers' Circle",
    carton: { lengthIn: 34, widthIn: 24, heightIn: 10, weightLb: 25 }, stock: 2, lowStockThreshold: 3, inspectedDaysAgo: 20,
    spec: { chamberCount: 5, chamberGapIn: 0.75, chamberHeightIn: 25, chamberWidthIn: 18, landingAreaIn: 5, ...grooved, ...sound, wood: "cedar", outerHeightIn: 32, outerWidthIn: 22, exteriorShade: "medium", vented: true },
  },
  {
    slug: "northwind-six", name: "Northwind Six", status: "published", priceCents: 19900,
    tagline: "Six chambers, black, built to hold heat in cool summers.",
    description: "A black six-chamber house for northern and high places where July rarely reaches 85 °F. No vents: it keeps every bit of warmth.",
    mounts: ["building", "pole"], builderName: "Hollow Creek Joinery",
    carton: { lengthIn: 34, widthIn: 25, heightIn: 11, weightLb: 28 }, stock: 4, lowStockThreshold: 2, inspectedDaysAgo: 150,
    spec: { chamberCount: 6, chamberGapIn: 0.75, chamberHeightIn: 24, chamberWidthIn: 18, landingAreaIn: 5, ...grooved, ...sound, wood: "exterior-plywood", outerHeightIn: 31, outerWidthIn: 22, exteriorShade: "black", vented: false },
  },
  {
    slug: "backwoods-pair", name: "Backwoods Pair", status: "published", priceCents: 24900, backToBackKit: true,
    tagline: "A back-to-back pair for one pole: two houses, three chambers each.",
    description: "Two three-chamber houses bolted back to back on a pole, with a shared roof cap and a gap between them. Bats move front to back as the sun comes around.",
    mounts: ["pole"], builderName: "Larkspur Falls Woodworkers' Circle",
    carton: { lengthIn: 33, widthIn: 23, heightIn: 14, weightLb: 34 }, stock: 3, lowStockThreshold: 2, inspectedDaysAgo: 100,
    spec: { chamberCount: 6, chamberGapIn: 0.75, chamberHeightIn: 24, chamberWidthIn: 17, landingAreaIn: 5, ...grooved, ...sound, wood: "exterior-plywood", outerHeightIn: 30, outerWidthIn: 21, exteriorShade: "dark", vented: true },
  },
  {
    slug: "great-colony-hall", name: "Great Colony Hall", status: "published", priceCents: 39900,
    tagline: "A large colony house: eight chambers for hundreds of bats.",
    description: "For farms, parks and nature centers: eight chambers behind a broad landing area. Needs a sturdy pole or a barn wall and two people to hang.",
    mounts: ["building", "pole"], builderName: "Hollow Creek Joinery",
    carton: { lengthIn: 40, widthIn: 32, heightIn: 14, weightLb: 55 }, stock: 2, lowStockThreshold: 1, inspectedDaysAgo: 30,
    spec: { chamberCount: 8, chamberGapIn: 0.75, chamberHeightIn: 30, chamberWidthIn: 24, landingAreaIn: 6, ...grooved, ...sound, wood: "exterior-plywood", outerHeightIn: 38, outerWidthIn: 30, exteriorShade: "medium", vented: true },
  },
  {
    slug: "wide-gap-prototype", name: "Wide Gap Prototype", status: "draft", priceCents: 9900,
    tagline: "Draft: chambers too wide to list.",
    description: "A builder's first try. The 1½ in gaps invite wasps and birds; it waits for a rebuild.",
    mounts: ["building"], builderName: "Visiting builder",
    carton: { lengthIn: 28, widthIn: 18, heightIn: 9, weightLb: 14 }, stock: 0, lowStockThreshold: 0, inspectedDaysAgo: null,
    spec: { chamberCount: 3, chamberGapIn: 1.5, chamberHeightIn: 22, chamberWidthIn: 15, landingAreaIn: 4, ...grooved, ...sound, wood: "exterior-plywood", outerHeightIn: 27, outerWidthIn: 18, exteriorShade: "dark", vented: true },
  },
  {
    slug: "smooth-panel-prototype", name: "Smooth Panel Prototype", status: "draft", priceCents: 7900,
    tagline: "Draft: smooth, painted inside.",
    description: "Bats cannot grip smooth boards, and paint fills grooves. Not listable until the inside is roughened.",
    mounts: ["building"], builderName: "Visiting builder",
    carton: { lengthIn: 27, widthIn: 17, heightIn: 7, weightLb: 11 }, stock: 0, lowStockThreshold: 0, inspectedDaysAgo: null,
    spec: { chamberCount: 2, chamberGapIn: 0.75, chamberHeightIn: 22, chamberWidthIn: 15, landingAreaIn: 4, interiorSurface: "smooth", interiorFinish: "painted", seamsSealed: true, openBottom: true, wood: "cedar", outerHeightIn: 26, outerWidthIn: 17, exteriorShade: "medium", vented: false },
  },
];
