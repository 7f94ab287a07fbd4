import { sql } from "drizzle-orm";
import { getDb, type Db } from "@/db/client";

const TABLES = [
  "giving_settings",
  "gift_dedications",
  "monthly_gifts",
  "roost_reports",
  "roost_ask_opt_outs",
  "roost_report_link_uses",
  "sign_in_attempts",
  "password_reset_tokens",
  "email_preferences",
  "outbox",
  "webhook_events",
  "gifts",
  "refunds",
  "parcels",
  "order_events",
  "order_lines",
  "orders",
  "sites",
  "stock_movements",
  "inspections",
  "model_photos",
  "house_models",
  "shipping_rates",
  "tax_rates",
  "organization",
  "users",
];

/** The worker's shared database, emptied: call in beforeEach. */
export async function resetDb(): Promise<Db> {
  const db = await getDb();
  await db.execute(sql.raw(`truncate table ${TABLES.join(", ")} restart identity cascade`));
  return db;
}
