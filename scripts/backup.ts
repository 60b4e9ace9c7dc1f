// npm run backup - write the embedded database and every object of the bucket to one dated archive
// (stop the app first: it holds the data lock)
import fs from "node:fs";
import path from "node:path";

import { closeDb, dumpDataDir } from "@/db/client";
import { writeArchive } from "@/lib/backup/archive";
import { bucketObjects } from "@/lib/backup/bucket";
import { bucket } from "@/lib/storage/client";

import { fail } from "./lib/boot";
import { openOfflineWithStorage } from "./lib/offline";

async function main() {
  const storage = await openOfflineWithStorage();
  try {
    const dir = path.resolve(process.env.BACKUP_DIR || "backups");
    fs.mkdirSync(dir, { recursive: true });
    const stamp = new Date().toISOString().replace(/[:.]/g, "-").slice(0, 19);
    const file = path.join(dir, `gradeline-backup-${stamp}.tar.gz`);
    const database = new Uint8Array(await (await dumpDataDir("none")).arrayBuffer());
    await closeDb();
    const manifest = await writeArchive(file, { bucket: bucket(), database, objects: bucketObjects() });
    const objectBytes = manifest.objects.reduce((sum, o) => sum + o.bytes, 0);
    console.log(
      `Backed up the database (${Math.round(database.length / 1024)} kB) and ${manifest.objects.length} objects ` +
        `(${Math.round(objectBytes / 1024)} kB) of bucket ${manifest.bucket} from ${storage.storage}\n` +
        `to ${file} (${Math.round(fs.statSync(file).size / 1024)} kB).\nRestore it into an empty DATA_DIR and bucket with: npm run restore ${path.relative(process.cwd(), file)}`,
    );
  } finally {
    await storage.close();
  }
}

main().catch(fail);
