import "server-only";
import { asc, eq, inArray } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db/client";
import { houseModels, organization, shippingRates, taxRates } from "@/db/schema";
import { AppError } from "@/lib/http/errors";
import { PricingError, quoteOrder, type Quote } from "../pricing";
import type { QuoteRequest } from "../schemas";

export type QuoteItems = { slug: string; quantity: number }[];

export type PricedModel = {
  id: string;
  slug: string;
  name: string;
  priceCents: number;
  stock: number;
  carton: { lengthIn: number; widthIn: number; heightIn: number; weightLb: number };
};

/**
 * Prices a cart from the database alone: list prices, cartons, the admin's rate table and the
 * ship-to state's tax rate (pickup: the center's own state). Nothing the client sends but slugs,
 * quantities, the method, the state and the gift is used.
 */
export async function quoteFromDatabase(
  db: DbOrTx,
  { items, method, state, giftCents }: { items: QuoteItems; method: "parcel" | "pickup"; state?: string; giftCents: number },
): Promise<{ quote: Quote; models: PricedModel[] }> {
  const slugs = items.map((i) => i.slug);
  const rows = slugs.length
    ? await db.select().from(houseModels).where(inArray(houseModels.slug, slugs))
    : [];
  const bySlug = new Map(rows.map((r) => [r.slug, r]));
  const models: PricedModel[] = [];
  for (const [index, item] of items.entries()) {
    const row = bySlug.get(item.slug);
    if (!row || row.status !== "published") {
      throw new AppError("bad_request", `"${item.slug}" is not a house on sale.`, { [`items.${index}.slug`]: "Not on sale." });
    }
    if (item.quantity > row.stock) {
      throw new AppError(
        "out_of_stock",
        row.stock === 0 ? `${row.name} is out of stock.` : `Only ${row.stock} of ${row.name} in stock.`,
        { [`items.${index}.quantity`]: `Only ${row.stock} in stock.` },
      );
    }
    models.push({
      id: row.id,
      slug: row.slug,
      name: row.name,
      priceCents: row.priceCents,
      stock: row.stock,
      carton: { lengthIn: row.cartonLengthIn, widthIn: row.cartonWidthIn, heightIn: row.cartonHeightIn, weightLb: row.cartonWeightLb },
    });
  }
  const tiers = await db.select({ maxBillableLb: shippingRates.maxBillableLb, cents: shippingRates.cents }).from(shippingRates).orderBy(asc(shippingRates.maxBillableLb));
  let taxState = state;
  if (method === "pickup" || !taxState) {
    const [org] = await db.select({ state: organization.state }).from(organization).where(eq(organization.id, 1));
    taxState = org?.state;
  }
  const [tax] = taxState ? await db.select().from(taxRates).where(eq(taxRates.state, taxState)) : [];
  try {
    const quote = quoteOrder({
      lines: items.map((item, i) => {
        const m = models[i]!;
        return { slug: m.slug, name: m.name, unitPriceCents: m.priceCents, quantity: item.quantity, carton: m.carton };
      }),
      method,
      // An empty table is refused by the pricing rule with the missing rate named, never free.
      rateTiers: tiers,
      taxRateBasisPoints: tax?.basisPoints ?? 0,
      giftCents,
    });
    return { quote, models };
  } catch (error) {
    if (error instanceof PricingError) {
      throw new AppError("bad_request", error.message, error.field ? { [error.field]: error.message } : undefined);
    }
    throw error;
  }
}

/** The cart page's quote: the same prices checkout will charge, shaped for the browser. */
export async function quoteCart(input: QuoteRequest) {
  const { quote } = await quoteFromDatabase(await getDb(), {
    items: input.items,
    method: input.method,
    state: input.shipTo?.state,
    giftCents: input.giftCents,
  });
  return {
    lines: quote.lines,
    subtotalCents: quote.subtotalCents,
    shipping: {
      method: quote.shipping.method,
      parcels: quote.shipping.parcels.map((p) => ({ slug: p.slug, billableLb: p.billableLb, cents: p.cents })),
      cents: quote.shipping.cents,
    },
    taxCents: quote.taxCents,
    giftCents: quote.giftCents,
    totalCents: quote.totalCents,
  };
}
