import "server-only";
import { asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { organization, shippingRates, taxRates } from "@/db/schema";
import type { OrganizationSettings, ShippingRates, TaxRates } from "./settings-schemas";

export async function getOrganization() {
  const db = await getDb();
  const [row] = await db.select().from(organization).where(eq(organization.id, 1));
  return row ?? null;
}

export async function saveOrganization(input: OrganizationSettings) {
  const db = await getDb();
  await db.insert(organization).values({ id: 1, ...input }).onConflictDoUpdate({ target: organization.id, set: input });
}

export async function listShippingRates() {
  const db = await getDb();
  return db.select({ maxBillableLb: shippingRates.maxBillableLb, cents: shippingRates.cents }).from(shippingRates).orderBy(asc(shippingRates.maxBillableLb));
}

/** Replaces the whole rate table at once, so a quote never sees half an edit. */
export async function saveShippingRates({ tiers }: ShippingRates) {
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx.delete(shippingRates);
    await tx.insert(shippingRates).values(tiers);
  });
}

export async function listTaxRates() {
  const db = await getDb();
  return db.select({ state: taxRates.state, basisPoints: taxRates.basisPoints }).from(taxRates).orderBy(asc(taxRates.state));
}

export async function saveTaxRates({ rates }: TaxRates) {
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx.delete(taxRates);
    if (rates.length > 0) await tx.insert(taxRates).values(rates);
  });
}
