import { billableWeightLb, type Carton } from "./billable-weight";
import { formatUsd, isCents, percentOfCents, sumCents } from "./money";

// Prices an order: goods, shipping per carton, sales tax and an optional gift (PRODUCT.md §5).
// Every amount is integer cents.

export const SHIPPING_METHODS = ["parcel", "pickup"] as const;
export type ShippingMethod = (typeof SHIPPING_METHODS)[number];

/** Common practice, no source: a household rarely needs more than ten of one house; more is a call to the center. */
export const QUANTITY_MIN = 1;
export const QUANTITY_MAX = 10;
/** The center's setting, no source: gifts from $1 (card fees eat smaller ones) up to $10,000 online. */
export const GIFT_MIN_CENTS = 100;
export const GIFT_MAX_CENTS = 1_000_000;
/** A typo guard, from memory: combined U.S. state and local rates top out near 10–12%, so over 20% is a slip (725 typed as 7250). */
export const TAX_RATE_MAX_BASIS_POINTS = 2_000;

export type RateTier = { maxBillableLb: number; cents: number };

export type OrderLineInput = {
  slug: string;
  name: string;
  unitPriceCents: number;
  quantity: number;
  carton: Carton;
};

export type QuoteInput = {
  lines: readonly OrderLineInput[];
  method: ShippingMethod;
  /** The admin's table: price per billable-weight tier, in any order. */
  rateTiers: readonly RateTier[];
  /** The ship-to state's rate in basis points: 725 = 7.25%. */
  taxRateBasisPoints: number;
  giftCents: number;
};

export type QuoteLine = {
  slug: string;
  name: string;
  quantity: number;
  unitPriceCents: number;
  lineCents: number;
};
export type Parcel = { slug: string; billableLb: number; cents: number };

export type Quote = {
  lines: QuoteLine[];
  subtotalCents: number;
  shipping: { method: ShippingMethod; parcels: Parcel[]; cents: number };
  taxCents: number;
  giftCents: number;
  totalCents: number;
};

export type PricingErrorCode =
  | "no_items"
  | "duplicate_item"
  | "bad_quantity"
  | "bad_price"
  | "bad_carton"
  | "bad_method"
  | "no_rate_tiers"
  | "bad_rate_tier"
  | "parcel_over_heaviest_tier"
  | "bad_tax_rate"
  | "bad_gift";

/** Bad input to a quote. `field` is a dotted path ("lines.0.quantity") matching the form's field names. */
export class PricingError extends Error {
  override name = "PricingError";
  constructor(
    readonly code: PricingErrorCode,
    readonly field: string,
    message: string,
  ) {
    super(message);
  }
}

function checkLine(line: OrderLineInput, index: number): void {
  const at = `lines.${index}`;
  const { quantity, unitPriceCents, carton } = line;
  if (!Number.isInteger(quantity) || quantity < QUANTITY_MIN || quantity > QUANTITY_MAX) {
    throw new PricingError(
      "bad_quantity",
      `${at}.quantity`,
      `Choose between ${QUANTITY_MIN} and ${QUANTITY_MAX} of ${line.name}.`,
    );
  }
  if (!isCents(unitPriceCents) || unitPriceCents <= 0) {
    throw new PricingError("bad_price", `${at}.unitPriceCents`, `${line.name} has no valid price.`);
  }
  for (const key of ["lengthIn", "widthIn", "heightIn", "weightLb"] as const) {
    const value = carton[key];
    if (!Number.isFinite(value) || value <= 0) {
      throw new PricingError(
        "bad_carton",
        `${at}.carton.${key}`,
        `${line.name} has no valid carton size and weight, so its shipping can't be priced.`,
      );
    }
  }
}

function sortedTiers(rateTiers: readonly RateTier[]): RateTier[] {
  if (rateTiers.length === 0) {
    throw new PricingError(
      "no_rate_tiers",
      "rateTiers",
      "Shipping rates are not set up yet. Choose local pickup, or ask the center to add rates.",
    );
  }
  const seen = new Set<number>();
  rateTiers.forEach((tier, index) => {
    const validMax = Number.isInteger(tier.maxBillableLb) && tier.maxBillableLb > 0;
    if (!validMax || !isCents(tier.cents) || tier.cents < 0 || seen.has(tier.maxBillableLb)) {
      throw new PricingError(
        "bad_rate_tier",
        `rateTiers.${index}`,
        "Each shipping tier needs a distinct whole-pound limit above 0 and a price of $0.00 or more.",
      );
    }
    seen.add(tier.maxBillableLb);
  });
  return [...rateTiers].sort((a, b) => a.maxBillableLb - b.maxBillableLb);
}

// Common practice, no source: a tier's limit includes its own weight ("up to 20 lb"), and the
// lightest tier that covers the parcel applies.
function tierFor(billableLb: number, sorted: readonly RateTier[]): RateTier | undefined {
  return sorted.find((candidate) => billableLb <= candidate.maxBillableLb);
}

