import "server-only";

import { and, desc, eq } from "drizzle-orm";

import { getDb } from "../client";
import { payments } from "../schema";

export async function createPendingPayment(input: { id: string; orderId: string; buyerId: string; amountCents: number; kind?: string }) {
  const db = await getDb();
  const [row] = await db.insert(payments).values(input).returning();
  return row;
}

export async function attachCheckoutSession(paymentId: string, sessionId: string) {
  const db = await getDb();
  await db.update(payments).set({ checkoutSessionId: sessionId }).where(eq(payments.id, paymentId));
}

export async function latestPaymentFor(orderId: string, buyerId: string) {
  const db = await getDb();
  const [row] = await db.select().from(payments).where(and(eq(payments.orderId, orderId), eq(payments.buyerId, buyerId))).orderBy(desc(payments.createdAt)).limit(1);
  return row ?? null;
}

/** True while this buyer's checkout `sessionId` was paid within the last `withinMs`: the return page's "payment received" note. */
export async function paidRecently(orderId: string, buyerId: string, sessionId: string, withinMs = 30 * 60_000, now = new Date()) {
  const db = await getDb();
  const [row] = await db
    .select({ paidAt: payments.paidAt })
    .from(payments)
    .where(and(eq(payments.orderId, orderId), eq(payments.buyerId, buyerId), eq(payments.checkoutSessionId, sessionId), eq(payments.status, "paid")))
    .limit(1);
  return !!row?.paidAt && now.getTime() - row.paidAt.getTime() <= withinMs;
}
