import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import ts from "typescript";

/**
 * The TypeScript import graph of the repository's own code, built from each file's syntax tree
 * (no type checking, so it takes well under a second). Paths are repository-relative with forward
 * slashes; `@/x` resolves like tsconfig's `paths`.
 */

export interface ImportEdge {
  /** What the file wrote: `@/db/client`, `./states`, `drizzle-orm`. */
  specifier: string;
  /** The repository file it resolves to, or null for a package (or a file outside the scan). */
  target: string | null;
  /** `import type …`, `export type …`, or every named binding marked `type`: erased at run time. */
  typeOnly: boolean;
  /** The names bound (`eq`, `sql`, `default`, `*`); empty for `import "x"`. */
  names: string[];
}

export interface SourceFile {
  path: string;
  /** The first statement is `import "server-only"`. */
  startsWithServerOnly: boolean;
  /** The file starts with a `"use server"` or `"use client"` directive. */
  directive: "use server" | "use client" | null;
  imports: ImportEdge[];
}

export type ImportGraph = Map<string, SourceFile>;

const EXTENSIONS = [".ts", ".tsx"];

export function listSourceFiles(root: string, folders: readonly string[]): string[] {
  const found: string[] = [];
  const walk = (relative: string) => {
    const absolute = path.join(root, relative);
    if (!existsSync(absolute)) return;
    for (const entry of readdirSync(absolute)) {
      const child = relative ? `${relative}/${entry}` : entry;
      if (entry === "node_modules" || entry.startsWith(".")) continue;
      if (statSync(path.join(root, child)).isDirectory()) walk(child);
      else if (EXTENSIONS.some((ext) => entry.endsWith(ext)) && !entry.endsWith(".d.ts")) found.push(child);
    }
  };
  for (const folder of folders) walk(folder);
  return found.sort();
}

function namesOf(node: ts.ImportDeclaration | ts.ExportDeclaration): { names: string[]; typeOnly: boolean } {
  if (ts.isImportDeclaration(node)) {
    const clause = node.importClause;
    if (!clause) return { names: [], typeOnly: false };
    const names: string[] = [];
    let valueNames = 0;
    if (clause.name) {
      names.push("default");
      valueNames++;
    }
    const bindings = clause.namedBindings;
    if (bindings && ts.isNamespaceImport(bindings)) {
      names.push("*");
      valueNames++;
    } else if (bindings) {
      for (const element of bindings.elements) {
        names.push((element.propertyName ?? element.name).text);
        if (!element.isTypeOnly) valueNames++;
      }
    }
    return { names, typeOnly: clause.isTypeOnly || (names.length > 0 && valueNames === 0) };
  }
  const clause = node.exportClause;
  if (!clause) return { names: ["*"], typeOnly: node.isTypeOnly };
  if (ts.isNamespaceExport(clause)) return { names: ["*"], typeOnly: node.isTypeOnly };
  const names = clause.elements.map((element) => (element.propertyName ?? element.name).text);
  const values = clause.elements.filter((element) => !element.isTypeOnly).length;
  return { names, typeOnly: node.isTypeOnly || (names.length > 0 && values === 0) };
}

export type ParsedImports = Pick<SourceFile, "directive" | "startsWithServerOnly"> & { imports: Omit<ImportEdge, "target">[] };

