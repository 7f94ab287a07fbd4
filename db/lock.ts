import { readFileSync, rmSync, writeFileSync } from "node:fs";

/**
 * Two processes on one PGlite data directory lose writes silently, so the first opener
 * holds `<dataDir>.lock` with its pid inside; a lock whose pid is dead is stale and taken over.
 */
export class DataDirLockedError extends Error {
  override name = "DataDirLockedError";
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === "EPERM";
  }
}

export function acquireDataDirLock(dataDir: string): () => void {
  const file = `${dataDir}.lock`;
  try {
    writeFileSync(file, String(process.pid), { flag: "wx" });
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== "EEXIST") throw error;
    const holder = Number.parseInt(readFileSync(file, "utf8"), 10);
    if (Number.isInteger(holder) && holder !== process.pid && isAlive(holder)) {
      throw new DataDirLockedError(
        `The embedded database at ${dataDir} is already open in process ${holder}. ` +
          "Only one process may use it at a time: stop the other one first, or set DATABASE_URL to a PostgreSQL server to run several.",
      );
    }
    writeFileSync(file, String(process.pid));
  }
  return () => {
    try {
      if (readFileSync(file, "utf8") === String(process.pid)) rmSync(file);
    } catch {
      // Already gone: nothing to release.
    }
  };
}
