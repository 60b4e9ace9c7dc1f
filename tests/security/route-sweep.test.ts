// Calls every route handler of the app, as every role that may not touch the objects involved and
// with malformed bodies: each answer must be 400, 401, 403 or 404 (never 500), and nothing changes.
import fs from "node:fs";
import path from "node:path";

import { sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { getDb } from "@/db/client";
import { clips } from "@/db/schema";

import { call } from "../utils/session";
import { deliveredReport, signedIn, verifiedInspector } from "../utils/world";

const API = path.join(process.cwd(), "app", "api");
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;
// next-auth's own endpoints need Next's request context; the server tests sign in through them.
const SKIP = new Set(["auth/[...nextauth]"]);
const PUBLIC_OK: Record<string, number[]> = { "health GET": [200, 503] };
// Actions on the caller's own account that take no input: legitimate for that role, so not swept as it.
const OWN_ACTIONS: Record<string, string> = { "payouts/connect POST": "an inspector elsewhere" };

function routeFiles(dir = API): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) return routeFiles(full);
    return e.name === "route.ts" ? [full] : [];
  });
}

const BODIES: unknown[] = [
  {},
  { id: -1, amountCents: -100, sizeBytes: -5, slots: "x", parts: [{ partNumber: 0 }], record: "x".repeat(600_000), reason: 7, baseRevision: -1, unknownField: true },
  ["not", "an", "object"],
];

async function snapshot(): Promise<string> {
  const db = await getDb();
  const tables = (await db.execute(sql`select table_name from information_schema.tables where table_schema = 'public' and table_name not in ('audit_log', 'auth_sessions', '__drizzle_migrations') order by table_name`)) as unknown as { rows: { table_name: string }[] };
  const rows = tables.rows;
  const parts: string[] = [];
  for (const { table_name } of rows) {
    const data = (await db.execute(sql.raw(`select * from "${table_name}" order by 1`))) as unknown as { rows: unknown[] };
    parts.push(`${table_name}:${JSON.stringify(data.rows)}`);
  }
  return parts.join("\n");
}

describe("the route sweep", async () => {
  const victim = await deliveredReport();
  const db = await getDb();
  const [clip] = await db.select({ id: clips.id }).from(clips).where(sql`${clips.orderId} = ${victim.id}`);
  const attackers = {
    "signed out": null,
    "another agent": (await signedIn("agent")).cookie,
    "an inspector elsewhere": (await verifiedInspector(["97993"])).cookie,
    "an uninvited buyer": (await signedIn("buyer")).cookie,
  };
  const foreign = { id: victim.id, clipId: clip.id, shareId: crypto.randomUUID(), stillId: crypto.randomUUID(), token: "x".repeat(30) };
  const secrets = [victim.id, clip.id];
  const files = routeFiles();

  it("finds the app's routes by reading the app folder", () => {
    expect(files.length).toBeGreaterThan(20);
  });

  it("every route answers 400, 401, 403 or 404 to every caller who may not touch the objects, and to malformed bodies, and changes nothing", async () => {
    const before = await snapshot();
    const failures: string[] = [];
    for (const file of files) {
      const rel = path.relative(API, path.dirname(file)).split(path.sep).join("/");
      if (SKIP.has(rel)) continue;
      const mod = (await import(file)) as Record<string, unknown>;
      const dynamic = [...rel.matchAll(/\[(\w+)\]/g)].map((m) => m[1]);
      const params = Object.fromEntries(dynamic.map((d) => [d, foreign[d as keyof typeof foreign] ?? crypto.randomUUID()]));
      for (const method of METHODS) {
        const handler = mod[method];
        if (typeof handler !== "function") continue;
        for (const [who, cookie] of Object.entries(attackers)) {
          if (OWN_ACTIONS[`${rel} ${method}`] === who) continue;
          for (const body of method === "GET" || method === "DELETE" ? [undefined] : BODIES) {
            const res = await call(handler as never, { method, path: `/api/${rel}`, params, body, cookie: cookie ?? undefined });
            const label = `${method} /api/${rel} as ${who}${body === undefined ? "" : ` with ${JSON.stringify(body).slice(0, 40)}`}`;
            const text = JSON.stringify(res.json);
            const allowed = PUBLIC_OK[`${rel} ${method}`] ?? (dynamic.length === 0 && method === "GET" && cookie ? [200, 400, 401, 403, 404] : [400, 401, 403, 404]);
            if (!allowed.includes(res.status)) failures.push(`${label} → ${res.status} ${text.slice(0, 160)}`);
            if (secrets.some((s) => text.includes(s)) && res.status < 400) failures.push(`${label} leaked a foreign id`);
          }
        }
        if (OWN_ACTIONS[`${rel} ${method}`]) continue;
        const garbled = await call(handler as never, { method, path: `/api/${rel}`, params: Object.fromEntries(dynamic.map((d) => [d, "not-an-id'; drop table users; --"])), body: method === "GET" || method === "DELETE" ? undefined : "{broken json", cookie: attackers["another agent"] });
        if (!(PUBLIC_OK[`${rel} ${method}`] ?? [200, 400, 401, 403, 404]).includes(garbled.status)) failures.push(`${method} /api/${rel} with garbled input → ${garbled.status}`);
      }
    }
    expect(failures).toEqual([]);
    expect(await snapshot()).toBe(before);
  }, 240_000);
});
