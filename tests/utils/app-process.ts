// Starts the production build (scripts/start.ts with its stand-ins) as a process of its own, on a
// given data folder and loopback ports, for the trials that kill or stop it.
import { spawn } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";

import { freePort } from "./free-port";

export type AppPorts = { port: number; s3: number; smtp: number; payments: number };

export type AppProcess = {
  url: string;
  pid: number;
  dataDir: string;
  ports: AppPorts;
  log: () => string;
  exited: Promise<{ code: number | null; signal: NodeJS.Signals | null }>;
  /** SIGTERM, then waits for the exit (SIGKILL after `graceMs`). */
  stop: (graceMs?: number) => Promise<{ code: number | null; signal: NodeJS.Signals | null }>;
};

export async function appPorts(): Promise<AppPorts> {
  const [port, s3, smtp, payments] = await Promise.all([freePort(), freePort(), freePort(), freePort()]);
  return { port, s3, smtp, payments };
}

export const tempDataDir = (label: string) => fs.mkdtempSync(path.join(os.tmpdir(), `gradeline-${label}-`));

export async function startApp(opts: { dataDir: string; ports: AppPorts; env?: Record<string, string> }): Promise<AppProcess> {
  const { dataDir, ports } = opts;
  const url = `http://127.0.0.1:${ports.port}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: "production",
    GRADELINE_STANDINS: "1",
    DATABASE_URL: "",
    DATA_DIR: dataDir,
    PORT: String(ports.port),
    APP_URL: url,
    NEXTAUTH_URL: url,
    S3_PORT: String(ports.s3),
    S3_ENDPOINT: "",
    SMTP_PORT: String(ports.smtp),
    PAYMENTS_PORT: String(ports.payments),
    STRIPE_API_PORT: "",
    AUTH_LIMIT_PER_ACCOUNT: "50",
    AUTH_LIMIT_PER_ADDRESS: "1000",
    // Plain node (no tsx wrapper process), so a signal sent to `pid` reaches the app itself.
    TSX_TSCONFIG_PATH: "tsconfig.scripts.json",
    ...opts.env,
  };
  const child = spawn(process.execPath, ["--import", "tsx", "scripts/start.ts"], { env, stdio: ["ignore", "pipe", "pipe"] });
  let log = "";
  child.stdout.on("data", (d: Buffer) => (log += d));
  child.stderr.on("data", (d: Buffer) => (log += d));
  const exited = new Promise<{ code: number | null; signal: NodeJS.Signals | null }>((resolve) =>
    child.once("exit", (code, signal) => resolve({ code, signal })),
  );
  const stop = async (graceMs = 30_000) => {
    if (child.exitCode === null && child.signalCode === null) child.kill("SIGTERM");
    const timer = setTimeout(() => child.kill("SIGKILL"), graceMs);
    const result = await exited;
    clearTimeout(timer);
    return result;
  };
  const deadline = Date.now() + 120_000;
  for (;;) {
    if (child.exitCode !== null || child.signalCode !== null) throw new Error(`the app exited during start:\n${log}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) {
      await stop(1_000);
      throw new Error(`the app did not become healthy in 120 s:\n${log}`);
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  return { url, pid: child.pid!, dataDir, ports, log: () => log, exited, stop };
}
