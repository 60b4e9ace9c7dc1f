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
