import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { POST as createOrder } from "@/app/api/orders/route";
import { getDb } from "@/db/client";
import { atRiskCondition } from "@/db/queries/at-risk-sql";
import { mailOutbox, orders } from "@/db/schema";
import { atRiskReasons } from "@/lib/orders/at-risk";
import { sweepAtRisk } from "@/lib/orders/at-risk-sweep";

import { call } from "../utils/session";
import { orderInput, signedIn, verifiedInspector } from "../utils/world";

const HOUR = 3_600_000;
const now = new Date("2026-12-02T12:00:00Z");
const h = (n: number) => new Date(now.getTime() + n * HOUR);

describe("the at-risk rules (Gradeline's own product rules)", () => {
  const base = { status: "open", createdAt: h(-1), deadline: h(100), inspectorId: null, appointmentEnd: null };

  it("flags an order no inspector has taken 12 hours after ordering", () => {
    expect(atRiskReasons({ ...base, createdAt: h(-11.9) }, now)).toEqual([]);
    expect(atRiskReasons({ ...base, createdAt: h(-12) }, now)).toEqual(["no_inspector"]);
  });

  it("flags an appointment that ends after the deadline", () => {
    expect(atRiskReasons({ ...base, inspectorId: "i", status: "scheduled", appointmentEnd: h(101) }, now)).toEqual(["appointment_after_deadline"]);
    expect(atRiskReasons({ ...base, inspectorId: "i", status: "scheduled", appointmentEnd: h(100) }, now)).toEqual([]);
  });

  it("flags an order with no appointment 24 hours before the deadline", () => {
    expect(atRiskReasons({ ...base, inspectorId: "i", status: "accepted", deadline: h(24.1) }, now)).toEqual([]);
    expect(atRiskReasons({ ...base, inspectorId: "i", status: "accepted", deadline: h(24) }, now)).toEqual(["no_appointment"]);
  });

  it("never flags delivered, unlocked or cancelled orders", () => {
    for (const status of ["delivered", "unlocked", "cancelled", "refunded"]) expect(atRiskReasons({ ...base, status, createdAt: h(-50), deadline: h(1) }, now)).toEqual([]);
  });
});

describe("the at-risk sweep", async () => {
  await verifiedInspector(["97991"]);
  const agent = await signedIn("agent");
  const admin = await signedIn("admin");

  it("agrees with the SQL filter, and warns the agent and the admin once", async () => {
    const fresh = await call(createOrder, { method: "POST", body: orderInput(), cookie: agent.cookie });
    const stale = await call(createOrder, { method: "POST", body: orderInput(), cookie: agent.cookie });
    const db = await getDb();
    await db.update(orders).set({ createdAt: new Date(Date.now() - 13 * HOUR) }).where(eq(orders.id, stale.json.id as string));

    const all = await db.select().from(orders);
    const flaggedSql = new Set((await db.select({ id: orders.id }).from(orders).where(atRiskCondition())).map((r) => r.id));
    for (const o of all) expect(flaggedSql.has(o.id)).toBe(atRiskReasons(o).length > 0);
    expect(flaggedSql.has(stale.json.id as string)).toBe(true);
    expect(flaggedSql.has(fresh.json.id as string)).toBe(false);

    expect(await sweepAtRisk()).toBe(1);
    expect(await sweepAtRisk()).toBe(0);
    const mail = await db.select().from(mailOutbox);
    const warnings = mail.filter((m) => m.subject.startsWith("At risk:"));
    expect(warnings.map((m) => m.toAddress).sort()).toEqual([admin.user.email, agent.user.email].sort());
  });
});
