import "server-only";
import { asc, eq, inArray } from "drizzle-orm";
import { getDb } from "@/db/client";
import { houseModels, modelPhotos, type HouseModelRow } from "@/db/schema";
import { certificationState, CERTIFICATION_STATE_WORDS } from "./certification";
import type { BandId } from "./climate-bands";
import { checkDesign } from "./design-check";
import { fitForBand } from "./fit";
import { houseSpecSchema, type HouseSpec } from "./spec";
import { getLatestInspections } from "@/lib/inspections/queries";
import { selectHouses } from "./select-houses";
import type { CatalogFilters, Certification, HouseDetail, HouseSummary, PhotoRef } from "./house-types";

export type { CatalogFilters, Certification, HouseDetail, HouseSummary, PhotoRef } from "./house-types";

type LatestInspection = { modelId: string; inspectedOn: Date; passed: boolean };

const latestInspections = (modelIds: string[]) => getLatestInspections({ modelIds });

async function photosFor(modelIds: string[]): Promise<Map<string, PhotoRef[]>> {
  const map = new Map<string, PhotoRef[]>();
  if (modelIds.length === 0) return map;
  const db = await getDb();
  const rows = await db
    .select()
    .from(modelPhotos)
    .where(inArray(modelPhotos.modelId, modelIds))
    .orderBy(asc(modelPhotos.position), asc(modelPhotos.createdAt));
  for (const r of rows) {
    const list = map.get(r.modelId) ?? [];
    list.push({ id: r.id, altText: r.altText, keyBase: r.keyBase, widths: r.widths, width: r.width, height: r.height });
    map.set(r.modelId, list);
  }
  return map;
}

export function certificationFor(spec: HouseSpec, latest: LatestInspection | undefined, now: Date): Certification {
  const state = certificationState({
    spec,
    latestInspection: latest ? { inspectedAt: latest.inspectedOn, passed: latest.passed } : null,
    now,
  });
  return {
    state: state.state,
    certified: state.certified,
    words: CERTIFICATION_STATE_WORDS[state.state],
    inspectedOn: latest ? latest.inspectedOn.toISOString() : null,
    expiresAt: state.expiresAt ? state.expiresAt.toISOString() : null,
    expiresWithin30Days: state.expiresWithin30Days,
  };
}

function summarize(
  row: HouseModelRow,
  latest: LatestInspection | undefined,
  photos: PhotoRef[] | undefined,
  band: BandId | undefined,
  now: Date,
): HouseSummary {
  const spec = houseSpecSchema.parse(row.spec);
  const certification = certificationFor(spec, latest, now);
  const summary: HouseSummary = {
    id: row.id,
    slug: row.slug,
    name: row.name,
    tagline: row.tagline,
    status: row.status,
    priceCents: row.priceCents,
    stock: row.stock,
    mounts: row.mounts,
    backToBackKit: row.backToBackKit,
    spec,
    certified: certification.certified,
    certification,
    notes: checkDesign(spec).notes,
    photo: photos?.[0] ?? null,
  };
  if (band) summary.fit = fitForBand(spec, band);
  return summary;
}

/** Every published model, cheapest first, without a band (lib/catalog/select-houses.ts filters them). */
export async function listPublishedHouses(now = new Date()): Promise<HouseSummary[]> {
  const db = await getDb();
  const rows = await db
    .select()
    .from(houseModels)
    .where(eq(houseModels.status, "published"))
    .orderBy(asc(houseModels.priceCents), asc(houseModels.name));
  const ids = rows.map((r) => r.id);
  const [latest, photos] = await Promise.all([latestInspections(ids), photosFor(ids)]);
  // A model on sale whose certification lapsed stays listed but says so.
  return rows.map((r) => summarize(r, latest.get(r.id), photos.get(r.id), undefined, now));
}

/** The public catalog: published models only, filtered, with a fit label when a band is chosen. */
export async function listHouses(filters: CatalogFilters, now = new Date()): Promise<HouseSummary[]> {
  return selectHouses(await listPublishedHouses(now), filters);
}

/** One model by slug; drafts and retired models only when asked (staff pages). */
export async function getHouseBySlug(
  { slug, band, includeUnpublished = false }: { slug: string; band?: BandId; includeUnpublished?: boolean },
  now = new Date(),
): Promise<HouseDetail | null> {
  const db = await getDb();
  const [row] = await db.select().from(houseModels).where(eq(houseModels.slug, slug)).limit(1);
  if (!row || (!includeUnpublished && row.status !== "published")) return null;
  const [latest, photos] = await Promise.all([latestInspections([row.id]), photosFor([row.id])]);
  const modelPhotosList = photos.get(row.id) ?? [];
  const summary = summarize(row, latest.get(row.id), modelPhotosList, band, now);
  return {
    ...summary,
    description: row.description,
    builderName: row.builderName,
    check: checkDesign(summary.spec),
    photos: modelPhotosList,
    carton: {
      lengthIn: row.cartonLengthIn,
      widthIn: row.cartonWidthIn,
      heightIn: row.cartonHeightIn,
      weightLb: row.cartonWeightLb,
    },
    lowStockThreshold: row.lowStockThreshold,
  };
}

/** Whether a model is on sale now (the staff actions ask it to know which cache tags a change touches). */
export async function isModelOnSale(modelId: string): Promise<boolean> {
  const db = await getDb();
  const [row] = await db.select({ status: houseModels.status }).from(houseModels).where(eq(houseModels.id, modelId)).limit(1);
  return row?.status === "published";
}
