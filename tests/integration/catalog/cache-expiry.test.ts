import { and, asc, eq, gte, lte, sql, type SQL } from "drizzle-orm";
import { beforeEach, describe, expect, it, vi } from "vitest";

vi.mock("@/lib/auth/session", () => ({ getSessionUser: vi.fn(async () => null) }));

import { getDb } from "@/db/client";
import { houseModels, organization, roostReports } from "@/db/schema";
import { getSessionUser } from "@/lib/auth/session";
import { saveOrganizationAction } from "@/lib/admin/actions";
import { CATALOG_TAG, CENTER_TAG, modelTag, OCCUPANCY_TAG } from "@/lib/catalog/cache-tags";
import type { CatalogFilters } from "@/lib/catalog/queries";
import { listPublishedHouses } from "@/lib/catalog/queries";
import { selectHouses } from "@/lib/catalog/select-houses";
import { seedDemo } from "@/lib/demo/commands";
import { reviewRoostReportAction } from "@/lib/roost-reports/actions";
import {
  adjustStockAction,
  publishModelAction,
  receiveStockAction,
  retireModelAction,
  returnModelToDraftsAction,
  updateModelAction,
} from "@/lib/staff/actions";
import { resetDb } from "../../support/db";
import { clearExpiredTags, expiredTags } from "../../support/next-cache";
import { sessionUserFor } from "../staff/helpers";

// Which buyer-facing cache tags each staff change expires (lib/catalog/expire.ts). That the next
// request then reads the change through a real Next.js server is tests/e2e/catalog-fresh.spec.ts.

const session = vi.mocked(getSessionUser);

async function modelRow(slug: string) {
  const db = await getDb();
  const [row] = await db.select().from(houseModels).where(eq(houseModels.slug, slug));
  if (!row) throw new Error(`no model ${slug}`);
  return row;
}

beforeEach(async () => {
  const db = await resetDb();
  await seedDemo(db);
  session.mockResolvedValue(await sessionUserFor(db, "admin"));
  clearExpiredTags();
});

describe("a staff change expires exactly the tags it touches", () => {
  it("stock received or adjusted on a model on sale: the model and the catalog", async () => {
    const { id } = await modelRow("hollow-four");
    expect(await receiveStockAction({ modelId: id, count: 2, batch: "2026-winter-1", builderName: "Hollow Creek Joinery", note: "" })).toMatchObject({ ok: true });
    expect(expiredTags).toEqual([modelTag(id), CATALOG_TAG]);
    clearExpiredTags();
    expect(await adjustStockAction({ modelId: id, reason: "damaged", change: -1, note: "Split panel" })).toMatchObject({ ok: true });
    expect(expiredTags).toEqual([modelTag(id), CATALOG_TAG]);
  });

  it("retiring and returning to drafts: the model and the catalog; a draft's edit: the model only", async () => {
    const row = await modelRow("hollow-four");
    expect(await retireModelAction({ id: row.id })).toMatchObject({ ok: true });
    expect(expiredTags).toEqual([modelTag(row.id), CATALOG_TAG]);
    clearExpiredTags();
    expect(await returnModelToDraftsAction({ id: row.id })).toMatchObject({ ok: true });
    expect(expiredTags).toEqual([modelTag(row.id), CATALOG_TAG]);
    clearExpiredTags();

    const { id: _id, status: _s, createdAt: _c, updatedAt: _u, version: _v, ...rest } = row as typeof row & { version?: number };
    const saved = await updateModelAction({
      id: row.id,
      name: rest.name,
      tagline: rest.tagline,
      description: rest.description,
      priceCents: row.priceCents + 500,
      builderName: rest.builderName,
      mounts: rest.mounts as ("pole" | "building")[],
      backToBackKit: rest.backToBackKit,
      carton: { lengthIn: row.cartonLengthIn, widthIn: row.cartonWidthIn, heightIn: row.cartonHeightIn, weightLb: row.cartonWeightLb },
      lowStockThreshold: row.lowStockThreshold,
      spec: row.spec,
    } as Parameters<typeof updateModelAction>[0]);
    expect(saved).toMatchObject({ ok: true });
    expect(expiredTags).toEqual([modelTag(row.id)]);
    clearExpiredTags();

    expect(await publishModelAction({ id: row.id })).toMatchObject({ ok: true });
    expect(expiredTags).toEqual([modelTag(row.id), CATALOG_TAG]);
  });

  it("a refused change expires nothing", async () => {
    const { id } = await modelRow("hollow-four");
    const refused = await adjustStockAction({ modelId: id, reason: "damaged", change: -500, note: "" });
    expect(refused.ok).toBe(false);
    expect(expiredTags).toEqual([]);
  });

  it("the center's settings: the center's tag; a roost report's review: the figures' tag", async () => {
    const db = await getDb();
    const [org] = await db.select().from(organization);
    if (!org) throw new Error("the demo data has no organization row");
    const saved = await saveOrganizationAction({
      legalName: org.legalName,
      displayName: "Renamed Rescue",
      street: org.street,
      city: org.city,
      state: org.state,
      zip: org.zip,
      taxId: org.taxId,
      email: org.email,
      phone: org.phone,
    });
    expect(saved).toMatchObject({ ok: true });
    expect(expiredTags).toEqual([CENTER_TAG]);
    clearExpiredTags();

    const [report] = await db.select({ id: roostReports.id }).from(roostReports).limit(1);
    if (!report) throw new Error("the demo data has no roost report to review");
    const reviewed = await reviewRoostReportAction({ reportId: report.id, decision: "doubtful", reason: "The photo shows a bird box." });
    expect(reviewed).toMatchObject({ ok: true });
    expect(expiredTags).toEqual([OCCUPANCY_TAG]);
  });
});

