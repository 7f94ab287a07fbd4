import type { HouseModelRow } from "@/db/schema";
import type { BandId } from "./climate-bands";
import type { DesignCheck } from "./design-check";
import type { Fit } from "./fit";
import type { HouseSpec } from "./spec";
import type { CertificationStateId } from "./certification";

// The catalog's shapes, as the queries (lib/catalog/queries.ts), the cached reads and the in-memory
// filters (lib/catalog/select-houses.ts) share them.

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

