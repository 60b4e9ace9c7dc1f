// Starts the local stand-ins (storage, mail, payments) once per run, on free loopback ports.
import fs from "node:fs";
import os from "node:os";
import path from "node:path";

import { PGlite } from "@electric-sql/pglite";
import { drizzle } from "drizzle-orm/pglite";
import { migrate } from "drizzle-orm/pglite/migrator";

import { startMailCatcher } from "@/services/mail-catcher";
import { startPaymentsStandin } from "@/services/payments-standin";
import { startStorage } from "@/services/storage";

export default async function setup() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "gradeline-test-"));
  const storage = await startStorage({ port: 0, dir: path.join(dir, "objects") });
  const mail = await startMailCatcher({ port: 0, dir: path.join(dir, "mail") });
  const webhookSecret = "whsec_gradeline_tests";
  const template = path.join(dir, "pglite-template.tar");
  const db = await PGlite.create("memory://");
  await migrate(drizzle({ client: db }), { migrationsFolder: path.join(process.cwd(), "db", "migrations") });
  fs.writeFileSync(template, Buffer.from(await (await db.dumpDataDir("none")).arrayBuffer()));
  await db.close();
  const payments = await startPaymentsStandin({ port: 0, webhookSecret });
  Object.assign(process.env, {
    TEST_TMP_DIR: dir,
    PGLITE_TEMPLATE: template,
    DATA_DIR: dir,
    S3_ENDPOINT: `http://127.0.0.1:${storage.port}`,
    S3_ACCESS_KEY_ID: "S3RVER",
    S3_SECRET_ACCESS_KEY: "S3RVER",
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(mail.port),
    MAIL_DIR: path.join(dir, "mail"),
    STRIPE_SECRET_KEY: "sk_test_gradeline_tests",
    STRIPE_WEBHOOK_SECRET: webhookSecret,
    STRIPE_API_HOST: "127.0.0.1",
    STRIPE_API_PORT: String(payments.port),
    STRIPE_API_PROTOCOL: "http",
    MAILBOX_ENABLED: "true",
  });
  return async () => {
    await Promise.allSettled([storage.close(), mail.close(), payments.close()]);
    fs.rmSync(dir, { recursive: true, force: true });
  };
}
