import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { DEMO_ORGANIZATION } from "@/lib/demo/seed-data";

// Every mention of the center comes from its settings: outside the demo seed (lib/demo/), no
// runtime file names the demo center or its town.
const ROOTS = ["app", "components", "lib", "emails"];
const EXCLUDED = [path.join("lib", "demo") + path.sep];
const NAMES = [DEMO_ORGANIZATION.displayName, DEMO_ORGANIZATION.legalName, DEMO_ORGANIZATION.city, DEMO_ORGANIZATION.street];

function* files(dir: string): Generator<string> {
  let entries;
  try {
    entries = readdirSync(dir, { withFileTypes: true });
  } catch {
    return;
  }
  for (const e of entries) {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) yield* files(full);
    else if (/\.(tsx?|jsx?|mjs|css|md|json|txt)$/.test(e.name)) yield full;
  }
}

function filesNaming(names: readonly string[], roots: readonly string[] = ROOTS): string[] {
  const hits: string[] = [];
  for (const root of roots)
    for (const file of files(root)) {
      if (EXCLUDED.some((x) => (file + path.sep).startsWith(x) || file.startsWith(x))) continue;
      const text = readFileSync(file, "utf8").toLowerCase();
      for (const name of names) if (text.includes(name.toLowerCase())) hits.push(`${file}: ${name}`);
    }
  return hits;
}

describe("the demo center's name", () => {
  it("appears in no file of app/, components/, lib/ or emails/ except lib/demo/", () => {
    expect(filesNaming(NAMES)).toEqual([]);
  });

  it("the scan finds the name where it is (the demo seed itself)", () => {
    expect(filesNaming([DEMO_ORGANIZATION.displayName], ["lib/demo"])).toEqual([]); // excluded
    const seed = readFileSync(path.join("lib", "demo", "seed-data.ts"), "utf8");
    expect(seed).toContain(DEMO_ORGANIZATION.displayName);
    // Without the exclusion the seed is found, so the scan can fail.
    EXCLUDED.length = 0;
    try {
      expect(filesNaming([DEMO_ORGANIZATION.displayName], ["lib/demo"])).not.toEqual([]);
    } finally {
      EXCLUDED.push(path.join("lib", "demo") + path.sep);
    }
  });
});
