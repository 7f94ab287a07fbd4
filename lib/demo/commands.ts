import "server-only";
import { eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import {
  houseModels,
  inspections,
  organization,
  shippingRates,
  stockMovements,
  taxRates,
  users,
} from "@/db/schema";
import { hashPassword } from "@/lib/auth/passwords";
import { DEMO_MODELS, DEMO_ORGANIZATION, DEMO_SHIPPING_RATES, DEMO_TAX_RATES, DEMO_USERS } from "./seed-data";
import { seedDemoRoostReports } from "./roost-reports";

const DAY_MS = 24 * 60 * 60 * 1000;

/** Loads the demo scenario. Idempotent: rows that exist (by e-mail, slug, tier, state) are left alone. */
export async function seedDemo(db: Db, now = new Date()): Promise<void> {
  await db.insert(organization).values({ id: 1, ...DEMO_ORGANIZATION }).onConflictDoNothing();
  for (const u of DEMO_USERS) {
    await db
      .insert(users)
      .values({ email: u.email, name: u.name, role: u.role, passwordHash: await hashPassword(u.password) })
      .onConflictDoNothing();
  }
  await db.insert(shippingRates).values(DEMO_SHIPPING_RATES).onConflictDoNothing();
  await db
    .insert(taxRates)
    .values(Object.entries(DEMO_TAX_RATES).map(([state, basisPoints]) => ({ state, basisPoints })))
    .onConflictDoNothing();

  const [staff] = await db.select().from(users).where(eq(users.role, "staff")).limit(1);
  for (const m of DEMO_MODELS) {
    await db.transaction(async (tx) => {
      const [row] = await tx
        .insert(houseModels)
        .values({
          slug: m.slug,
          name: m.name,
          tagline: m.tagline,
          description: m.description,
          status: m.status,
          priceCents: m.priceCents,
          spec: m.spec,
          mounts: m.mounts,
          backToBackKit: m.backToBackKit ?? false,
          builderName: m.builderName,
          cartonLengthIn: m.carton.lengthIn,
          cartonWidthIn: m.carton.widthIn,
          cartonHeightIn: m.carton.heightIn,
          cartonWeightLb: m.carton.weightLb,
          stock: m.stock,
          lowStockThreshold: m.lowStockThreshold,
          publishedAt: m.status === "published" ? new Date(now.getTime() - 400 * DAY_MS) : null,
        })
        .onConflictDoNothing()
        .returning();
      if (!row) return;
      if (m.stock > 0) {
        await tx.insert(stockMovements).values({
          modelId: row.id,
          kind: "received",
          delta: m.stock,
          stockAfter: m.stock,
          reason: "Opening stock",
          batch: "demo-opening",
          builderName: m.builderName,
          actorId: staff?.id ?? null,
        });
      }
      if (m.inspectedDaysAgo !== null) {
        await tx.insert(inspections).values({
          modelId: row.id,
          inspectedOn: new Date(now.getTime() - m.inspectedDaysAgo * DAY_MS),
          inspector: staff?.name ?? "Workshop staff",
          measured: {
            chamberGapIn: m.spec.chamberGapIn,
            chamberHeightIn: m.spec.chamberHeightIn,
            chamberWidthIn: m.spec.chamberWidthIn,
            landingAreaIn: m.spec.landingAreaIn,
            roughening: m.spec.interiorSurface,
            seamsSealed: m.spec.seamsSealed,
          },
          passed: true,
          notes: "Measured a built unit from the first batch.",
          recordedById: staff?.id ?? null,
        });
      }
    });
  }
  await seedDemoRoostReports(db, now);
}
