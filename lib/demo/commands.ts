import "server-only";
import { randomBytes } from "node:crypto";
import { count, eq, inArray } from "drizzle-orm";
import type { Db } from "@/db/client";
import {
  houseModels,
  inspections,
  orderEvents,
  orderLines,
  orders,
  organization,
  outbox,
  parcels,
  roostReports,
  shippingRates,
  stockMovements,
  taxRates,
  users,
} from "@/db/schema";
import { hashPassword } from "@/lib/auth/passwords";
import { DEMO_MODELS, DEMO_ORGANIZATION, DEMO_SHIPPING_RATES, DEMO_TAX_RATES, DEMO_USERS } from "./seed-data";

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

// Invented roost reports on the invented models, marked demo (PRODUCT.md §8): enough houses
// known through two summers on four models to show a rate, too few on the others to show
// "not enough reports yet". All northern sites, reported on September 15 after each summer.
// No buyer, order or place behind them: band, mount and state are typed here.

type DemoHouses = {
  slug: string;
  /** Houses known through two summers: occupied within two summers, and empty after two. */
  occupied: number;
  empty: number;
  /** Houses in their first summer only (their two-summer outcome is not known yet). */
  young: number;
  bands: string[];
  mounts: string[];
  states: string[];
};

const DEMO_HOUSES: DemoHouses[] = [
  { slug: "hollow-four", occupied: 8, empty: 4, young: 2, bands: ["warm", "cool", "warm"], mounts: ["pole", "building", "pole"], states: ["WI", "MN", "IA"] },
  { slug: "northwind-six", occupied: 7, empty: 2, young: 1, bands: ["cool"], mounts: ["pole", "building"], states: ["MN", "MI", "WI"] },
  { slug: "larkspur-three", occupied: 3, empty: 4, young: 1, bands: ["warm", "hot"], mounts: ["building", "pole"], states: ["IL", "OH"] },
  { slug: "canyon-four-light", occupied: 4, empty: 2, young: 0, bands: ["hot", "very-hot"], mounts: ["pole"], states: ["AZ", "TX"] },
  { slug: "sparrowgate-single", occupied: 1, empty: 2, young: 1, bands: ["cool"], mounts: ["building", "tree"], states: ["OR"] },
  { slug: "twin-ridge", occupied: 1, empty: 1, young: 0, bands: ["warm"], mounts: ["building"], states: ["PA"] },
];

const pick = <T>(list: readonly T[], i: number): T => list[i % list.length]!;

export async function seedDemoRoostReports(db: Db, now = new Date()): Promise<void> {
  const [existing] = await db.select({ n: count() }).from(roostReports).where(eq(roostReports.demo, true));
  if ((existing?.n ?? 0) > 0) return;
  const models = await db
    .select({ id: houseModels.id, slug: houseModels.slug })
    .from(houseModels)
    .where(inArray(houseModels.slug, DEMO_HOUSES.map((h) => h.slug)));
  const idOf = new Map(models.map((m) => [m.slug, m.id]));
  // The last two northern seasons whose question has gone out (September 1 onwards).
  const year = now.getUTCFullYear();
  const last = now.getUTCMonth() >= 8 ? year : year - 1;
  const rows: (typeof roostReports.$inferInsert)[] = [];
  for (const model of DEMO_HOUSES) {
    const modelId = idOf.get(model.slug);
    if (!modelId) continue;
    const total = model.occupied + model.empty + model.young;
    for (let i = 0; i < total; i += 1) {
      const houseKey = `demo:${model.slug}:${i + 1}`;
      const base = {
        houseKey,
        unit: 1,
        modelId,
        hemisphere: "north",
        bandId: pick(model.bands, i),
        mount: pick(model.mounts, i),
        state: pick(model.states, i),
        siteRating: i % 4 === 3 ? "fair" : "good",
        reporter: "demo" as const,
        demo: true,
        review: "accepted" as const,
      };
      const report = (season: number, summer: number, answer: "no_sign" | "signs" | "bats_seen", extra: Partial<typeof roostReports.$inferInsert> = {}) =>
        rows.push({ ...base, season, summer, answer, reportedAt: new Date(Date.UTC(season, 8, 15)), ...extra });
      if (i < model.occupied) {
        // Half move in during the first summer, half in the second.
        if (i % 2 === 0) {
          report(last - 1, 1, "signs");
          report(last, 2, "bats_seen", { countBand: i % 4 === 0 ? "11-50" : "1-10" });
        } else {
          report(last - 1, 1, "no_sign");
          report(last, 2, i % 3 === 0 ? "signs" : "bats_seen", i % 3 === 0 ? {} : { countBand: "1-10" });
        }
      } else if (i < model.occupied + model.empty) {
        report(last - 1, 1, "no_sign");
        report(last, 2, "no_sign", { siteRating: "poor" });
      } else {
        report(last, 1, "no_sign");
      }
    }
  }
  // A few for the workshop's review list.
  const newest = rows.filter((r) => r.season === last);
  if (newest[0]) Object.assign(newest[0], { review: "new", note: "Counted them leaving at dusk from the back porch, about twenty minutes after sunset." });
  if (newest[3]) Object.assign(newest[3], { review: "new" });
  if (newest[5]) Object.assign(newest[5], { review: "follow_up", reviewReason: "Ask whether the house faces the street light." });
  await db.insert(roostReports).values(rows);
}

