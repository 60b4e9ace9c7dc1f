// R15: a page on another site posts to Gradeline with the victim's cookie riding along. Every
// state-changing route handler must refuse it and change nothing. The app has no server actions
// (no "use server" module), so route handlers are the whole surface; next-auth's own endpoints
// check their CSRF token (tried against the running app in tests/server/cross-origin.test.ts).
import fs from "node:fs";
import path from "node:path";

import { count, eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { POST as cancelOrder } from "@/app/api/orders/[id]/cancel/route";
import { POST as createOrder } from "@/app/api/orders/route";
import { getDb } from "@/db/client";
import { clips, orders } from "@/db/schema";

import { call } from "../utils/session";
import { deliveredReport, orderInput, signedIn } from "../utils/world";

const API = path.join(process.cwd(), "app", "api");
// Not cookie-authenticated: the provider's webhook is verified by its signature (tests/payments/unlock.test.ts).
const NOT_COOKIE_ROUTES = new Set(["auth/[...nextauth]", "webhooks/stripe"]);
const WRITES = ["POST", "PUT", "PATCH", "DELETE"] as const;
const CROSS_SITE: [string, Record<string, string>][] = [
  ["Origin of another site", { origin: "https://listings.example" }],
  ["Origin null (sandboxed frame)", { origin: "null" }],
  ["no Origin but Sec-Fetch-Site: cross-site", { "sec-fetch-site": "cross-site" }],
];

function routeFiles(dir = API): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) return routeFiles(full);
    return e.name === "route.ts" ? [full] : [];
  });
}

async function snapshot(): Promise<string> {
  const db = await getDb();
  const { rows } = (await db.execute(
    sql`select table_name from information_schema.tables where table_schema = 'public' order by table_name`,
  )) as unknown as { rows: { table_name: string }[] };
  const parts: string[] = [];
  for (const { table_name } of rows) {
    // Security events are the one thing a refusal may add.
    if (table_name === "audit_log") continue;
    const data = (await db.execute(sql.raw(`select * from "${table_name}" order by 1`))) as unknown as { rows: unknown[] };
    parts.push(`${table_name}:${JSON.stringify(data.rows)}`);
  }
  return parts.join("\n");
}

describe("R15 cross-origin requests with the victim's cookie", async () => {
  const world = await deliveredReport();
  const admin = await signedIn("admin");
  const db = await getDb();
  const [clip] = await db.select({ id: clips.id }).from(clips).where(eq(clips.orderId, world.id));
  const victims = { agent: world.agent.cookie, inspector: world.inspector.cookie, buyer: world.buyer.cookie, admin: admin.cookie };
  const own = { id: world.id, clipId: clip.id, shareId: crypto.randomUUID(), stillId: crypto.randomUUID() };

  it("R15: the same request from the app's own origin succeeds, so the refusal below is the origin check", async () => {
    const mine = await call(createOrder, {
      method: "POST",
      body: orderInput(),
      cookie: world.agent.cookie,
      headers: { origin: "http://127.0.0.1:3999" },
    });
    expect(mine.status).toBe(201);
    const cancelled = await call(cancelOrder, {
      method: "POST",
      params: { id: mine.json.id as string },
      body: { reason: "The buyer withdrew the offer." },
      cookie: world.agent.cookie,
      headers: { "sec-fetch-site": "same-origin" },
    });
    expect(cancelled.status).toBe(200);
  });

  it.each(CROSS_SITE)(
    "R15: every state-changing route handler refuses a cross-site request (%s) from every role with 403 and changes nothing",
    async (_label, headers) => {
      const before = await snapshot();
      const [ordersBefore] = await db.select({ n: count() }).from(orders);
      const failures: string[] = [];
      let tried = 0;
      for (const file of routeFiles()) {
        const rel = path.relative(API, path.dirname(file)).split(path.sep).join("/");
        if (NOT_COOKIE_ROUTES.has(rel)) continue;
        const mod = (await import(file)) as Record<string, unknown>;
        const params = Object.fromEntries(
          [...rel.matchAll(/\[(\w+)\]/g)].map((m) => [m[1], own[m[1] as keyof typeof own] ?? crypto.randomUUID()]),
        );
        for (const method of WRITES) {
          const handler = mod[method];
          if (typeof handler !== "function") continue;
          for (const [role, cookie] of Object.entries(victims)) {
            const body = rel === "orders" ? orderInput() : { reason: "Cross-site attempt.", parts: [], baseRevision: 1 };
            const res = await call(handler as never, { method, path: `/api/${rel}`, params, body, cookie, headers });
            tried++;
            if (res.status !== 403 || res.json.error?.code !== "forbidden")
              failures.push(`${method} /api/${rel} as ${role} → ${res.status} ${JSON.stringify(res.json).slice(0, 120)}`);
          }
        }
      }
      expect(tried).toBeGreaterThan(100);
      expect(failures).toEqual([]);
      const [ordersAfter] = await db.select({ n: count() }).from(orders);
      expect(ordersAfter.n).toBe(ordersBefore.n);
      expect(await snapshot()).toBe(before);
    },
    120_000,
  );
});
