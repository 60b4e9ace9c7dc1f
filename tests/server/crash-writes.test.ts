import fs from "node:fs";

import { afterAll, describe, expect, it } from "vitest";

import { appPorts, startApp, tempDataDir, type AppProcess } from "../utils/app-process";
import { signIn } from "../utils/http-session";
import { orderExists, placeOrder } from "./support/orders";

const dataDir = tempDataDir("r5");
const running: AppProcess[] = [];

afterAll(async () => {
  for (const app of running) await app.stop(5_000);
  fs.rmSync(dataDir, { recursive: true, force: true });
});

describe("R5 kill -9 during a write loop", () => {
  it("R5: every order acknowledged before kill -9 is there after restart", async () => {
    const ports = await appPorts();
    const app = await startApp({ dataDir, ports });
    running.push(app);
    const agent = await signIn("agent@gradeline.test", "gradeline-demo", app.url);
    expect(agent.signedIn).toBe(true);

    const acknowledged: string[] = [];
    let attempted = 0;
    let killed = false;
    const started = Date.now();
    // Four writers at once, so some writes are in flight when the process dies; bounded in count and time.
    const writer = async () => {
      while (!killed && attempted < 400 && Date.now() - started < 30_000) {
        const n = attempted++;
        try {
          const res = await placeOrder(app.url, agent.cookie, n);
          if (res.id) acknowledged.push(res.id);
        } catch {
          return; // the connection died with the process
        }
      }
    };
    const writers = Promise.all([writer(), writer(), writer(), writer()]);
    while (acknowledged.length < 30 && Date.now() - started < 30_000) await new Promise((r) => setTimeout(r, 20));
    process.kill(app.pid, "SIGKILL");
    killed = true;
    expect((await app.exited).signal).toBe("SIGKILL");
    await writers;
    expect(acknowledged.length).toBeGreaterThanOrEqual(30);

    // The lock left behind names a dead process, so the restart takes it over.
    const again = await startApp({ dataDir, ports });
    running.push(again);
    const missing: string[] = [];
    for (const id of acknowledged) if (!(await orderExists(again.url, agent.cookie, id))) missing.push(id);
    expect(missing).toEqual([]);
    expect((await placeOrder(again.url, agent.cookie, 1000)).status).toBe(201);
    expect((await again.stop()).code).toBe(0);
  }, 240_000);
});
