import "server-only";
import { and, asc, eq, gte, inArray, lte, sql, type SQL } from "drizzle-orm";
import { getDb } from "@/db/client";
import { houseModels, modelPhotos, type HouseModelRow } from "@/db/schema";
import { certificationState, CERTIFICATION_STATE_WORDS, type CertificationStateId } from "./certification";
import type { BandId } from "./climate-bands";
import { checkDesign, type DesignCheck } from "./design-check";
import { fitForBand, type Fit } from "./fit";
import { houseSpecSchema, type HouseSpec } from "./spec";
import { getLatestInspections } from "@/lib/inspections/queries";

export type CatalogFilters = {
  band?: BandId;
  /** At least this many chambers. */
  chambers?: number;
  mount?: "pole" | "building";
  maxPriceCents?: number;
  inStock?: boolean;
};

export type Certification = {
  state: CertificationStateId;
  certified: boolean;
  words: string;
  inspectedOn: string | null;
  expiresAt: string | null;
  expiresWithin30Days: boolean;
};

export type PhotoRef = { id: string; altText: string; keyBase: string; widths: number[]; width: number; height: number };

export type HouseSummary = {
  id: string;
  slug: string;
  name: string;
  tagline: string;
  status: HouseModelRow["status"];
  priceCents: number;
  stock: number;
  mounts: string[];
  backToBackKit: boolean;
  spec: HouseSpec;
  certified: boolean;
  certification: Certification;
  notes: number;
  photo: PhotoRef | null;
  fit?: Fit;
};

export type HouseDetail = HouseSummary & {
  description: string;
  builderName: string;
  check: DesignCheck;
  photos: PhotoRef[];
  carton: { lengthIn: number; widthIn: number; heightIn: number; weightLb: number };
  lowStockThreshold: number;
};

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

const FIT_ORDER = { good: 0, fair: 1, poor: 2 } as const;

/** The public catalog: published models only, with a fit label when a band is chosen. */
export async function listHouses(filters: CatalogFilters, now = new Date()): Promise<HouseSummary[]> {
  const db = await getDb();
  const where: SQL[] = [eq(houseModels.status, "published")];
  if (filters.chambers) where.push(sql`(${houseModels.spec}->>'chamberCount')::int >= ${filters.chambers}`);
  if (filters.mount) where.push(sql`${filters.mount} = any(${houseModels.mounts})`);
  if (filters.maxPriceCents !== undefined) where.push(lte(houseModels.priceCents, filters.maxPriceCents));
  if (filters.inStock) where.push(gte(houseModels.stock, 1));
  const rows = await db
    .select()
    .from(houseModels)
    .where(and(...where))
    .orderBy(asc(houseModels.priceCents), asc(houseModels.name));
  const ids = rows.map((r) => r.id);
  const [latest, photos] = await Promise.all([latestInspections(ids), photosFor(ids)]);
  const items = rows.map((r) => summarize(r, latest.get(r.id), photos.get(r.id), filters.band, now));
  // A model on sale whose certification lapsed stays listed but says so; with a band, best fits first.
  if (filters.band) items.sort((a, b) => FIT_ORDER[a.fit!.label] - FIT_ORDER[b.fit!.label]);
  return items;
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
