import fs from "node:fs";
import http from "node:http";
import path from "node:path";

import { afterAll, describe, expect, it } from "vitest";

import { appPorts, startApp, tempDataDir, type AppProcess } from "../utils/app-process";
import { signIn } from "../utils/http-session";
import { orderBody, orderExists, placeOrder } from "./support/orders";

const dataDir = tempDataDir("r7");
const running: AppProcess[] = [];

afterAll(async () => {
  for (const app of running) await app.stop(5_000);
  fs.rmSync(dataDir, { recursive: true, force: true });
});

/** A POST whose headers and first half are sent now and the rest on `finish()`: in flight for sure. */
function slowOrder(url: string, cookie: string, n: number) {
  const body = Buffer.from(JSON.stringify(orderBody(n)));
  const target = new URL("/api/orders", url);
  const req = http.request({
    host: target.hostname,
    port: target.port,
    path: target.pathname,
    method: "POST",
    agent: false,
    headers: { cookie, origin: url, "content-type": "application/json", "content-length": body.length },
  });
  const answer = new Promise<{ status: number; id?: string }>((resolve, reject) => {
    req.on("response", (res) => {
      let text = "";
      res.on("data", (d: Buffer) => (text += d));
      res.on("end", () =>
        resolve({ status: res.statusCode ?? 0, id: res.statusCode === 201 ? (JSON.parse(text) as { id: string }).id : undefined }),
      );
    });
    req.on("error", reject);
  });
  req.write(body.subarray(0, body.length >> 1));
  return { answer, finish: () => req.end(body.subarray(body.length >> 1)) };
}

describe("R7 SIGTERM under load", () => {
  it("R7: in-flight requests finish or get 503; the database checkpoints and closes; the next start opens cleanly", async () => {
    const ports = await appPorts();
    const app = await startApp({ dataDir, ports });
    running.push(app);
    const agent = await signIn("agent@gradeline.test", "gradeline-demo", app.url);
    expect(agent.signedIn).toBe(true);

    const statuses: number[] = [];
    const errors: string[] = [];
    const acknowledged: string[] = [];
    let n = 0;
    let stopLoad = false;
    const started = Date.now();
    const loader = async () => {
      while (!stopLoad && n < 400 && Date.now() - started < 30_000) {
        const i = n++;
        try {
          if (i % 2 === 0) {
            const res = await placeOrder(app.url, agent.cookie, i);
            statuses.push(res.status);
            if (res.id) acknowledged.push(res.id);
          } else {
            const res = await fetch(`${app.url}/api/orders`, { headers: { cookie: agent.cookie } });
            await res.arrayBuffer();
            statuses.push(res.status);
          }
        } catch (error) {
          const cause = (error as { cause?: { code?: string } }).cause;
          errors.push(cause?.code ?? String(error));
          if (cause?.code === "ECONNREFUSED") return; // the server stopped listening
        }
      }
    };
    const load = Promise.all([loader(), loader(), loader(), loader()]);
    const slow = [slowOrder(app.url, agent.cookie, 9001), slowOrder(app.url, agent.cookie, 9002), slowOrder(app.url, agent.cookie, 9003)];
    while (statuses.length < 20 && Date.now() - started < 30_000) await new Promise((r) => setTimeout(r, 20));
    process.kill(app.pid, "SIGTERM");
    await new Promise((r) => setTimeout(r, 300));
    for (const s of slow) s.finish();
    const slowAnswers = await Promise.all(slow.map((s) => s.answer));
    const exit = await app.exited;
    stopLoad = true;
    await load;

    expect(slowAnswers.map((a) => a.status)).toEqual([201, 201, 201]);
    expect(statuses.length).toBeGreaterThanOrEqual(20);
    expect(statuses.filter((s) => ![200, 201, 503].includes(s))).toEqual([]);
    // Only connection-level refusals once the server stopped listening; never a broken answer.
    expect(errors.filter((e) => !["ECONNREFUSED", "ECONNRESET", "UND_ERR_SOCKET"].includes(e))).toEqual([]);
    expect(exit).toEqual({ code: 0, signal: null });
    expect(app.log()).toContain("SIGTERM: finishing requests in flight, then closing the database.");
    expect(fs.existsSync(path.join(dataDir, "db.lock"))).toBe(false);

    const again = await startApp({ dataDir, ports });
    running.push(again);
    const everyWrite = [...acknowledged, ...slowAnswers.map((a) => a.id!)];
    const missing: string[] = [];
    for (const id of everyWrite) if (!(await orderExists(again.url, agent.cookie, id))) missing.push(id);
    expect(missing).toEqual([]);
    expect((await placeOrder(again.url, agent.cookie, 2000)).status).toBe(201);
    expect((await again.stop()).code).toBe(0);
  }, 240_000);
});
