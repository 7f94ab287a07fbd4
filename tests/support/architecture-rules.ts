import ts from "typescript";
import { findCircles, type ImportGraph, type SourceFile } from "./import-graph";

// The layer rules of DEVELOPERS.md ("Architecture"), as functions of the import graph, so the
// architecture test can run them on the repository and on small planted graphs that break them.

/** A read or write module of the data layer: `queries.ts`/`commands.ts`, or a file in a `queries/`/`commands/` folder. */
export function isDataModule(file: string): boolean {
  return /(^|\/)(queries|commands)(\.ts$|\/)/.test(file);
}

const underAny = (file: string, folders: readonly string[]) => folders.some((folder) => file.startsWith(`${folder}/`));

/** Imports from `from` folders into `into` folders, as "file → target". */
export function importsInto(graph: ImportGraph, from: readonly string[], into: readonly string[]): string[] {
  const found: string[] = [];
  for (const file of graph.values()) {
    if (!underAny(file.path, from)) continue;
    for (const edge of file.imports) if (edge.target && underAny(edge.target, into)) found.push(`${file.path} → ${edge.target}`);
  }
  return found.sort();
}

export function circlesIn(graph: ImportGraph, folders: readonly string[]): string[][] {
  const scoped: ImportGraph = new Map([...graph].filter(([file]) => underAny(file, folders)));
  return findCircles(scoped);
}

/**
 * What makes a file talk to the database: a value import of the query builder (`drizzle-orm` and
 * its sub-paths), of the client (`@/db/client`: `getDb` and friends) or of the tables
 * (`@/db/schema`). Types (`DbOrTx`, row types) pass: a rule may hand a transaction on.
 */
export function sqlImportsOf(file: SourceFile): string[] {
  return file.imports
    .filter((edge) => !edge.typeOnly)
    .filter((edge) => edge.specifier === "drizzle-orm" || edge.specifier.startsWith("drizzle-orm/") || edge.target === "db/client.ts" || edge.target === "db/schema.ts" || (edge.target?.startsWith("db/schema") ?? false))
    .map((edge) => edge.specifier);
}

/** Files under `folders` that use SQL outside the data layer and outside the listed exceptions. */
export function sqlOutsideDataLayer(graph: ImportGraph, folders: readonly string[], exceptions: ReadonlyMap<string, string>): string[] {
  const found: string[] = [];
  for (const file of graph.values()) {
    if (!underAny(file.path, folders) || isDataModule(file.path) || exceptions.has(file.path)) continue;
    const sql = sqlImportsOf(file);
    if (sql.length > 0) found.push(`${file.path} (${[...new Set(sql)].join(", ")})`);
  }
  return found.sort();
}

export function dataModulesWithoutServerOnly(graph: ImportGraph): string[] {
  return [...graph.values()].filter((file) => file.path.startsWith("lib/") && isDataModule(file.path) && !file.startsWithServerOnly).map((file) => file.path);
}

/**
 * Where a file writes `orders.status`: every `.update(orders).set(x)` (also `schema.orders`) whose
 * `x` names `status`, spreads another object or is not an object literal (so it may carry a
 * status), and every raw `update orders set … status` in a template. Returns one line per write.
 */
export function orderStatusWrites(fileName: string, text: string): string[] {
  // Most files never name the table in an update: skip parsing them.
  if (!/update\s*\(\s*(\w+\.)?orders\s*\)|update\s+"?orders"?\s+set/i.test(text)) return [];
  const source = ts.createSourceFile(fileName, text, ts.ScriptTarget.Latest, true, fileName.endsWith(".tsx") ? ts.ScriptKind.TSX : ts.ScriptKind.TS);
  const writes: string[] = [];
  const line = (node: ts.Node) => source.getLineAndCharacterOfPosition(node.getStart()).line + 1;
  const updatesOrders = (node: ts.Expression): boolean => {
    // Walk down the chain `.update(orders)` … `.set(` to find the update call.
    let current: ts.Expression = node;
    while (ts.isCallExpression(current) || ts.isPropertyAccessExpression(current) || ts.isAwaitExpression(current)) {
      if (ts.isCallExpression(current) && ts.isPropertyAccessExpression(current.expression) && current.expression.name.text === "update") {
        const [table] = current.arguments;
        return Boolean(table && ((ts.isIdentifier(table) && table.text === "orders") || (ts.isPropertyAccessExpression(table) && table.name.text === "orders")));
      }
      current = ts.isCallExpression(current) ? current.expression : ts.isPropertyAccessExpression(current) ? current.expression : current.expression;
    }
    return false;
  };
  const mayCarryStatus = (argument: ts.Expression | undefined): boolean => {
    if (!argument || !ts.isObjectLiteralExpression(argument)) return true;
    return argument.properties.some(
      (p) => ts.isSpreadAssignment(p) || ((ts.isPropertyAssignment(p) || ts.isShorthandPropertyAssignment(p)) && (p.name.getText(source) === "status" || p.name.getText(source) === '"status"')),
    );
  };
  const visit = (node: ts.Node) => {
    if (ts.isCallExpression(node) && ts.isPropertyAccessExpression(node.expression) && node.expression.name.text === "set" && updatesOrders(node.expression.expression) && mayCarryStatus(node.arguments[0])) {
      writes.push(`${fileName}:${line(node)}`);
    }
    if ((ts.isNoSubstitutionTemplateLiteral(node) || ts.isTemplateExpression(node) || ts.isStringLiteral(node)) && /update\s+"?orders"?\s+set\b[\s\S]*\bstatus\b/i.test(node.getText(source))) {
      writes.push(`${fileName}:${line(node)} (raw SQL)`);
    }
    ts.forEachChild(node, visit);
  };
  visit(source);
  return writes;
}
