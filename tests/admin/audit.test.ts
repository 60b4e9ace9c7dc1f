import fs from "node:fs";
import path from "node:path";

import { eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { GET as audit } from "@/app/api/admin/audit/route";
import { POST as verify } from "@/app/api/admin/inspectors/[id]/verify/route";
import { POST as savePrices } from "@/app/api/admin/prices/route";
import { PATCH as patchUser } from "@/app/api/admin/users/[id]/route";
import { getDb } from "@/db/client";
import { recordAudit } from "@/db/queries/audit";
import { auditLog } from "@/db/schema";
import { DEFAULT_PRICES } from "@/lib/pricing-defaults";

import { call } from "../utils/session";
import { signedIn, verifiedInspector } from "../utils/world";

type Entry = {
  action: string;
  actor: { email: string } | null;
  target: { type: string; id: string } | null;
  ip: string;
  at: string;
  data: Record<string, unknown>;
};
const list = async (cookie: string, query = "") => {
  const res = await call(audit, { path: `/api/admin/audit${query}`, cookie });
  return { ...res, entries: (res.json.entries ?? []) as Entry[] };
};

describe("the audit log", async () => {
  const admin = await signedIn("admin");
  const other = await signedIn("admin");
  const agent = await signedIn("agent");
  const waiting = await verifiedInspector(["97991"], { verified: false });
  const headers = { "x-forwarded-for": "198.51.100.23" };
  const setup = [
    await call(verify, { method: "POST", params: { id: waiting.user.id }, body: { decision: "approve" }, cookie: admin.cookie, headers }),
    await call(savePrices, { method: "POST", body: { ...DEFAULT_PRICES, baseCents: 33500 }, cookie: admin.cookie, headers }),
    await call(patchUser, { method: "PATCH", params: { id: agent.user.id }, body: { disabled: true }, cookie: admin.cookie, headers }),
    await call(patchUser, { method: "PATCH", params: { id: agent.user.id }, body: { disabled: false }, cookie: other.cookie, headers }),
  ];
  await recordAudit({ action: "auth.sign_in_failed", ip: "192.0.2.9", data: { email: "nobody@example.test" } });

  it("lists the admin actions newest first with who, what, target and address", async () => {
    expect(setup.map((r) => [r.status, r.json.error?.message])).toEqual([
      [200, undefined],
      [200, undefined],
      [200, undefined],
      [200, undefined],
    ]);
    const { status, entries } = await list(admin.cookie);
    expect(status).toBe(200);
    expect(entries.map((e) => e.action)).toEqual([
      "auth.sign_in_failed",
      "admin.user_enabled",
      "admin.user_disabled",
      "admin.prices_changed",
      "admin.inspector_approved",
    ]);
    expect(entries[1]).toMatchObject({
      actor: { email: other.user.email },
      target: { type: "user", id: agent.user.id },
      ip: "198.51.100.23",
    });
    expect(entries[0]).toMatchObject({ actor: null, ip: "192.0.2.9" });
    const times = entries.map((e) => Date.parse(e.at));
    expect([...times].sort((a, b) => b - a)).toEqual(times);
  });

  it("filters by action prefix, actor e-mail and date range, and pages", async () => {
    expect((await list(admin.cookie, "?action=admin.user_")).entries.map((e) => e.action)).toEqual([
      "admin.user_enabled",
      "admin.user_disabled",
    ]);
    expect((await list(admin.cookie, "?action=AUTH.")).entries.map((e) => e.action)).toEqual(["auth.sign_in_failed"]);
    expect((await list(admin.cookie, `?actor=${encodeURIComponent(other.user.email)}`)).entries.map((e) => e.action)).toEqual([
      "admin.user_enabled",
    ]);
    expect((await list(admin.cookie, "?action=admin.%25")).entries).toHaveLength(0);

    const db = await getDb();
    const [entry] = await db.select().from(auditLog).where(eq(auditLog.action, "admin.inspector_approved"));
    const day = (d: number) => new Date(Date.now() + d * 86_400_000).toISOString().slice(0, 10);
    expect((await list(admin.cookie, `?from=${day(-2)}&to=${day(2)}`)).entries).toHaveLength(5);
    expect((await list(admin.cookie, `?from=${day(3)}`)).entries).toHaveLength(0);
    expect((await list(admin.cookie, `?to=${day(-3)}`)).entries).toHaveLength(0);
    expect(entry).toBeDefined();
    expect((await list(admin.cookie, `?from=${day(2)}&to=${day(-2)}`)).status).toBe(400);
    expect((await list(admin.cookie, "?from=yesterday")).json.error?.fieldErrors).toHaveProperty("from");

    const first = await list(admin.cookie, "?pageSize=2&page=1");
    const second = await list(admin.cookie, "?pageSize=2&page=2");
    expect(first.json.total).toBe(5);
    expect([...first.entries, ...second.entries].map((e) => e.action)).toEqual([
      "auth.sign_in_failed",
      "admin.user_enabled",
      "admin.user_disabled",
      "admin.prices_changed",
    ]);
    expect((await list(admin.cookie, "?action=&actor=&from=&to=")).entries).toHaveLength(5);
  });

  it("no code path updates or deletes audit rows", () => {
    const roots = ["app", "lib", "db", "scripts", "services"];
    const offenders: string[] = [];
    const walk = (dir: string) => {
      for (const e of fs.readdirSync(dir, { withFileTypes: true })) {
        const p = path.join(dir, e.name);
        if (e.isDirectory()) {
          if (e.name !== "node_modules" && e.name !== "sql") walk(p);
        } else if (/\.(ts|tsx|sql)$/.test(e.name)) {
          const text = fs.readFileSync(p, "utf8");
          if (/\.(update|delete)\(\s*auditLog\b/.test(text) || /\b(update|delete\s+from|truncate)\s+"?audit_log"?/i.test(text))
            offenders.push(p);
        }
      }
    };
    for (const r of roots) if (fs.existsSync(r)) walk(r);
    expect(offenders).toEqual([]);
  });

  it("the append-only trigger (db/sql/audit-append-only.sql) refuses UPDATE, DELETE and TRUNCATE and still takes inserts", async () => {
    const db = await getDb();
    const text = fs.readFileSync("db/sql/audit-append-only.sql", "utf8");
    for (const statement of text.split("--> statement-breakpoint")) await db.execute(sql.raw(statement));
    await expect(db.update(auditLog).set({ action: "tampered" })).rejects.toThrow();
    await expect(db.delete(auditLog)).rejects.toThrow();
    await expect(db.execute(sql`truncate audit_log`)).rejects.toThrow();
    await recordAudit({ action: "test.after_trigger" });
    const rows = await db.select({ action: auditLog.action }).from(auditLog);
    expect(rows.map((r) => r.action)).not.toContain("tampered");
    expect(rows).toHaveLength(6);
  });
});
