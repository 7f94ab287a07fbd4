import "server-only";
import { asc, eq } from "drizzle-orm";
import { cache } from "react";
import { getDb } from "@/db/client";
import { houseModels, organization, shippingRates, taxRates } from "@/db/schema";
import { billableWeightLb } from "@/lib/checkout/billable-weight";
import { rateCoverage, type RateCoverage } from "@/lib/checkout/rate-coverage";
import { centerProfile, type CenterProfile } from "./center-profile";

export async function getOrganization() {
  const db = await getDb();
  const [row] = await db.select().from(organization).where(eq(organization.id, 1));
  return row ?? null;
}

/** The center's public name and address from its settings (neutral fallback without a row); once per request. */
export const getCenterProfile = cache(async (): Promise<CenterProfile> => centerProfile(await getOrganization()));

/** Whether the rate table prices a parcel of every house on sale (lib/checkout/rate-coverage.ts). */
export async function getRateCoverage(): Promise<RateCoverage> {
  const db = await getDb();
  const [rates, models] = await Promise.all([
    listShippingRates(),
    db
      .select({
        name: houseModels.name,
        lengthIn: houseModels.cartonLengthIn,
        widthIn: houseModels.cartonWidthIn,
        heightIn: houseModels.cartonHeightIn,
        weightLb: houseModels.cartonWeightLb,
      })
      .from(houseModels)
      .where(eq(houseModels.status, "published")),
  ]);
  let heaviest: { name: string; billableLb: number } | null = null;
  for (const m of models) {
    const { billableLb } = billableWeightLb(m);
    if (!heaviest || billableLb > heaviest.billableLb) heaviest = { name: m.name, billableLb };
  }
  return rateCoverage(rates, heaviest);
}

export async function listShippingRates() {
  const db = await getDb();
  return db.select({ maxBillableLb: shippingRates.maxBillableLb, cents: shippingRates.cents }).from(shippingRates).orderBy(asc(shippingRates.maxBillableLb));
}

export async function listTaxRates() {
  const db = await getDb();
  return db.select({ state: taxRates.state, basisPoints: taxRates.basisPoints }).from(taxRates).orderBy(asc(taxRates.state));
}