/** Every import of one file: static imports, re-exports, `import()` and `require()` of a literal. */
export function parseImports(fileName: string, text: string): ParsedImports {
  const source = ts.createSourceFile(fileName, text, ts.ScriptTarget.Latest, false, fileName.endsWith(".tsx") ? ts.ScriptKind.TSX : ts.ScriptKind.TS);
  const imports: Omit<ImportEdge, "target">[] = [];
  let directive: SourceFile["directive"] = null;
  let startsWithServerOnly = false;
  source.statements.forEach((statement, index) => {
    if (index === 0 && ts.isExpressionStatement(statement) && ts.isStringLiteral(statement.expression)) {
      const value = statement.expression.text;
      if (value === "use server" || value === "use client") directive = value;
    }
    if ((ts.isImportDeclaration(statement) || ts.isExportDeclaration(statement)) && statement.moduleSpecifier && ts.isStringLiteral(statement.moduleSpecifier)) {
      const specifier = statement.moduleSpecifier.text;
      if (index === (directive ? 1 : 0) && specifier === "server-only" && ts.isImportDeclaration(statement) && !statement.importClause) startsWithServerOnly = true;
      imports.push({ specifier, ...namesOf(statement) });
    }
  });
  const visit = (node: ts.Node) => {
    if (ts.isCallExpression(node) && node.arguments.length === 1) {
      const [argument] = node.arguments;
      const isDynamicImport = node.expression.kind === ts.SyntaxKind.ImportKeyword;
      const isRequire = ts.isIdentifier(node.expression) && node.expression.text === "require";
      if ((isDynamicImport || isRequire) && argument && ts.isStringLiteralLike(argument)) {
        imports.push({ specifier: argument.text, typeOnly: false, names: ["*"] });
      }
    }
    if (ts.isImportTypeNode(node) && ts.isLiteralTypeNode(node.argument) && ts.isStringLiteral(node.argument.literal)) {
      imports.push({ specifier: node.argument.literal.text, typeOnly: true, names: [] });
    }
    ts.forEachChild(node, visit);
  };
  ts.forEachChild(source, visit);
  return { imports, directive, startsWithServerOnly };
}

/** The repository file an import points at, or null when it is a package. */
export function resolveSpecifier(from: string, specifier: string, exists: (file: string) => boolean): string | null {
  let base: string;
  if (specifier.startsWith("@/")) base = specifier.slice(2);
  else if (specifier.startsWith("./") || specifier.startsWith("../")) base = path.posix.normalize(path.posix.join(path.posix.dirname(from), specifier));
  else return null;
  const candidates = [base, ...EXTENSIONS.map((ext) => base + ext), ...EXTENSIONS.map((ext) => `${base}/index${ext}`)];
  return candidates.find((candidate) => exists(candidate)) ?? base;
}

export function buildImportGraph(root: string, folders: readonly string[]): ImportGraph {
  const files = listSourceFiles(root, folders);
  const known = new Set(files);
  const exists = (file: string) => known.has(file) || (/\.[a-z]+$/.test(file) && existsSync(path.join(root, file)) && statSync(path.join(root, file)).isFile());
  const graph: ImportGraph = new Map();
  for (const file of files) {
    const parsed = parseImports(file, readFileSync(path.join(root, file), "utf8"));
    graph.set(file, {
      path: file,
      directive: parsed.directive,
      startsWithServerOnly: parsed.startsWithServerOnly,
      imports: parsed.imports.map((edge) => ({ ...edge, target: resolveSpecifier(file, edge.specifier, exists) })),
    });
  }
  return graph;
}

/**
 * Import circles: the strongly connected components (Tarjan, 1972) with more than one file, or one
 * file importing itself. Type-only imports count too unless `runtimeOnly`: a circle of types still
 * ties two modules together.
 */
export function findCircles(graph: ImportGraph, { runtimeOnly = false } = {}): string[][] {
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const onStack = new Set<string>();
  const stack: string[] = [];
  const circles: string[][] = [];
  let counter = 0;
  const next = (file: string) =>
    (graph.get(file)?.imports ?? [])
      .filter((edge) => edge.target && graph.has(edge.target) && !(runtimeOnly && edge.typeOnly))
      .map((edge) => edge.target as string);

  const connect = (file: string) => {
    index.set(file, counter);
    low.set(file, counter);
    counter++;
    stack.push(file);
    onStack.add(file);
    for (const target of next(file)) {
      if (!index.has(target)) {
        connect(target);
        low.set(file, Math.min(low.get(file)!, low.get(target)!));
      } else if (onStack.has(target)) {
        low.set(file, Math.min(low.get(file)!, index.get(target)!));
      }
    }
    if (low.get(file) === index.get(file)) {
      const component: string[] = [];
      let member: string | undefined;
      do {
        member = stack.pop()!;
        onStack.delete(member);
        component.push(member);
      } while (member !== file);
      if (component.length > 1 || next(file).includes(file)) circles.push(component.sort());
    }
  };
  for (const file of [...graph.keys()].sort()) if (!index.has(file)) connect(file);
  return circles;
}