/** The invented guest buyer whose end-of-season question waits in the demo inbox. */
export const DEMO_REPORT_BUYER = { name: "Hazel Brightwater", email: "hazel.brightwater@larkspur-falls.example" };

/**
 * For the running demo store only (scripts/start.ts on a fresh database), never the test seed:
 * a guest's order of two Hollow Four houses, delivered before the summer two seasons ago, and
 * the end-of-season question the season job queued for it last September, exactly as that job
 * writes it (its dedupe key stops the job from asking again). The sender mails it on start, so
 * the mail inbox shows a real one-click question to answer without signing in.
 */
export async function seedDemoReportQuestion(db: Db, now = new Date()): Promise<void> {
  const [model] = await db.select().from(houseModels).where(eq(houseModels.slug, "hollow-four"));
  if (!model) return;
  const year = now.getUTCFullYear();
  const season = now.getUTCMonth() >= 8 ? year : year - 1;
  const at = (month: number, day: number) => new Date(Date.UTC(season - 1, month - 1, day, 17));
  await db.transaction(async (tx) => {
    const [order] = await tx
      .insert(orders)
      .values({
        email: DEMO_REPORT_BUYER.email,
        name: DEMO_REPORT_BUYER.name,
        accessToken: randomBytes(24).toString("base64url"),
        status: "delivered",
        method: "parcel",
        shipTo: { name: DEMO_REPORT_BUYER.name, line1: "7 Quillwort Lane", line2: "", city: "Larkspur Falls", state: "OR", zip: "97399" },
        subtotalCents: model.priceCents * 2,
        shippingCents: 2600,
        taxCents: 0,
        giftCents: 0,
        totalCents: model.priceCents * 2 + 2600,
        paidAt: at(4, 20),
        createdAt: at(4, 20),
      })
      .returning();
    const [line] = await tx
      .insert(orderLines)
      .values({ orderId: order!.id, modelId: model.id, slug: model.slug, name: model.name, unitPriceCents: model.priceCents, quantity: 2, billableLb: 21 })
      .returning();
    await tx.insert(parcels).values(
      [1, 2].map((n) => ({
        orderId: order!.id,
        description: `${model.name} (${n} of 2)`,
        lengthIn: model.cartonLengthIn,
        widthIn: model.cartonWidthIn,
        heightIn: model.cartonHeightIn,
        weightLb: model.cartonWeightLb,
        billableLb: 21,
        carrier: "usps" as const,
        service: "Ground Advantage",
        // Tracking numbers with valid check digits (USPS Publication 199 mod-10).
        trackingNumber: n === 1 ? "9400111201080805483016" : "9400111201080805483023",
        shippedAt: at(4, 28),
      })),
    );
    await tx.insert(orderEvents).values([
      { orderId: order!.id, fromStatus: "pending_payment", toStatus: "paid", note: "Payment received", createdAt: at(4, 20) },
      { orderId: order!.id, fromStatus: "packed", toStatus: "shipped", note: "Marked shipped", createdAt: at(4, 28) },
      { orderId: order!.id, fromStatus: "shipped", toStatus: "delivered", note: "Marked delivered", createdAt: at(5, 2) },
    ]);
    await tx
      .insert(outbox)
      .values({
        dedupeKey: `roost-ask:${season}:${order!.id}`,
        kind: "roost-report-ask",
        toAddress: DEMO_REPORT_BUYER.email,
        subject: `Did bats move in? Your bat houses, summer ${season}`,
        payload: { orderId: order!.id, season, houses: [1, 2].map((unit) => ({ orderLineId: line!.id, unit })) },
      })
      .onConflictDoNothing();
  });
}
