import { spawn } from "node:child_process";
import { mkdirSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { PGlite } from "@electric-sql/pglite";
import { describe, expect, it } from "vitest";
import { acquireDataDirLock } from "@/db/lock";

// A `kill -9` in the middle of writes must lose no write the database had acknowledged,
// and the next opener must take over the dead process's lock.
describe("kill -9 during writes", () => {
  it("keeps every acknowledged row", async () => {
    const dataDir = path.join(mkdtempSync(path.join(tmpdir(), "rw-kill9-")), "data");
    mkdirSync(dataDir, { recursive: true });
    const child = spawn(process.execPath, ["--import", "tsx", path.join("tests", "support", "kill9-writer.ts"), dataDir], {
      stdio: ["ignore", "pipe", "inherit"],
    });
    let acknowledged = 0;
    await new Promise<void>((resolve, reject) => {
      child.stdout.setEncoding("utf8");
      child.stdout.on("data", (chunk: string) => {
        for (const m of chunk.matchAll(/ack (\d+)/g)) acknowledged = Math.max(acknowledged, Number(m[1]));
        if (acknowledged >= 50) {
          child.kill("SIGKILL");
          resolve();
        }
      });
      child.on("exit", (code, signal) => (signal === "SIGKILL" ? resolve() : reject(new Error(`writer exited early: ${code}`))));
    });
    await new Promise((r) => child.once("exit", r).once("close", r));
    const release = acquireDataDirLock(dataDir);
    const db = await PGlite.create({ dataDir });
    const { rows } = await db.query<{ n: number }>("select count(*)::int as n from acks");
    await db.close();
    release();
    expect(acknowledged).toBeGreaterThanOrEqual(50);
    expect(rows[0]!.n).toBeGreaterThanOrEqual(acknowledged);
  }, 120_000);
});
