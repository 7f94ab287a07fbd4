import { readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

// A user's clone has no ../shared folder (PRODUCT.md §2, "The data ships with the store"): the
// store's runtime code must never name it. Only rebuild scripts and tests may.
const RUNTIME = ["app", "components", "db", "lib", "emails"];

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? files(path) : /\.(ts|tsx|mjs|js)$/.test(name) ? [path] : [];
  });
}

describe("runtime code and ../shared", () => {
  it("no file under app, components, db, lib or emails refers to ../shared", () => {
    const offenders = RUNTIME.flatMap(files).filter((f) => /\.\.\/shared/.test(readFileSync(f, "utf8")));
    expect(offenders).toEqual([]);
  });
});
