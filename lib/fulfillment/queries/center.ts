import "server-only";
import { getDb } from "@/db/client";
import { organization } from "@/db/schema";

export type CenterDetails = { name: string; street: string; city: string; state: string; zip: string; phone: string; email: string };

/** The center's name and address as the admin keeps them (printed on slips, shown for pickup). */
export async function getCenterDetails(): Promise<CenterDetails | null> {
  const db = await getDb();
  const [org] = await db.select().from(organization).limit(1);
  return org ? { name: org.displayName, street: org.street, city: org.city, state: org.state, zip: org.zip, phone: org.phone, email: org.email } : null;
}
