import { asc, count, eq, inArray } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { getDb } from "@/db/client";
import { clips, inspections, ledgerEntries, orderEvents, orders, payments, reportAccess, users } from "@/db/schema";
import { seedDemoWorld } from "@/db/seed";

describe("the demo world", () => {
  it("is seeded once; a second run changes nothing", async () => {
    expect((await seedDemoWorld()).seeded).toBe(true);
    const db = await getDb();
    const [u1] = await db.select({ n: count() }).from(users);
    const [o1] = await db.select({ n: count() }).from(orders);
    expect((await seedDemoWorld()).seeded).toBe(false);
    const [u2] = await db.select({ n: count() }).from(users);
    const [o2] = await db.select({ n: count() }).from(orders);
    expect(u2.n).toBe(u1.n);
    expect(o2.n).toBe(o1.n);
  });

  it("has orders in every state and the demo sign-ins", async () => {
    const db = await getDb();
    const states = new Set((await db.select({ s: orders.status }).from(orders)).map((r) => r.s));
    expect([...states].sort()).toEqual(["accepted", "cancelled", "delivered", "open", "refunded", "scheduled", "unlocked"]);
    const emails = (await db.select({ e: users.email }).from(users)).map((r) => r.e);
    for (const e of [
      "agent@gradeline.test",
      "inspector@gradeline.test",
      "inspector2@gradeline.test",
      "buyer@gradeline.test",
      "admin@gradeline.test",
    ])
      expect(emails).toContain(e);
  });
});

describe("the demo reports", () => {
  it("every delivered, unlocked or refunded order has clips and a submitted record with its evaluation; the unlocked one has its buyer's access", async () => {
    await seedDemoWorld();
    const db = await getDb();
    const delivered = await db
      .select()
      .from(orders)
      .where(inArray(orders.status, ["delivered", "unlocked", "refunded"]));
    expect(delivered.length).toBeGreaterThanOrEqual(3);
    for (const o of delivered) {
      const [inspection] = await db.select().from(inspections).where(eq(inspections.orderId, o.id));
      expect(inspection.evaluation).toHaveProperty("severity");
      expect((await db.select().from(clips).where(eq(clips.orderId, o.id))).length).toBeGreaterThan(0);
    }
    const unlocked = delivered.find((o) => o.status === "unlocked")!;
    expect(await db.select().from(reportAccess).where(eq(reportAccess.orderId, unlocked.id))).toHaveLength(1);
    const { ledgerBalance } = await import("@/db/queries/payouts");
    expect((await ledgerBalance()).balanced).toBe(true);
  });
});

describe("the demo timeline", () => {
  it("tells each order's story in order and in the past: the visit before delivery, payment at the unlock, the refund after it", async () => {
    await seedDemoWorld();
    const db = await getDb();
    const now = Date.now();
    for (const o of await db.select().from(orders)) {
      const steps = await db.select().from(orderEvents).where(eq(orderEvents.orderId, o.id)).orderBy(asc(orderEvents.at));
      expect(steps.at(-1)?.toStatus, o.id).toBe(o.status);
      for (let i = 1; i < steps.length; i++) expect(steps[i].fromStatus).toBe(steps[i - 1].toStatus);
      expect(steps.every((e) => e.at.getTime() <= now)).toBe(true);
      const at = (s: string) => steps.find((e) => e.toStatus === s)?.at.getTime();
      if (o.deliveredAt) expect(at("delivered")).toBe(o.deliveredAt.getTime());
      if (o.appointmentEnd && o.deliveredAt) expect(o.deliveredAt.getTime()).toBeGreaterThanOrEqual(o.appointmentEnd.getTime());
      if (o.unlockedAt) {
        expect(at("unlocked")).toBe(o.unlockedAt.getTime());
        const [payment] = await db.select().from(payments).where(eq(payments.orderId, o.id));
        expect(payment.paidAt?.getTime()).toBe(o.unlockedAt.getTime());
        const entries = await db.select().from(ledgerEntries).where(eq(ledgerEntries.orderId, o.id));
        for (const e of entries)
          expect(e.createdAt.getTime(), e.kind).toBe(e.kind === "refund" || e.amountCents < 0 ? at("refunded") : o.unlockedAt.getTime());
      }
    }
  });
});
