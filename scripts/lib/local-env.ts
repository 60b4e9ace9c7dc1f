import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";

/** Defaults for running on one machine with the local stand-ins; anything set in the environment wins. */
export function applyLocalDefaults(): void {
  if (fs.existsSync(".env")) process.loadEnvFile(".env");
  const dataDir = process.env.DATA_DIR || ".data";
  const port = process.env.PORT || "3000";
  const secretsFile = path.join(dataDir, "local-secrets.json");
  let secrets: { auth: string; webhook: string };
  if (fs.existsSync(secretsFile)) {
    secrets = JSON.parse(fs.readFileSync(secretsFile, "utf8"));
  } else {
    secrets = { auth: randomBytes(32).toString("hex"), webhook: `whsec_${randomBytes(24).toString("hex")}` };
    fs.mkdirSync(dataDir, { recursive: true });
    fs.writeFileSync(secretsFile, JSON.stringify(secrets), { mode: 0o600 });
  }
  const defaults: Record<string, string> = {
    DATA_DIR: dataDir,
    PORT: port,
    HOST: "127.0.0.1",
    APP_URL: `http://127.0.0.1:${port}`,
    NEXTAUTH_URL: `http://127.0.0.1:${port}`,
    NEXTAUTH_SECRET: secrets.auth,
    S3_PORT: "4569",
    S3_ACCESS_KEY_ID: "S3RVER",
    S3_SECRET_ACCESS_KEY: "S3RVER",
    S3_BUCKET: "gradeline-media",
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: "1025",
    PAYMENTS_PORT: "12111",
    STRIPE_SECRET_KEY: "sk_test_gradeline_local",
    STRIPE_WEBHOOK_SECRET: secrets.webhook,
    MAILBOX_ENABLED: "true",
    NEXT_TELEMETRY_DISABLED: "1",
  };
  for (const [key, value] of Object.entries(defaults)) if (!process.env[key]) process.env[key] = value;
  const set = (key: string, value: string) => (process.env[key] ||= value);
  set("S3_ENDPOINT", `http://127.0.0.1:${process.env.S3_PORT}`);
  set("STRIPE_API_HOST", "127.0.0.1");
  set("STRIPE_API_PORT", process.env.PAYMENTS_PORT!);
  set("STRIPE_API_PROTOCOL", "http");
}
