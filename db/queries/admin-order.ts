import "server-only";

import { and, asc, desc, eq, inArray, or, sql, type SQL } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";

import { getDb } from "../client";
import { auditLog, disputeMessages, disputes, ledgerEntries, orders, payments, payouts, users } from "../schema";
import { disputeDto } from "./disputes";
import { getOrderDetailForAdmin } from "./order-detail";
import { ledgerBalance } from "./payouts";

const AUDIT_LIMIT = 200;

/** Everything an admin needs to understand one order: facts, timeline, money, disputes and its audit trail. */
export async function getAdminOrder(orderId: string) {
  const detail = await getOrderDetailForAdmin(orderId);
  if (!detail) return null;
  const db = await getDb();
  const agent = alias(users, "agent");
  const [[facts], paymentRows, ledger, disputeRows, balance] = await Promise.all([
    db
      .select({
        agentName: agent.name,
        agentEmail: agent.email,
        agentCompany: agent.company,
        reuseOfOrderId: orders.reuseOfOrderId,
        platformFeeCents: orders.platformFeeCents,
        deliveredAt: orders.deliveredAt,
        unlockedAt: orders.unlockedAt,
        cancelledAt: orders.cancelledAt,
      })
      .from(orders)
      .innerJoin(agent, eq(agent.id, orders.agentId))
      .where(eq(orders.id, orderId)),
    db
      .select({ payment: payments, buyerEmail: users.email, payout: payouts })
      .from(payments)
      .innerJoin(users, eq(users.id, payments.buyerId))
      .leftJoin(payouts, eq(payouts.paymentId, payments.id))
      .where(eq(payments.orderId, orderId))
      .orderBy(asc(payments.createdAt)),
    db.select().from(ledgerEntries).where(eq(ledgerEntries.orderId, orderId)).orderBy(asc(ledgerEntries.createdAt)),
    db
      .select({ d: disputes, openerName: users.name, openerEmail: users.email })
      .from(disputes)
      .innerJoin(users, eq(users.id, disputes.openedBy))
      .where(eq(disputes.orderId, orderId))
      .orderBy(asc(disputes.createdAt)),
    ledgerBalance(orderId),
  ]);
  // Entries booked together share a timestamp: show them in the order money moves.
  const rank = (l: (typeof ledger)[number]) =>
    ({ charge: 0, fee: l.amountCents >= 0 ? 1 : 4, transfer: 2, refund: 3, reversal: 5 })[l.kind];
  ledger.sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime() || rank(a) - rank(b));
  const disputeIds = disputeRows.map((r) => r.d.id);
  const paymentIds = paymentRows.map((r) => r.payment.id);
  const targets: SQL[] = [
    and(eq(auditLog.targetType, "order"), eq(auditLog.targetId, orderId))!,
    sql`${auditLog.data}->>'orderId' = ${orderId}`,
  ];
  if (paymentIds.length) targets.push(and(eq(auditLog.targetType, "payment"), inArray(auditLog.targetId, paymentIds))!);
  if (disputeIds.length) targets.push(and(eq(auditLog.targetType, "dispute"), inArray(auditLog.targetId, disputeIds))!);
  const [messages, audit] = await Promise.all([
    disputeIds.length
      ? db.select().from(disputeMessages).where(inArray(disputeMessages.disputeId, disputeIds)).orderBy(asc(disputeMessages.createdAt))
      : Promise.resolve([]),
    db
      .select({ entry: auditLog, actorName: users.name, actorEmail: users.email })
      .from(auditLog)
      .leftJoin(users, eq(users.id, auditLog.actorId))
      .where(or(...targets))
      .orderBy(desc(auditLog.at), desc(auditLog.id))
      .limit(AUDIT_LIMIT),
  ]);
  const refundReasons = new Map(
    audit
      .filter((a) => a.entry.action === "payments.refund")
      .map((a) => [String(a.entry.data.refundId), { reason: String(a.entry.data.reason ?? ""), by: a.actorName }]),
  );

  return {
    ...detail,
    agent: { name: facts.agentName, email: facts.agentEmail, company: facts.agentCompany },
    reuseOfOrderId: facts.reuseOfOrderId,
    platformFeeCents: facts.platformFeeCents,
    deliveredAt: facts.deliveredAt?.toISOString() ?? null,
    unlockedAt: facts.unlockedAt?.toISOString() ?? null,
    cancelledAt: facts.cancelledAt?.toISOString() ?? null,
    payments: paymentRows.map(({ payment: p, buyerEmail, payout }) => ({
      id: p.id,
      kind: p.kind,
      buyerEmail,
      amountCents: p.amountCents,
      refundedCents: p.refundedCents,
      status: p.status,
      checkoutSessionId: p.checkoutSessionId,
      paymentIntentId: p.paymentIntentId,
      createdAt: p.createdAt.toISOString(),
      paidAt: p.paidAt?.toISOString() ?? null,
      payout: payout
        ? {
            id: payout.id,
            amountCents: payout.amountCents,
            reversedCents: payout.reversedCents,
            status: payout.status,
            transferId: payout.transferId,
            sentAt: payout.sentAt?.toISOString() ?? null,
          }
        : null,
      refunds: ledger
        .filter((l) => l.paymentId === p.id && l.kind === "refund")
        .map((l) => ({
          id: l.id,
          refundId: l.externalId,
          amountCents: l.amountCents,
          at: l.createdAt.toISOString(),
          reason: refundReasons.get(l.externalId ?? "")?.reason || l.note,
          by: refundReasons.get(l.externalId ?? "")?.by ?? null,
        })),
    })),
    ledger: ledger.map((l) => ({
      id: l.id,
      kind: l.kind,
      amountCents: l.amountCents,
      externalId: l.externalId,
      note: l.note,
      at: l.createdAt.toISOString(),
    })),
    balance,
    disputes: disputeRows.map(({ d, openerName, openerEmail }) => ({
      ...disputeDto(d),
      message: d.message,
      opener: { name: openerName, email: openerEmail },
      messages: messages
        .filter((m) => m.disputeId === d.id)
        .map((m) => ({ id: m.id, to: m.toAddress, body: m.body, at: m.createdAt.toISOString() })),
    })),
    audit: audit.map(({ entry, actorName, actorEmail }) => ({
      id: entry.id,
      at: entry.at.toISOString(),
      action: entry.action,
      actor: actorName ? { name: actorName, email: actorEmail } : null,
      target: entry.targetType ? { type: entry.targetType, id: entry.targetId } : null,
      ip: entry.ip,
    })),
  };
}

export type AdminOrder = NonNullable<Awaited<ReturnType<typeof getAdminOrder>>>;
