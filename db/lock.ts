import fs from "node:fs";
import path from "node:path";

// Why our own lock instead of proper-lockfile: PGlite lets two processes open one
// data directory and silently loses one side's writes, so the guard must never
// be judged stale while its owner lives. proper-lockfile marks a lock stale when
// the owner's event loop stalls for 10 s (a long migration or seed can); a PID
// file with a liveness check cannot be stolen from a live process.

export class DataDirLockedError extends Error {
  constructor(
    readonly dataDir: string,
    readonly ownerPid: number,
  ) {
    super(
      `The database directory ${dataDir} is already in use by process ${ownerPid}. ` +
        `Only one Castline server may own a PGlite directory; stop that process or set PGLITE_DIR to another directory.`,
    );
    this.name = "DataDirLockedError";
  }
}

/**
 * The directory's real location: symlinks resolved along the part of the path
 * that exists, the rest appended. PGlite's in-WebAssembly file system cannot
 * follow a symlink itself, and two links to one directory must share one lock.
 */
export function realDataDir(dataDir: string): string {
  const missing: string[] = [];
  let existing = path.resolve(dataDir);
  for (;;) {
    try {
      return path.join(fs.realpathSync(existing), ...missing);
    } catch (error) {
      const parent = path.dirname(existing);
      // A dangling symlink or an unreadable path: leave it for the open to report.
      if ((error as NodeJS.ErrnoException).code !== "ENOENT" || parent === existing)
        return path.resolve(dataDir);
      if (fs.lstatSync(existing, { throwIfNoEntry: false })) return path.resolve(dataDir);
      missing.unshift(path.basename(existing));
      existing = parent;
    }
  }
}

function lockPath(dataDir: string): string {
  return `${realDataDir(dataDir)}.lock`;
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    // EPERM means it exists but belongs to someone else: still alive.
    return (error as NodeJS.ErrnoException).code === "EPERM";
  }
}

function readOwner(file: string): number | null {
  try {
    const pid = Number.parseInt(fs.readFileSync(file, "utf8").trim(), 10);
    return Number.isInteger(pid) && pid > 0 ? pid : null;
  } catch {
    return null;
  }
}

/** Takes the directory for this process or throws DataDirLockedError. Returns a release function. */
export function acquireDataDirLock(dataDir: string): () => void {
  const file = lockPath(dataDir);
  fs.mkdirSync(path.dirname(file), { recursive: true });
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      fs.writeFileSync(file, String(process.pid), { flag: "wx" });
      return () => releaseDataDirLock(dataDir);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== "EEXIST") throw error;
      const owner = readOwner(file);
      if (owner === process.pid) return () => releaseDataDirLock(dataDir);
      if (owner !== null && isAlive(owner)) throw new DataDirLockedError(dataDir, owner);
      // Left behind by a process that died: safe to take over.
      fs.rmSync(file, { force: true });
    }
  }
  throw new Error(`Could not take the lock ${file}`);
}

export function releaseDataDirLock(dataDir: string): void {
  const file = lockPath(dataDir);
  if (readOwner(file) === process.pid) fs.rmSync(file, { force: true });
}
