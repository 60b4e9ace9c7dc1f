// Starts the local stand-ins (storage, mail, payments) once per run, on free loopback ports.
import fs from "node:fs";
import os from "node:os";
import path from "node:path";

import { startMailCatcher } from "@/services/mail-catcher";
import { startPaymentsStandin } from "@/services/payments-standin";
import { startStorage } from "@/services/storage";

export default async function setup() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "gradeline-test-"));
  const storage = await startStorage({ port: 0, dir: path.join(dir, "objects") });
  const mail = await startMailCatcher({ port: 0, dir: path.join(dir, "mail") });
  const webhookSecret = "whsec_gradeline_tests";
  const payments = await startPaymentsStandin({ port: 0, webhookSecret });
  Object.assign(process.env, {
    TEST_TMP_DIR: dir,
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
