import { describe, expect, it } from "vitest";
import {
  applyModelsQuery,
  modelsQuerySchema,
  type StaffModelRow,
} from "@/lib/staff/models-table-query";

// Common practice, no source: search, filter, sort and page as staff tables do.

const row = (name: string, changes: Partial<StaffModelRow> = {}): StaffModelRow => ({
  id: name,
  slug: name.toLowerCase().replace(/ /g, "-"),
  name,
  builderName: "Hollow Creek Joinery",
  status: "published",
  priceCents: 10_000,
  stock: 5,
  lowStockThreshold: 2,
  certState: "certified",
  certWords: "Roostwright Sound Build",
  certified: true,
  inspectedOn: "2026-01-01T12:00:00.000Z",
  expiresAt: "2027-01-01T12:00:00.000Z",
  expiresWithin30Days: false,
  failing: 0,
  notes: 0,
  photos: 0,
  updatedAt: "2026-01-01T12:00:00.000Z",
  ...changes,
});

const ROWS = [
  row("Alder", { priceCents: 20_000, stock: 1 }),
  row("birch", { status: "draft", certState: "not-inspected", certified: false, expiresAt: null }),
  row("Cedar", {
    expiresWithin30Days: true,
    expiresAt: "2026-07-01T12:00:00.000Z",
    builderName: "Larkspur Falls",
  }),
  row("Dogwood", {
    status: "retired",
    certState: "expired",
    certified: false,
    expiresAt: "2025-01-01T12:00:00.000Z",
  }),
];
const q = (raw: Record<string, string>) => modelsQuerySchema.parse(raw);

describe("applyModelsQuery", () => {
  it("sorts by name without regard to case, and either way", () => {
    expect(applyModelsQuery({ rows: ROWS, query: q({}) }).items.map((r) => r.name)).toEqual([
      "Alder",
      "birch",
      "Cedar",
      "Dogwood",
    ]);
    expect(
      applyModelsQuery({ rows: ROWS, query: q({ dir: "desc" }) }).items.map((r) => r.name),
    ).toEqual(["Dogwood", "Cedar", "birch", "Alder"]);
  });

  it("keeps models without an expiry last whichever way the expiry column is sorted", () => {
    for (const dir of ["asc", "desc"]) {
      const names = applyModelsQuery({ rows: ROWS, query: q({ sort: "expires", dir }) }).items.map(
        (r) => r.name,
      );
      expect(names.at(-1)).toBe("birch");
    }
  });

  it("filters by status, Sound Build standing and a search of name, slug and builder", () => {
    expect(
      applyModelsQuery({ rows: ROWS, query: q({ status: "draft" }) }).items.map((r) => r.name),
    ).toEqual(["birch"]);
    expect(
      applyModelsQuery({ rows: ROWS, query: q({ cert: "expiring" }) }).items.map((r) => r.name),
    ).toEqual(["Cedar"]);
    expect(
      applyModelsQuery({ rows: ROWS, query: q({ cert: "sound" }) }).items.map((r) => r.name),
    ).toEqual(["Alder", "Cedar"]);
    expect(applyModelsQuery({ rows: ROWS, query: q({ cert: "not-sound" }) }).total).toBe(2);
    expect(modelsQuerySchema.safeParse({ cert: "certified" }).success).toBe(false);
    expect(
      applyModelsQuery({ rows: ROWS, query: q({ q: "larkspur" }) }).items.map((r) => r.name),
    ).toEqual(["Cedar"]);
  });

  it("pages at the edges: the last page holds the rest, a page past the end shows the last", () => {
    const many = Array.from({ length: 21 }, (_, i) => row(`Model ${String(i).padStart(2, "0")}`));
    const third = applyModelsQuery({ rows: many, query: q({ page: "3" }) });
    expect(third).toMatchObject({ total: 21, page: 3, pageCount: 3 });
    expect(third.items.map((r) => r.name)).toEqual(["Model 20"]);
    expect(applyModelsQuery({ rows: many, query: q({ page: "9" }) }).page).toBe(3);
    expect(applyModelsQuery({ rows: [], query: q({}) })).toMatchObject({
      total: 0,
      page: 1,
      pageCount: 1,
    });
  });

  it("refuses query strings it does not understand, with a message", () => {
    expect(modelsQuerySchema.safeParse({ pageSize: "7" }).error?.issues[0]?.message).toBe(
      "Show 10, 25 or 50 models a page.",
    );
    expect(modelsQuerySchema.safeParse({ sort: "colour" }).error?.issues[0]?.message).toBe(
      "Sort by one of the table's columns.",
    );
    expect(modelsQuerySchema.safeParse({ page: "0" }).success).toBe(false);
  });
});
