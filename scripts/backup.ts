// npm run backup - write the embedded database to a dated archive (stop the app first; it holds the lock)
import fs from "node:fs";
import path from "node:path";

import { closeDb, dumpDataDir } from "@/db/client";

import { fail } from "./lib/boot";
import { openOffline } from "./lib/offline";

async function main() {
  openOffline();
  const dir = path.resolve(process.env.BACKUP_DIR || "backups");
  fs.mkdirSync(dir, { recursive: true });
  const stamp = new Date().toISOString().replace(/[:.]/g, "-").slice(0, 19);
  const file = path.join(dir, `gradeline-db-${stamp}.tar.gz`);
  const blob = await dumpDataDir();
  fs.writeFileSync(file, Buffer.from(await blob.arrayBuffer()));
  await closeDb();
  console.log(`Database backed up to ${file} (${Math.round(blob.size / 1024)} kB). Restore: PGlite.create({ loadDataDir }) into an empty DATA_DIR.`);
}

main().catch(fail);
