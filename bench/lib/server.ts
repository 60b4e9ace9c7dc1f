// Builds the app if the sources are newer than the build, seeds a fresh data folder and starts the
// production server on free loopback ports, the way the server tests start theirs.
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";

import { buildIsFresh } from "../../scripts/lib/build-state";
import { appPorts, startApp, tempDataDir } from "../../tests/utils/app-process";

const bin = (name: string) => path.join("node_modules", ".bin", name);

export function buildIfStale(): "fresh" | "built" {
  if (buildIsFresh()) return "fresh";
  console.log("The sources are newer than the build: next build ...");
  const r = spawnSync(bin("next"), ["build"], { stdio: "inherit", env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1" } });
  if (r.status !== 0) throw new Error("next build failed");
  return "built";
}

export type BenchServer = { url: string; pid: number; seeded: Record<string, number>; stop: () => Promise<void> };

export async function startBenchServer(): Promise<BenchServer> {
  const dataDir = tempDataDir("bench");
  const ports = await appPorts();
  const cleanUp = () => fs.rmSync(dataDir, { recursive: true, force: true });
  // The seed runs first, on its own, with the storage stand-in the demo clips go to.
  const seed = spawnSync(bin("tsx"), ["--tsconfig", "tsconfig.scripts.json", "bench/seed.ts"], {
    env: { ...process.env, NODE_ENV: "production", GRADELINE_STANDINS: "1", DATABASE_URL: "", DATA_DIR: dataDir, S3_PORT: String(ports.s3), S3_ENDPOINT: "" },
    encoding: "utf8",
  });
  if (seed.status !== 0) {
    cleanUp();
    throw new Error(`seeding failed:\n${seed.stdout}\n${seed.stderr}`);
  }
  const seeded = JSON.parse(seed.stdout.trim().split("\n").at(-1)!) as Record<string, number>;
  try {
    const app = await startApp({ dataDir, ports, env: { GRADELINE_BENCH_ROUTES: "1", NEXT_TELEMETRY_DISABLED: "1" } });
    const stop = async () => {
      await app.stop();
      cleanUp();
    };
    return { url: app.url, pid: app.pid, seeded, stop };
  } catch (e) {
    cleanUp();
    throw e;
  }
}
