// Seeds a bench data folder before the server starts: the demo world, then the bench world.
// Run by bench/run.ts with the server's environment (DATA_DIR, S3_PORT); prints the counts as JSON.
import path from "node:path";

import { closeDb, getDb } from "@/db/client";
import { seedDemoWorld } from "@/db/seed";
import { ensureBucket } from "@/lib/storage/client";
import { startStorage } from "@/services/storage";

import { openOffline } from "../scripts/lib/offline";
import { seedBenchWorld } from "./lib/seed-world";

openOffline();
// The demo reports put their clips in storage, so the stand-in runs while seeding.
const storage = await startStorage({ port: Number(process.env.S3_PORT), dir: path.join(process.env.DATA_DIR!, "objects") });
try {
  await getDb();
  await ensureBucket();
  await seedDemoWorld();
  console.log(JSON.stringify(await seedBenchWorld()));
} finally {
  await closeDb();
  await storage.close();
}
