import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import {
  circlesIn,
  dataModulesWithoutServerOnly,
  importsInto,
  orderStatusWrites,
  sqlOutsideDataLayer,
} from "@/tests/support/architecture-rules";
import { buildImportGraph, type ImportGraph, type SourceFile } from "@/tests/support/import-graph";
import { readFileSync } from "node:fs";
import path from "node:path";

// The layer rules of DEVELOPERS.md ("Architecture"), checked on the repository's own code. Each
// rule also runs once on a small planted graph that breaks it, so a rule that cannot fail shows.

const root = fileURLToPath(new URL("../..", import.meta.url));
const CODE = ["app", "components", "lib", "db", "emails"] as const;
const graph = buildImportGraph(root, [...CODE, "stand-ins"]);

/**
 * Files outside queries/commands modules that may still use SQL, each with its reason. db/,
 * tests/, scripts/ and bench/ are not scanned at all (they own or seed the database).
 */
const SQL_EXCEPTIONS = new Map<string, string>([
  ["lib/jobs/runner.ts", "the queue adapter: pg-boss runs over the app's own database client and closes before it"],
]);

/** The one module allowed to write orders.status (the order lifecycle, lib/orders/). */
const ORDER_STATUS_OWNER = "lib/orders/commands.ts";

function file(pathName: string, imports: Array<[string, string | null, boolean?]>, startsWithServerOnly = true): [string, SourceFile] {
  return [
    pathName,
    {
      path: pathName,
      directive: null,
      startsWithServerOnly,
      imports: imports.map(([specifier, target, typeOnly = false]) => ({ specifier, target, typeOnly, names: ["x"] })),
    },
  ];
}

describe("architecture: imports run one way", () => {
  it("has no import circles in app, components, lib, db and emails", () => {
    expect(circlesIn(graph, CODE)).toEqual([]);
  });

  it("finds a planted circle", () => {
    const planted: ImportGraph = new Map([file("lib/a/x.ts", [["./y", "lib/a/y.ts"]]), file("lib/a/y.ts", [["./x", "lib/a/x.ts", true]])]);
    expect(circlesIn(planted, CODE)).toEqual([["lib/a/x.ts", "lib/a/y.ts"]]);
  });

  it("never imports app/ from components/ or lib/", () => {
    expect(importsInto(graph, ["components", "lib"], ["app"])).toEqual([]);
  });

  it("never imports lib/ (or anything above it) from db/", () => {
    expect(importsInto(graph, ["db"], ["lib", "app", "components", "emails"])).toEqual([]);
  });

  it("keeps the stand-ins apart from the store's code", () => {
    expect(importsInto(graph, ["stand-ins"], ["lib", "app", "components", "emails", "db"])).toEqual([]);
  });

  it("finds a planted upward import", () => {
    const planted: ImportGraph = new Map([file("components/a.tsx", [["@/app/x/actions", "app/x/actions.ts"]]), file("db/schema.ts", [["@/lib/y", "lib/y.ts"]])]);
    expect(importsInto(planted, ["components", "lib"], ["app"])).toEqual(["components/a.tsx → app/x/actions.ts"]);
    expect(importsInto(planted, ["db"], ["lib"])).toEqual(["db/schema.ts → lib/y.ts"]);
  });
});

describe("architecture: a data layer you can see", () => {
  it("uses SQL only in queries/commands modules (and the listed exceptions)", () => {
    expect(sqlOutsideDataLayer(graph, ["app", "components", "lib", "emails"], SQL_EXCEPTIONS)).toEqual([]);
  });

  it("finds planted SQL outside the data layer, and lets types through", () => {
    const planted: ImportGraph = new Map([
      file("lib/x/rule.ts", [["drizzle-orm", null]]),
      file("app/api/y/route.ts", [["@/db/client", "db/client.ts"]]),
      file("lib/x/passes-a-tx.ts", [["@/db/client", "db/client.ts", true]]),
      file("lib/x/queries.ts", [["drizzle-orm", null]]),
      file("lib/x/commands/write.ts", [["@/db/schema", "db/schema.ts"]]),
    ]);
    expect(sqlOutsideDataLayer(planted, ["app", "lib"], new Map())).toEqual(["app/api/y/route.ts (@/db/client)", "lib/x/rule.ts (drizzle-orm)"]);
  });

  it("starts every queries/commands module with import \"server-only\"", () => {
    expect(dataModulesWithoutServerOnly(graph)).toEqual([]);
  });

  it("finds a planted data module without server-only", () => {
    const planted: ImportGraph = new Map([file("lib/x/queries/a.ts", [], false), file("lib/x/commands.ts", [], true), file("lib/x/rule.ts", [], false)]);
    expect(dataModulesWithoutServerOnly(planted)).toEqual(["lib/x/queries/a.ts"]);
  });
});

describe("architecture: one owner of the order lifecycle", () => {
  it(`writes orders.status only in ${ORDER_STATUS_OWNER}`, () => {
    const writes = [...graph.keys()]
      .filter((f) => ["app/", "components/", "lib/", "emails/"].some((folder) => f.startsWith(folder)))
      .flatMap((f) => orderStatusWrites(f, readFileSync(path.join(root, f), "utf8")));
    expect(writes.length).toBeGreaterThan(0);
    expect([...new Set(writes.map((w) => w.split(":")[0]))]).toEqual([ORDER_STATUS_OWNER]);
  }, 30_000);

  it("finds planted status writes, and passes updates that leave the status alone", () => {
    const text = [
      'await tx.update(orders).set({ status: "paid" }).where(eq(orders.id, id));',
      "await tx.update(schema.orders).set({ ...fields, version: 2 });",
      "await tx.update(orders).set(changes);",
      "await db.execute(sql`update orders set status = 'paid' where id = ${id}`);",
      "await db.update(orders).set({ paymentIntentId: intent.id }).where(eq(orders.id, order.id));",
      'await db.update(outbox).set({ status: "failed" });',
    ].join("\n");
    expect(orderStatusWrites("lib/x/planted.ts", text)).toEqual([
      "lib/x/planted.ts:1",
      "lib/x/planted.ts:2",
      "lib/x/planted.ts:3",
      "lib/x/planted.ts:4 (raw SQL)",
    ]);
  });
});
