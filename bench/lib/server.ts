// Builds the app if the sources are newer than the build, seeds a fresh data folder and starts the
// production server on free loopback ports, as tests/utils/server-setup.ts does for the server tests.
import { spawn, spawnSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";

import { buildIsFresh } from "../../scripts/lib/build-state";
import { freePort } from "../../tests/utils/free-port";

const bin = (name: string) => path.join("node_modules", ".bin", name);

export function buildIfStale(): "fresh" | "built" {
  if (buildIsFresh()) return "fresh";
  console.log("The sources are newer than the build: next build ...");
  const r = spawnSync(bin("next"), ["build"], { stdio: "inherit", env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1" } });
  if (r.status !== 0) throw new Error("next build failed");
  return "built";
}

export type BenchServer = { url: string; pid: number; dataDir: string; seeded: Record<string, number>; log: () => string; stop: () => Promise<void> };

export async function startBenchServer(): Promise<BenchServer> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "gradeline-bench-"));
  const [port, s3, smtp, payments] = await Promise.all([freePort(), freePort(), freePort(), freePort()]);
  const url = `http://127.0.0.1:${port}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: "production",
    NEXT_TELEMETRY_DISABLED: "1",
    GRADELINE_STANDINS: "1",
    GRADELINE_BENCH_ROUTES: "1",
    DATABASE_URL: "",
    DATA_DIR: dataDir,
    PORT: String(port),
    APP_URL: url,
    NEXTAUTH_URL: url,
    S3_PORT: String(s3),
    S3_ENDPOINT: "",
    SMTP_PORT: String(smtp),
    PAYMENTS_PORT: String(payments),
    STRIPE_API_PORT: "",
  };
  const cleanUp = () => fs.rmSync(dataDir, { recursive: true, force: true });
  const seed = spawnSync(bin("tsx"), ["--tsconfig", "tsconfig.scripts.json", "bench/seed.ts"], { env, encoding: "utf8" });
  if (seed.status !== 0) {
    cleanUp();
    throw new Error(`seeding failed:\n${seed.stdout}\n${seed.stderr}`);
  }
  const seeded = JSON.parse(seed.stdout.trim().split("\n").at(-1)!) as Record<string, number>;

  const child = spawn(bin("tsx"), ["--tsconfig", "tsconfig.scripts.json", "scripts/start.ts"], { env, stdio: ["ignore", "pipe", "pipe"] });
  let log = "";
  child.stdout.on("data", (d: Buffer) => (log += d));
  child.stderr.on("data", (d: Buffer) => (log += d));
  const stop = async () => {
    if (child.exitCode === null) {
      child.kill("SIGTERM");
      await new Promise((r) => (child.exitCode !== null ? r(null) : child.once("exit", r)));
    }
    cleanUp();
  };
  const deadline = Date.now() + 90_000;
  for (;;) {
    if (child.exitCode !== null) {
      cleanUp();
      throw new Error(`the app exited during start:\n${log}`);
    }
    try {
      if ((await fetch(`${url}/api/health`)).ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) {
      await stop();
      throw new Error(`the app did not become healthy in 90 s:\n${log}`);
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  return { url, pid: child.pid!, dataDir, seeded, log: () => log, stop };
}
