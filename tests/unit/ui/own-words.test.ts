import { readdirSync, readFileSync } from "node:fs";
import { join, relative } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

// The store speaks its own words (product brief, "Words of our own"): no stock wording of store
// or shipping platforms, no standing named after a former certification scheme, and sources cited
// in one plain style (what the source is and its year, no authors). Every source file of the
// runtime (app/, components/, lib/, emails/) is scanned; comments are skipped, since full
// citations and code notes belong there.

const ROOT = fileURLToPath(new URL("../../..", import.meta.url));
const DIRS = ["app", "components", "lib", "emails"];

/** Phrases that never appear outside comments, whatever their case. */
const BANNED_PHRASES = [
  "awaiting payment",
  "is confirmed",
  "is on its way",
  "has arrived",
  "ready to pick up",
  "mark shipped",
  "mark delivered",
  "mark collected",
  "certified house",
  "not certified",
  // Sources are named in the plain style of lib/catalog/design-criteria.ts SOURCE_NAMES.
  "Tuttle",
  "Kiser",
];

/**
 * "Certified" on its own is banned in words people read. The code's own names for the standing
 * (`house.certified`, `{ certified: true }`, the state id "certified") are identifiers, not words
 * on a page, so they are let through.
 */
const CERTIFIED_WORD = /\bcertified\b/gi;
function isIdentifierUse(text: string, index: number): boolean {
  const before = text.slice(Math.max(0, index - 1), index);
  const after = text.slice(index + "certified".length);
  if (before === ".") return true; // row.certified
  if (/^\??\s*:/.test(after)) return true; // certified: true / certified?: boolean
  if (/^["'`]/.test(after) && /["'`]/.test(before)) return true; // "certified" state id, whole literal
  return false;
}

/** Removes block and line comments (but not the "//" inside "https://"). */
function stripComments(source: string): string {
  return source
    .replace(/\/\*[\s\S]*?\*\//g, (c) => c.replace(/[^\n]/g, " "))
    .replace(/(^|[^:"'`\\])\/\/.*$/gm, "$1");
}

function bannedWordsIn(source: string): string[] {
  const text = stripComments(source);
  const lower = text.toLowerCase();
  const found = BANNED_PHRASES.filter((p) => lower.includes(p.toLowerCase()));
  for (const match of text.matchAll(CERTIFIED_WORD)) {
    if (!isIdentifierUse(text, match.index)) found.push(`"${match[0]}" as a word`);
  }
  return found;
}

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true, recursive: true })
    .filter((e) => e.isFile() && /\.(ts|tsx|js|jsx|mjs|md|json)$/.test(e.name))
    .map((e) => join(e.parentPath, e.name));
}

describe("the scan itself", () => {
  it("finds each kind of banned wording, in any case", () => {
    expect(bannedWordsIn('label: "Awaiting payment",')).toEqual(["awaiting payment"]);
    expect(bannedWordsIn("subject: `Your order ${n} IS ON ITS WAY`")).toEqual(["is on its way"]);
    expect(bannedWordsIn("<Button>Mark delivered</Button>")).toEqual(["mark delivered"]);
    expect(bannedWordsIn('<option value="x">Certified</option>')).toEqual(['"Certified" as a word']);
    expect(bannedWordsIn('text: "Keep it on sale as certified."')).toEqual(['"certified" as a word']);
    expect(bannedWordsIn("<p>Tuttle, Kiser &amp; Kiser (2004)</p>")).toEqual(["Tuttle", "Kiser"]);
  });

  it("lets identifiers and comments through", () => {
    expect(bannedWordsIn("if (row.certified && state.state === \"certified\") return { certified: true };")).toEqual([]);
    expect(bannedWordsIn("type T = { certified?: boolean };")).toEqual([]);
    expect(bannedWordsIn("// Tuttle, Kiser & Kiser (2004): is on its way\nconst a = 1;")).toEqual([]);
    expect(bannedWordsIn("/* never certified */ const url = \"https://example.test/a\";")).toEqual([]);
  });
});

describe("our own words in every runtime source file", () => {
  const files = DIRS.flatMap((d) => sourceFiles(join(ROOT, d)));

  it("scans a real number of files", () => {
    expect(files.length).toBeGreaterThan(100);
  });

  it("none of app/, components/, lib/ or emails/ uses the stock or former-scheme wording", () => {
    const hits = files.flatMap((file) =>
      bannedWordsIn(readFileSync(file, "utf8")).map((w) => `${relative(ROOT, file)}: ${w}`),
    );
    expect(hits).toEqual([]);
  });
});
