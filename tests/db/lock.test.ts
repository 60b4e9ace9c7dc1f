import { spawn, spawnSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";

import { describe, expect, it } from "vitest";

import { acquireDataLock, DataLockError, lockPathFor, releaseDataLock } from "@/db/lock";

const tsx = path.join(process.cwd(), "node_modules", ".bin", "tsx");

/** A plain node process (no tsx wrapper) so its pid is the one that holds the lock. */
function holdLockInChild(dir: string) {
  const script = path.join(fs.mkdtempSync(path.join(os.tmpdir(), "holder-")), "hold.ts");
  const lockModule = path.join(process.cwd(), "db", "lock.ts");
  fs.writeFileSync(script, `import { acquireDataLock } from ${JSON.stringify(lockModule)}; acquireDataLock(${JSON.stringify(dir)}); console.log("held"); setInterval(() => {}, 1000);`);
  const child = spawn(process.execPath, ["--import", "tsx", script], { cwd: process.cwd(), stdio: ["ignore", "pipe", "inherit"] });
  return new Promise<typeof child>((resolve, reject) => {
    child.stdout.on("data", (d: Buffer) => d.toString().includes("held") && resolve(child));
    child.on("exit", (c) => reject(new Error(`child exited ${c}`)));
  });
}

describe("the data folder lock", () => {
  it("refuses a second process and names the one holding it", async () => {
    const dir = path.join(fs.mkdtempSync(path.join(os.tmpdir(), "lock-")), "db");
    const child = await holdLockInChild(dir);
    try {
      let caught: unknown;
      try {
        acquireDataLock(dir);
      } catch (error) {
        caught = error;
      }
      expect(caught).toBeInstanceOf(DataLockError);
      expect((caught as DataLockError).message).toContain(`pid ${child.pid}`);
      expect((caught as DataLockError).holder.pid).toBe(child.pid);
    } finally {
      child.kill("SIGKILL");
    }
  });

  it("takes over a lock left behind by a process that was killed", async () => {
    const dir = path.join(fs.mkdtempSync(path.join(os.tmpdir(), "lock-")), "db");
    const child = await holdLockInChild(dir);
    child.kill("SIGKILL");
    await new Promise((r) => child.on("exit", r));
    expect(fs.existsSync(lockPathFor(dir))).toBe(true);
    expect(() => acquireDataLock(dir)).not.toThrow();
    releaseDataLock(dir);
    expect(fs.existsSync(lockPathFor(dir))).toBe(false);
  });

  it("a second server on the same folder exits at once with a clear message and writes nothing", () => {
    const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "lock-app-"));
    const dbDir = path.join(dataDir, "db");
    acquireDataLock(dbDir);
    try {
      const before = fs.readdirSync(dataDir).sort();
      const result = spawnSync(tsx, ["--tsconfig", "tsconfig.scripts.json", "scripts/start.ts"], {
        cwd: process.cwd(),
        env: { ...process.env, DATA_DIR: dataDir, DATABASE_URL: "", GRADELINE_STANDINS: "1", PORT: "3998" },
        encoding: "utf8",
        timeout: 30_000,
      });
      expect(result.status).toBe(1);
      expect(result.stderr).toContain("is in use by another Gradeline process");
      expect(result.stderr).toContain(`pid ${process.pid}`);
      expect(fs.readdirSync(dataDir).sort()).toEqual(before);
    } finally {
      releaseDataLock(dbDir);
    }
  });
});