describe("the catalog's filters, applied in memory to the cached catalog", () => {
  // The reference: the same filters as SQL against the database (what the catalog ran before it was cached).
  async function bySql(filters: CatalogFilters): Promise<string[]> {
    const db = await getDb();
    const where: SQL[] = [eq(houseModels.status, "published")];
    if (filters.chambers) where.push(sql`(${houseModels.spec}->>'chamberCount')::int >= ${filters.chambers}`);
    if (filters.mount) where.push(sql`${filters.mount} = any(${houseModels.mounts})`);
    if (filters.maxPriceCents !== undefined) where.push(lte(houseModels.priceCents, filters.maxPriceCents));
    if (filters.inStock) where.push(gte(houseModels.stock, 1));
    const rows = await db.select({ slug: houseModels.slug }).from(houseModels).where(and(...where)).orderBy(asc(houseModels.priceCents), asc(houseModels.name));
    return rows.map((r) => r.slug);
  }

  it("choose the same houses in the same order as the database would, for every filter", async () => {
    const db = await getDb();
    // One model out of stock, so the in-stock filter has something to drop.
    await db.update(houseModels).set({ stock: 0 }).where(eq(houseModels.slug, "hollow-four"));
    const published = await listPublishedHouses();
    expect(published.length).toBeGreaterThan(2);
    const cases: CatalogFilters[] = [
      {},
      { chambers: 2 },
      { chambers: 4 },
      { mount: "pole" },
      { mount: "building" },
      { maxPriceCents: 15000 },
      { maxPriceCents: published[0]!.priceCents },
      { maxPriceCents: published[0]!.priceCents - 1 },
      { inStock: true },
      { chambers: 3, mount: "pole", maxPriceCents: 30000, inStock: true },
    ];
    for (const filters of cases) {
      expect(selectHouses(published, filters).map((h) => h.slug), JSON.stringify(filters)).toEqual(await bySql(filters));
    }
    expect(selectHouses(published, { inStock: true }).some((h) => h.slug === "hollow-four")).toBe(false);
  });
});
