import "server-only";

import { and, desc, eq, sql } from "drizzle-orm";

import { getDb, type Tx } from "../client";
import { inspectorProfiles, ledgerEntries, listings, orders, payments, payouts, users } from "../schema";

/** Payouts still waiting, with what is needed to send them. */
export async function listWaitingPayouts(inspectorId?: string) {
  const db = await getDb();
  return db
    .select({ payout: payouts, payment: payments, accountId: inspectorProfiles.payoutAccountId, email: users.email, name: users.name })
    .from(payouts)
    .innerJoin(payments, eq(payments.id, payouts.paymentId))
    .innerJoin(users, eq(users.id, payouts.inspectorId))
    .leftJoin(inspectorProfiles, eq(inspectorProfiles.userId, payouts.inspectorId))
    .where(and(eq(payouts.status, "waiting"), eq(payments.status, "paid"), inspectorId ? eq(payouts.inspectorId, inspectorId) : undefined))
    .limit(100);
}

/** Marks a payout sent and books the transfer once (the ledger's external id is unique). */
export async function markPayoutSent(payoutId: string, transferId: string) {
  const db = await getDb();
  await db.transaction(async (tx) => {
    const [p] = await tx
      .update(payouts)
      .set({ status: "sent", transferId, sentAt: new Date() })
      .where(and(eq(payouts.id, payoutId), eq(payouts.status, "waiting")))
      .returning();
    if (!p) return;
    const [payment] = await tx.select().from(payments).where(eq(payments.id, p.paymentId));
    await tx.insert(ledgerEntries).values({ orderId: payment.orderId, paymentId: payment.id, kind: "transfer", amountCents: p.amountCents - p.reversedCents, externalId: transferId }).onConflictDoNothing();
  });
}

export async function setPayoutAccount(inspectorId: string, accountId: string, tx?: Tx) {
  const db = tx ?? (await getDb());
  await db.update(inspectorProfiles).set({ payoutAccountId: accountId, updatedAt: new Date() }).where(eq(inspectorProfiles.userId, inspectorId));
}

export async function payoutAccountOf(inspectorId: string) {
  const db = await getDb();
  const [row] = await db.select({ accountId: inspectorProfiles.payoutAccountId }).from(inspectorProfiles).where(eq(inspectorProfiles.userId, inspectorId)).limit(1);
  return row?.accountId ?? null;
}

/** Every job the inspector was paid (or is owed) for, newest first. */
export async function listEarnings(inspectorId: string) {
  const db = await getDb();
  const rows = await db
    .select({
      payoutId: payouts.id,
      orderId: orders.id,
      street: listings.street,
      city: listings.city,
      priceCents: payments.amountCents,
      payoutCents: payouts.amountCents,
      reversedCents: payouts.reversedCents,
      status: payouts.status,
      paidAt: payments.paidAt,
      sentAt: payouts.sentAt,
    })
    .from(payouts)
    .innerJoin(payments, eq(payments.id, payouts.paymentId))
    .innerJoin(orders, eq(orders.id, payments.orderId))
    .innerJoin(listings, eq(listings.id, orders.listingId))
    .where(eq(payouts.inspectorId, inspectorId))
    .orderBy(desc(payments.paidAt));
  return rows.map((r) => ({
    ...r,
    feeCents: r.priceCents - r.payoutCents,
    paidAt: r.paidAt?.toISOString() ?? null,
    sentAt: r.sentAt?.toISOString() ?? null,
    month: (r.paidAt ?? new Date()).toISOString().slice(0, 7),
  }));
}

export type Earning = Awaited<ReturnType<typeof listEarnings>>[number];

export function monthlyTotals(rows: Earning[]) {
  const byMonth = new Map<string, { month: string; jobs: number; priceCents: number; feeCents: number; payoutCents: number }>();
  for (const r of rows) {
    const m = byMonth.get(r.month) ?? { month: r.month, jobs: 0, priceCents: 0, feeCents: 0, payoutCents: 0 };
    m.jobs++;
    m.priceCents += r.priceCents;
    m.feeCents += r.feeCents;
    m.payoutCents += r.payoutCents - r.reversedCents;
    byMonth.set(r.month, m);
  }
  return [...byMonth.values()].sort((a, b) => b.month.localeCompare(a.month));
}

/** Per payment: charge = transfers − reversals + fees + refunds + what is still owed to the inspector. */
export async function ledgerBalance(orderId?: string) {
  const db = await getDb();
  const sums = await db
    .select({ kind: ledgerEntries.kind, total: sql<number>`coalesce(sum(${ledgerEntries.amountCents}), 0)::int` })
    .from(ledgerEntries)
    .where(orderId ? eq(ledgerEntries.orderId, orderId) : undefined)
    .groupBy(ledgerEntries.kind);
  const t = Object.fromEntries(sums.map((s) => [s.kind, Number(s.total)])) as Partial<Record<"charge" | "fee" | "transfer" | "refund" | "reversal", number>>;
  const [owed] = await db
    .select({ total: sql<number>`coalesce(sum(${payouts.amountCents} - ${payouts.reversedCents}), 0)::int` })
    .from(payouts)
    .innerJoin(payments, eq(payments.id, payouts.paymentId))
    .where(and(eq(payouts.status, "waiting"), orderId ? eq(payments.orderId, orderId) : undefined));
  const moneyIn = t.charge ?? 0;
  const moneyOut = (t.transfer ?? 0) - (t.reversal ?? 0) + (t.fee ?? 0) + (t.refund ?? 0) + Number(owed?.total ?? 0);
  return { moneyIn, moneyOut, balanced: moneyIn === moneyOut, ...t, owed: Number(owed?.total ?? 0) };
}
