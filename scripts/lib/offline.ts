import path from "node:path";

import { acquireDataLock, releaseAllDataLocks } from "@/db/lock";

import { applyLocalDefaults } from "./local-env";

/** For commands that open the database themselves: same lock and defaults as the app. */
export function openOffline(): void {
  if (!process.env.DATABASE_URL) {
    acquireDataLock(path.resolve(process.env.DATA_DIR || ".data", "db"));
    process.on("exit", releaseAllDataLocks);
  }
  applyLocalDefaults();
}
