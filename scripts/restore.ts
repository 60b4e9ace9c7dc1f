// npm run restore <archive> - bring a backup's database and objects back into an EMPTY data folder
// and bucket; refuses, changing nothing, when either is not empty or the archive is damaged
import fs from "node:fs";
import path from "node:path";

import { databaseDir, loadDataDirInto } from "@/db/client";
import { DamagedArchiveError, readArchive, verifyArchive } from "@/lib/backup/archive";
import { bucketIsEmpty, deleteObjects, uploadObject } from "@/lib/backup/bucket";
import { bucket, ensureBucket } from "@/lib/storage/client";

import { fail } from "./lib/boot";
import { openOfflineWithStorage } from "./lib/offline";

class RestoreRefused extends Error {}

async function main() {
  const file = process.argv[2];
  if (!file || !fs.existsSync(file) || !fs.statSync(file).isFile())
    throw new RestoreRefused(
      `Name a backup archive: npm run restore backups/gradeline-backup-<date>.tar.gz${file ? ` (${file} is not a file)` : ""}`,
    );
  if (process.env.DATABASE_URL)
    throw new RestoreRefused(
      "DATABASE_URL is set: restore a PostgreSQL server with pg_restore; this command restores the embedded database.",
    );
  // The archive is read whole before anything is touched.
  const manifest = await verifyArchive(file);

  const dataDir = path.resolve(process.env.DATA_DIR || ".data");
  const createdDataDir = !fs.existsSync(dataDir);
  const storage = await openOfflineWithStorage();
  const dbDir = databaseDir();
  const uploaded: string[] = [];
  let wroteDb = false;
  try {
    if (fs.existsSync(dbDir) && fs.readdirSync(dbDir).length > 0)
      throw new RestoreRefused(
        `The database folder ${dbDir} is not empty. Restore only into an empty DATA_DIR: move the old one aside or set DATA_DIR to a new folder.`,
      );
    if (!(await bucketIsEmpty()))
      throw new RestoreRefused(`The bucket ${bucket()} in ${storage.storage} is not empty. Restore only into an empty bucket.`);
    await ensureBucket();
    let tables = 0;
    await readArchive(file, manifest, {
      object: async (o, body) => {
        await uploadObject(o.key, body, o.contentType);
        uploaded.push(o.key);
      },
      database: async (dump) => {
        wroteDb = true;
        tables = (await loadDataDirInto(dbDir, dump)).tables;
      },
    });
    console.log(
      `Restored the database (${tables} tables) into ${dbDir} and ${uploaded.length} objects into bucket ${bucket()} of ${storage.storage}, from the backup made ${manifest.createdAt}.`,
    );
  } catch (error) {
    // Leave the target as it was found: remove what this run wrote.
    await deleteObjects(uploaded).catch((e) => console.error("Could not remove the objects restored so far:", e));
    if (wroteDb) fs.rmSync(dbDir, { recursive: true, force: true });
    if (createdDataDir) fs.rmSync(dataDir, { recursive: true, force: true });
    throw error;
  } finally {
    await storage.close();
  }
}

main().catch((error) => {
  if (error instanceof RestoreRefused || error instanceof DamagedArchiveError) {
    console.error(`\nRestore refused: ${error.message}\n`);
    process.exit(1);
  }
  fail(error);
});
