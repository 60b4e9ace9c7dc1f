import { createServer, type Server } from "node:http";
import path from "node:path";

import next from "next";

import { closeDb, databaseDir, getDb, startStatisticsRefresher } from "@/db/client";
import { acquireDataLock, DataLockError, releaseAllDataLocks } from "@/db/lock";
import { seedDemoWorld } from "@/db/seed";
import { env, EnvError } from "@/lib/env";
import { startOutboxWorker } from "@/lib/mail/outbox-worker";
import { startAtRiskSweeper } from "@/lib/orders/at-risk-sweep";
import { startPayoutWorker } from "@/lib/payments/payouts";
import { startUploadSweeper } from "@/lib/uploads/sweeper";
import { startLicenceSweeper } from "@/lib/admin/licence-sweep";
import { ensureBucket } from "@/lib/storage/client";
import { startMailCatcher } from "@/services/mail-catcher";
import { startPaymentsStandin } from "@/services/payments-standin";
import { startStorage } from "@/services/storage";

import { applyLocalDefaults } from "./local-env";

type Closer = { name: string; close: () => Promise<void> };

export function fail(error: unknown): never {
  if (error instanceof DataLockError || error instanceof EnvError) {
    console.error(`\n${error.message}\n`);
  } else {
    console.error(error);
  }
  process.exit(1);
}

/** Starts Gradeline in one process: lock, stand-ins, database, seed, workers, then Next.js. */
export async function boot(opts: { dev: boolean; standins: boolean; seed: boolean }) {
  const closers: Closer[] = [];
  // The lock comes before anything else touches the data folder.
  const dataDir = process.env.DATA_DIR || ".data";
  if (!process.env.DATABASE_URL) {
    acquireDataLock(path.resolve(dataDir, "db"));
    process.on("exit", releaseAllDataLocks);
  }
  if (opts.standins) applyLocalDefaults();
  const e = env();

  if (opts.standins) {
    const storage = await startStorage({ port: Number(process.env.S3_PORT), dir: path.join(e.DATA_DIR, "objects") });
    closers.push({ name: "storage", close: storage.close });
    const mail = await startMailCatcher({ port: e.SMTP_PORT, dir: path.join(e.DATA_DIR, "mail") });
    closers.push({ name: "mail", close: mail.close });
    const payments = await startPaymentsStandin({
      port: Number(process.env.PAYMENTS_PORT),
      webhookUrl: `http://${e.HOST}:${e.PORT}/api/webhooks/stripe`,
      webhookSecret: e.STRIPE_WEBHOOK_SECRET,
      dataFile: path.join(e.DATA_DIR, "payments-standin.json"),
    });
    closers.push({ name: "payments", close: payments.close });
  }

  await getDb();
  await ensureBucket();
  if (opts.seed) await seedDemoWorld();
  const stopOutbox = startOutboxWorker();
  const stopAtRisk = startAtRiskSweeper();
  const stopPayouts = startPayoutWorker();
  const stopUploads = startUploadSweeper();
  const stopLicences = startLicenceSweeper(60 * 60_000);
  const stopStatistics = startStatisticsRefresher();

  const app = next({ dev: opts.dev, hostname: e.HOST, port: e.PORT, dir: process.cwd() });
  const handle = app.getRequestHandler();
  await app.prepare();
  let shuttingDown = false;
  const server: Server = createServer((req, res) => {
    if (shuttingDown) {
      res.writeHead(503, { "Retry-After": "5", Connection: "close" }).end("Gradeline is restarting. Try again in a few seconds.");
      return;
    }
    void handle(req, res);
  });
  await new Promise<void>((resolve) => server.listen(e.PORT, e.HOST, resolve));

  const shutdown = async (signal: string) => {
    if (shuttingDown) return;
    shuttingDown = true;
    console.log(`\n${signal}: finishing requests in flight, then closing the database.`);
    stopOutbox();
    stopAtRisk();
    stopPayouts();
    stopUploads();
    stopLicences();
    stopStatistics();
    const force = setTimeout(() => server.closeAllConnections(), 10_000);
    await new Promise<void>((resolve) => server.close(() => resolve()));
    clearTimeout(force);
    await app.close?.();
    await closeDb();
    for (const c of closers.reverse()) await c.close().catch(() => {});
    releaseAllDataLocks();
    process.exit(0);
  };
  process.on("SIGTERM", () => void shutdown("SIGTERM"));
  process.on("SIGINT", () => void shutdown("SIGINT"));

  return { url: `http://${e.HOST}:${e.PORT}`, databaseDir: process.env.DATABASE_URL ? "(PostgreSQL server)" : databaseDir() };
}
