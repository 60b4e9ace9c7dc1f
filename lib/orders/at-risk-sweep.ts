import "server-only";

import { and, eq, isNull } from "drizzle-orm";

import { getDb } from "@/db/client";
import { mailOrder } from "@/db/queries/order-commands";
import { listUnflaggedAtRisk } from "@/db/queries/order-lists";
import { orders, users } from "@/db/schema";

import { AT_RISK_TEXT, atRiskReasons } from "./at-risk";
import { orderMail } from "./mail";

/** Warns the agent and every admin once when an order becomes at risk. */
export async function sweepAtRisk(now = new Date()): Promise<number> {
  const db = await getDb();
  const found = await listUnflaggedAtRisk();
  const admins = await db.select({ email: users.email, name: users.name }).from(users).where(and(eq(users.role, "admin"), isNull(users.disabledAt)));
  let flagged = 0;
  for (const row of found) {
    const reasons = atRiskReasons(row.order, now).map((r) => AT_RISK_TEXT[r]);
    if (reasons.length === 0) continue;
    await db.transaction(async (tx) => {
      const [claimed] = await tx
        .update(orders)
        .set({ atRiskNotifiedAt: now })
        .where(and(eq(orders.id, row.order.id), isNull(orders.atRiskNotifiedAt)))
        .returning({ id: orders.id });
      if (!claimed) return;
      const o = mailOrder(row.order, row.listing);
      await orderMail.atRisk(tx, o, { email: row.agentEmail, name: row.agentName }, reasons, `/orders/${o.id}`);
      for (const admin of admins) await orderMail.atRisk(tx, o, admin, reasons, `/admin`);
      flagged++;
    });
  }
  return flagged;
}

export function startAtRiskSweeper(intervalMs = 60_000): () => void {
  const timer = setInterval(() => void sweepAtRisk().catch((e) => console.error("[at-risk] sweep failed", e)), intervalMs);
  timer.unref();
  return () => clearInterval(timer);
}
