import "server-only";

import { desc, eq } from "drizzle-orm";

import { getDb } from "../client";
import { listings, orders, payments, payouts, users } from "../schema";

export async function listPaymentsForAdmin(limit = 200) {
  const db = await getDb();
  const rows = await db
    .select({ payment: payments, street: listings.street, city: listings.city, buyerEmail: users.email, payoutStatus: payouts.status, payoutCents: payouts.amountCents, reversedCents: payouts.reversedCents })
    .from(payments)
    .innerJoin(orders, eq(orders.id, payments.orderId))
    .innerJoin(listings, eq(listings.id, orders.listingId))
    .innerJoin(users, eq(users.id, payments.buyerId))
    .leftJoin(payouts, eq(payouts.paymentId, payments.id))
    .orderBy(desc(payments.createdAt))
    .limit(limit);
  return rows.map((r) => ({
    id: r.payment.id,
    orderId: r.payment.orderId,
    address: `${r.street}, ${r.city}`,
    buyerEmail: r.buyerEmail,
    amountCents: r.payment.amountCents,
    refundedCents: r.payment.refundedCents,
    status: r.payment.status,
    paidAt: r.payment.paidAt?.toISOString() ?? null,
    payout: r.payoutStatus ? { status: r.payoutStatus, amountCents: r.payoutCents ?? 0, reversedCents: r.reversedCents ?? 0 } : null,
  }));
}
