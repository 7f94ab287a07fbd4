import "server-only";
import { getDb } from "@/db/client";
import { organization, shippingRates, taxRates } from "@/db/schema";
import type { OrganizationSettings, ShippingRates, TaxRates } from "./settings-schemas";

export async function saveOrganization(input: OrganizationSettings) {
  const db = await getDb();
  await db.insert(organization).values({ id: 1, ...input }).onConflictDoUpdate({ target: organization.id, set: input });
}

/** Replaces the whole rate table at once, so a quote never sees half an edit. */
export async function saveShippingRates({ tiers }: ShippingRates) {
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx.delete(shippingRates);
    await tx.insert(shippingRates).values(tiers);
  });
}

export async function saveTaxRates({ rates }: TaxRates) {
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx.delete(taxRates);
    if (rates.length > 0) await tx.insert(taxRates).values(rates);
  });
}
