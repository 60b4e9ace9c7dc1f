// Starts the built app with its local stand-ins on free loopback ports for the server and browser tests.
import { spawn } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";

import { freePort } from "./free-port";

export default async function setup() {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "gradeline-server-"));
  const [port, s3, smtp, payments] = await Promise.all([freePort(), freePort(), freePort(), freePort()]);
  const url = `http://127.0.0.1:${port}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: "production",
    GRADELINE_STANDINS: "1",
    DATABASE_URL: "",
    DATA_DIR: dataDir,
    PORT: String(port),
    APP_URL: url,
    NEXTAUTH_URL: url,
    S3_PORT: String(s3),
    S3_ENDPOINT: "",
    SMTP_PORT: String(smtp),
    PAYMENTS_PORT: String(payments),
    STRIPE_API_PORT: "",
    AUTH_LIMIT_PER_ACCOUNT: "5",
    AUTH_LIMIT_PER_ADDRESS: "1000",
    // The browser tests read the invitations and receipts the way a developer does, on /dev/mailbox.
    MAILBOX_ENABLED: "true",
  };
  const child = spawn(path.join("node_modules", ".bin", "tsx"), ["--tsconfig", "tsconfig.scripts.json", "scripts/start.ts"], { env, stdio: ["ignore", "pipe", "pipe"] });
  let log = "";
  child.stdout.on("data", (d: Buffer) => (log += d));
  child.stderr.on("data", (d: Buffer) => (log += d));
  const deadline = Date.now() + 90_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the app exited during start:\n${log}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`the app did not become healthy in 90 s:\n${log}`);
    await new Promise((r) => setTimeout(r, 300));
  }
  Object.assign(process.env, { GRADELINE_URL: url, GRADELINE_DATA_DIR: dataDir, GRADELINE_APP_PID: String(child.pid), GRADELINE_S3_URL: `http://127.0.0.1:${s3}` });
  return async () => {
    child.kill("SIGTERM");
    await new Promise((r) => (child.exitCode !== null ? r(null) : child.once("exit", r)));
    if (process.env.KEEP_TEST_DATA !== "1") fs.rmSync(dataDir, { recursive: true, force: true });
  };
}
