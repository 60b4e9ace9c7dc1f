import fs from "node:fs";
import path from "node:path";

import { acquireDataLock, releaseAllDataLocks } from "@/db/lock";
import { startStorage } from "@/services/storage";

import { applyLocalDefaults } from "./local-env";

/** For commands that open the database themselves: same lock and defaults as the app. */
export function openOffline({ localDefaults = true } = {}): void {
  if (!process.env.DATABASE_URL) {
    acquireDataLock(path.resolve(process.env.DATA_DIR || ".data", "db"));
    process.on("exit", releaseAllDataLocks);
  }
  if (localDefaults) applyLocalDefaults();
}

/**
 * For commands that also need the bucket (backup, restore), with the app stopped. On one machine
 * the bucket lives in the storage stand-in under DATA_DIR/objects, which the app normally runs, so
 * it is started here on a free port. With S3_ENDPOINT set, or in production without the
 * stand-ins, the configured storage is used as it is.
 */
export async function openOfflineWithStorage(): Promise<{ storage: string; close: () => Promise<void> }> {
  if (fs.existsSync(".env")) process.loadEnvFile(".env");
  const production = process.env.NODE_ENV === "production" && process.env.GRADELINE_STANDINS !== "1";
  const configured = production || !!process.env.S3_ENDPOINT;
  openOffline({ localDefaults: !production });
  if (configured) return { storage: process.env.S3_ENDPOINT || "the configured S3 storage", close: async () => undefined };
  const dir = path.join(process.env.DATA_DIR!, "objects");
  const server = await startStorage({ port: 0, dir });
  process.env.S3_ENDPOINT = `http://127.0.0.1:${server.port}`;
  return { storage: `the local storage in ${dir}`, close: server.close };
}
