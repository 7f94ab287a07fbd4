import { existsSync, mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { acquireDataDirLock, DataDirLockedError } from "@/db/lock";

// Two processes on one PGlite directory lose writes silently (STACK.md trap 3): the second opener must be refused.
describe("data directory lock", () => {
  const dir = () => path.join(mkdtempSync(path.join(tmpdir(), "rw-lock-")), "data");

  it("takes a free directory and releases it", () => {
    const dataDir = dir();
    const release = acquireDataDirLock(dataDir);
    expect(readFileSync(`${dataDir}.lock`, "utf8")).toBe(String(process.pid));
    release();
    expect(existsSync(`${dataDir}.lock`)).toBe(false);
  });

  it("refuses a directory held by another live process, with a clear message", () => {
    const dataDir = dir();
    writeFileSync(`${dataDir}.lock`, String(process.ppid)); // the test runner's parent: alive
    expect(() => acquireDataDirLock(dataDir)).toThrow(DataDirLockedError);
    expect(() => acquireDataDirLock(dataDir)).toThrow(/already open in process \d+.*Only one process/);
    expect(readFileSync(`${dataDir}.lock`, "utf8")).toBe(String(process.ppid));
  });

  it("takes over a stale lock whose process is gone", () => {
    const dataDir = dir();
    writeFileSync(`${dataDir}.lock`, "2147483646");
    const release = acquireDataDirLock(dataDir);
    expect(readFileSync(`${dataDir}.lock`, "utf8")).toBe(String(process.pid));
    release();
  });
});
