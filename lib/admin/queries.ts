import "server-only";
import { asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { organization, shippingRates, taxRates } from "@/db/schema";

export async function getOrganization() {
  const db = await getDb();
  const [row] = await db.select().from(organization).where(eq(organization.id, 1));
  return row ?? null;
}

export async function listShippingRates() {
  const db = await getDb();
  return db.select({ maxBillableLb: shippingRates.maxBillableLb, cents: shippingRates.cents }).from(shippingRates).orderBy(asc(shippingRates.maxBillableLb));
}

export async function listTaxRates() {
  const db = await getDb();
  return db.select({ state: taxRates.state, basisPoints: taxRates.basisPoints }).from(taxRates).orderBy(asc(taxRates.state));
}
