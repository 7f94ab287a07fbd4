import { z } from "zod";
import { queryInt } from "@/lib/http/query-number";
import type { CertificationStateId } from "@/lib/catalog/certification";
import type { ModelStatus } from "./status-words";

// The staff models table: search, filter, sort and page on the server, so the table stays the
// same whether the center lists twelve models or twelve hundred. Pure: the JSON route loads the
// rows and hands them here.

export type StaffModelRow = {
  id: string;
  slug: string;
  name: string;
  builderName: string;
  status: ModelStatus;
  priceCents: number;
  stock: number;
  lowStockThreshold: number;
  certState: CertificationStateId;
  certWords: string;
  certified: boolean;
  inspectedOn: string | null;
  expiresAt: string | null;
  expiresWithin30Days: boolean;
  failing: number;
  notes: number;
  photos: number;
  updatedAt: string;
};

export const SORT_KEYS = [
  "name",
  "status",
  "stock",
  "price",
  "certification",
  "expires",
  "updated",
] as const;
export type SortKey = (typeof SORT_KEYS)[number];
export const PAGE_SIZES = [10, 25, 50] as const;

export const modelsQuerySchema = z.object({
  q: z.string().trim().max(80, "Search with at most 80 characters.").default(""),
  status: z
    .enum(["all", "draft", "published", "retired"], { error: "Choose a status to filter by." })
    .default("all"),
  cert: z
    .enum(["all", "sound", "expiring", "not-sound"], {
      error: "Choose a Sound Build filter.",
    })
    .default("all"),
  sort: z.enum(SORT_KEYS, { error: "Sort by one of the table's columns." }).default("name"),
  dir: z.enum(["asc", "desc"], { error: "Sort up (asc) or down (desc)." }).default("asc"),
  page: queryInt(
    z
      .number({ error: "The page must be a whole number." })
      .int("The page must be a whole number.")
      .min(1, "Pages start at 1.")
      .default(1),
  ),
  pageSize: queryInt(
    z
      .number({ error: "The page size must be a number." })
      .refine(
        (n) => (PAGE_SIZES as readonly number[]).includes(n),
        "Show 10, 25 or 50 models a page.",
      )
      .default(10),
  ),
});
export type ModelsQuery = z.infer<typeof modelsQuerySchema>;

export const DEFAULT_MODELS_QUERY: ModelsQuery = {
  q: "",
  status: "all",
  cert: "all",
  sort: "name",
  dir: "asc",
  page: 1,
  pageSize: 10,
};

export type ModelsPage = {
  items: StaffModelRow[];
  total: number;
  page: number;
  pageCount: number;
  pageSize: number;
};

const STATUS_ORDER: Record<ModelStatus, number> = { published: 0, draft: 1, retired: 2 };
// Most urgent first when sorted up: lapsed and failing before waiting, Sound Build holders last.
const CERT_ORDER: Record<CertificationStateId, number> = {
  expired: 0,
  failed: 1,
  "design-fails": 2,
  "not-inspected": 3,
  certified: 4,
};

const byText = (a: string, b: string) => a.localeCompare(b, "en", { sensitivity: "base" });

const COMPARE: Record<SortKey, (a: StaffModelRow, b: StaffModelRow) => number> = {
  name: (a, b) => byText(a.name, b.name),
  status: (a, b) => STATUS_ORDER[a.status] - STATUS_ORDER[b.status],
  stock: (a, b) => a.stock - b.stock,
  price: (a, b) => a.priceCents - b.priceCents,
  certification: (a, b) => CERT_ORDER[a.certState] - CERT_ORDER[b.certState],
  expires: (a, b) => (a.expiresAt ?? "").localeCompare(b.expiresAt ?? ""),
  updated: (a, b) => a.updatedAt.localeCompare(b.updatedAt),
};

function matches(row: StaffModelRow, query: ModelsQuery): boolean {
  if (query.status !== "all" && row.status !== query.status) return false;
  if (query.cert === "sound" && !row.certified) return false;
  if (query.cert === "expiring" && !row.expiresWithin30Days) return false;
  if (query.cert === "not-sound" && row.certified) return false;
  if (query.q) {
    const needle = query.q.toLowerCase();
    return [row.name, row.slug, row.builderName].some((t) => t.toLowerCase().includes(needle));
  }
  return true;
}

export function applyModelsQuery({
  rows,
  query,
}: {
  rows: StaffModelRow[];
  query: ModelsQuery;
}): ModelsPage {
  const compare = COMPARE[query.sort];
  const sign = query.dir === "asc" ? 1 : -1;
  const filtered = rows
    .filter((r) => matches(r, query))
    .sort((a, b) => {
      // Models with no expiry (never a Sound Build) go after every dated one, in either direction.
      if (query.sort === "expires" && (a.expiresAt === null) !== (b.expiresAt === null))
        return a.expiresAt === null ? 1 : -1;
      // Ties fall back to the name so the order never shuffles between pages.
      return sign * compare(a, b) || byText(a.name, b.name);
    });
  const pageCount = Math.max(1, Math.ceil(filtered.length / query.pageSize));
  const page = Math.min(query.page, pageCount);
  const start = (page - 1) * query.pageSize;
  return {
    items: filtered.slice(start, start + query.pageSize),
    total: filtered.length,
    page,
    pageCount,
    pageSize: query.pageSize,
  };
}