/** The price of one parcel, or null when it is heavier than every tier. */
export function parcelRateCents({
  billableLb,
  rateTiers,
}: {
  billableLb: number;
  rateTiers: readonly RateTier[];
}): number | null {
  return tierFor(billableLb, sortedTiers(rateTiers))?.cents ?? null;
}

function priceParcels(lines: readonly OrderLineInput[], rateTiers: readonly RateTier[]): Parcel[] {
  if (rateTiers.length === 0) {
    // Name the parcel the missing rate is for, so the buyer and the staff reading the message
    // know which rate to add (an empty table must never ship for free).
    const first = lines[0]!;
    const { billableLb } = billableWeightLb(first.carton);
    throw new PricingError(
      "no_rate_tiers",
      "rateTiers",
      `No shipping rate is set up yet, so the ${first.name} parcel (${billableLb} lb billable) can't be priced. ` +
        "Choose local pickup, or ask the center to add a shipping rate that covers it.",
    );
  }
  const tiers = sortedTiers(rateTiers);
  const heaviest = tiers[tiers.length - 1];
  const parcels: Parcel[] = [];
  lines.forEach((line, index) => {
    const { billableLb } = billableWeightLb(line.carton);
    const tier = tierFor(billableLb, tiers);
    if (!tier) {
      throw new PricingError(
        "parcel_over_heaviest_tier",
        `lines.${index}.carton`,
        `The ${line.name} carton bills at ${billableLb} lb, more than the heaviest shipping tier ` +
          `(${heaviest?.maxBillableLb ?? 0} lb). Choose local pickup, or ask the center to add a heavier tier.`,
      );
    }
    // One carton per house, so two of a model ship as two parcels (PRODUCT.md §5).
    for (let unit = 0; unit < line.quantity; unit += 1) {
      parcels.push({ slug: line.slug, billableLb, cents: tier.cents });
    }
  });
  return parcels;
}

function checkGift(giftCents: number): void {
  const inRange = giftCents === 0 || (giftCents >= GIFT_MIN_CENTS && giftCents <= GIFT_MAX_CENTS);
  if (!isCents(giftCents) || !inRange) {
    throw new PricingError(
      "bad_gift",
      "giftCents",
      `A gift can be from ${formatUsd(GIFT_MIN_CENTS)} to ${formatUsd(GIFT_MAX_CENTS)}, or none.`,
    );
  }
}

/**
 * Prices an order. Sales tax is charged on the goods subtotal only:
 * - not on shipping: the center's setting. Whether delivery charges are taxable varies by state
 *   (common practice varies by state, no single source); the admin's rate is for goods.
 * - never on a gift: a gift buys nothing, so it is not a sale.
 * Tax is rounded half up to the cent on the whole goods subtotal, not line by line.
 */
export function quoteOrder(input: QuoteInput): Quote {
  const { lines, method, rateTiers, taxRateBasisPoints, giftCents } = input;
  if (!(SHIPPING_METHODS as readonly string[]).includes(method)) {
    throw new PricingError("bad_method", "method", "Choose parcel delivery or local pickup.");
  }
  checkGift(giftCents);
  if (lines.length === 0 && giftCents === 0) {
    throw new PricingError("no_items", "lines", "Add a house or a gift before checking out.");
  }
  const slugs = new Set<string>();
  lines.forEach((line, index) => {
    checkLine(line, index);
    if (slugs.has(line.slug)) {
      throw new PricingError(
        "duplicate_item",
        `lines.${index}.slug`,
        `${line.name} is in the cart twice; change its quantity instead.`,
      );
    }
    slugs.add(line.slug);
  });
  const withinRate = Number.isInteger(taxRateBasisPoints) && taxRateBasisPoints >= 0;
  if (!withinRate || taxRateBasisPoints > TAX_RATE_MAX_BASIS_POINTS) {
    throw new PricingError(
      "bad_tax_rate",
      "taxRateBasisPoints",
      `The sales tax rate must be a whole number of basis points from 0 to ${TAX_RATE_MAX_BASIS_POINTS} (725 means 7.25%).`,
    );
  }

  const quotedLines: QuoteLine[] = lines.map((line) => ({
    slug: line.slug,
    name: line.name,
    quantity: line.quantity,
    unitPriceCents: line.unitPriceCents,
    lineCents: line.unitPriceCents * line.quantity,
  }));
  const subtotalCents = sumCents(quotedLines.map((line) => line.lineCents));
  // Pickup ships nothing, and a gift on its own has nothing to ship.
  const parcels = method === "parcel" && lines.length > 0 ? priceParcels(lines, rateTiers) : [];
  const shippingCents = sumCents(parcels.map((parcel) => parcel.cents));
  const taxCents = percentOfCents({ cents: subtotalCents, basisPoints: taxRateBasisPoints });
  return {
    lines: quotedLines,
    subtotalCents,
    shipping: { method, parcels, cents: shippingCents },
    taxCents,
    giftCents,
    totalCents: sumCents([subtotalCents, shippingCents, taxCents, giftCents]),
  };
}
