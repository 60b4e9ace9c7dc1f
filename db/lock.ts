import fs from "node:fs";
import path from "node:path";

// PGlite takes no lock of its own, and two processes on one folder silently lose rows,
// so the app holds an exclusive lock file beside the database folder.

export type LockInfo = { pid: number; command: string; startedAt: string };

export class DataLockError extends Error {
  constructor(
    public readonly lockPath: string,
    public readonly holder: LockInfo,
  ) {
    super(
      `The data folder ${path.dirname(lockPath)} is in use by another Gradeline process ` +
        `(pid ${holder.pid}, "${holder.command}", started ${holder.startedAt}). ` +
        `Stop that process first, or set DATA_DIR to another folder to run a second copy.`,
    );
    this.name = "DataLockError";
  }
}

const held = new Set<string>();

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === "EPERM";
  }
}

function readLock(lockPath: string): LockInfo | null {
  try {
    return JSON.parse(fs.readFileSync(lockPath, "utf8")) as LockInfo;
  } catch {
    return null;
  }
}

export function lockPathFor(databaseDir: string): string {
  return `${path.resolve(databaseDir)}.lock`;
}

/** Takes the lock or throws DataLockError naming the holder. Re-entrant within one process. */
export function acquireDataLock(databaseDir: string): string {
  const lockPath = lockPathFor(databaseDir);
  fs.mkdirSync(path.dirname(lockPath), { recursive: true });
  for (let attempt = 0; attempt < 2; attempt++) {
    const existing = readLock(lockPath);
    if (existing?.pid === process.pid) {
      held.add(lockPath);
      return lockPath;
    }
    try {
      const info: LockInfo = { pid: process.pid, command: process.argv.slice(1).join(" ").slice(0, 200), startedAt: new Date().toISOString() };
      fs.writeFileSync(lockPath, JSON.stringify(info), { flag: "wx" });
      held.add(lockPath);
      return lockPath;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== "EEXIST") throw error;
      const holder = readLock(lockPath);
      if (holder && isAlive(holder.pid)) throw new DataLockError(lockPath, holder);
      // The holder died without cleaning up (kill -9): the lock is stale.
      fs.rmSync(lockPath, { force: true });
    }
  }
  throw new Error(`Could not take the lock ${lockPath}`);
}

export function releaseDataLock(databaseDir: string): void {
  const lockPath = lockPathFor(databaseDir);
  if (!held.has(lockPath)) return;
  if (readLock(lockPath)?.pid === process.pid) fs.rmSync(lockPath, { force: true });
  held.delete(lockPath);
}

export function releaseAllDataLocks(): void {
  for (const lockPath of held) {
    if (readLock(lockPath)?.pid === process.pid) fs.rmSync(lockPath, { force: true });
  }
  held.clear();
}
