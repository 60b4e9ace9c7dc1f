import "server-only";

import { and, eq, isNull } from "drizzle-orm";

import { getDb, type Tx } from "@/db/client";
import { recordAudit } from "@/db/queries/audit";
import { transition } from "@/db/queries/order-commands";
import { enqueueMail } from "@/db/queries/outbox";
import { ledgerEntries, payments, payouts, reportAccess, users } from "@/db/schema";
import { AppError } from "@/lib/errors";
import { renderMail } from "@/lib/mail/render";
import { formatMoney } from "@/lib/money";

import { getStripe } from "./stripe";

export type RefundRequest = { paymentId: string; amountCents?: number; reason: string; reverseTransfer: boolean; noReversalReason?: string; requestId: string };

/** The inspector's part of a refund, rounded so that over several refunds it always sums to the share of the total refunded. */
export function reversalShare(p: { payoutCents: number; chargeCents: number; refundedBefore: number; refundCents: number; reversedBefore: number }): number {
  const target = Math.round((p.payoutCents * (p.refundedBefore + p.refundCents)) / p.chargeCents);
  return Math.max(0, Math.min(p.payoutCents - p.reversedBefore, target - p.reversedBefore));
}

/** Books a refund once by the provider's refund id: refund, fee give-back, reversal, lock after a full refund. */
export async function bookRefund(tx: Tx, input: { paymentId: string; refundId: string; amountCents: number; reverse: boolean; actorId: string | null; reason: string }) {
  const [payment] = await tx.select().from(payments).where(eq(payments.id, input.paymentId)).for("update").limit(1);
  if (!payment) return { booked: false as const };
  const [already] = await tx.insert(ledgerEntries).values({ orderId: payment.orderId, paymentId: payment.id, kind: "refund", amountCents: input.amountCents, externalId: input.refundId, note: input.reason }).onConflictDoNothing().returning({ id: ledgerEntries.id });
  if (!already) return { booked: false as const };
  const [payout] = await tx.select().from(payouts).where(eq(payouts.paymentId, payment.id)).for("update").limit(1);
  const reversal = payout && input.reverse
    ? reversalShare({ payoutCents: payout.amountCents, chargeCents: payment.amountCents, refundedBefore: payment.refundedCents, refundCents: input.amountCents, reversedBefore: payout.reversedCents })
    : 0;
  await tx.insert(ledgerEntries).values({ orderId: payment.orderId, paymentId: payment.id, kind: "fee", amountCents: -(input.amountCents - reversal), externalId: `fee-${input.refundId}`, note: "Fee given back with the refund" });
  const refunded = payment.refundedCents + input.amountCents;
  const full = refunded >= payment.amountCents;
  await tx.update(payments).set({ refundedCents: refunded, status: full ? "refunded" : "partially_refunded" }).where(eq(payments.id, payment.id));
  if (payout && reversal > 0) {
    const reversed = payout.reversedCents + reversal;
    await tx.update(payouts).set({ reversedCents: reversed, status: reversed >= payout.amountCents ? "reversed" : payout.status === "waiting" ? "waiting" : "partially_reversed" }).where(eq(payouts.id, payout.id));
  }
  if (full) {
    await tx.update(reportAccess).set({ revokedAt: new Date() }).where(and(eq(reportAccess.paymentId, payment.id), isNull(reportAccess.revokedAt)));
    await transition(tx, payment.orderId, { from: ["unlocked"], to: "refunded", actorId: input.actorId, reason: input.reason });
  }
  const [buyer] = await tx.select({ email: users.email }).from(users).where(eq(users.id, payment.buyerId));
  await enqueueMail(
    {
      key: `refund:${input.refundId}`,
      to: buyer.email,
      subject: `Refund of ${formatMoney(input.amountCents)}`,
      ...renderMail({
        heading: "We refunded your payment",
        paragraphs: [full ? "The full amount is on its way back to your card; the report is locked again." : "Part of your payment is on its way back to your card. You keep access to the report."],
        facts: [["Refund", formatMoney(input.amountCents)]],
      }),
    },
    tx,
  );
  return { booked: true as const, reversal, payoutSent: payout?.status !== "waiting" && !!payout?.transferId, transferId: payout?.transferId ?? null, full };
}

/** An admin's refund: provider first (idempotent per request), then booked once; the webhook finds it already booked. */
export async function refundPayment(admin: { id: string }, req: RefundRequest, ip: string | null) {
  const db = await getDb();
  const [payment] = await db.select().from(payments).where(eq(payments.id, req.paymentId)).limit(1);
  if (!payment) throw new AppError("not_found", "That payment was not found.");
  if (!["paid", "partially_refunded"].includes(payment.status) || !payment.paymentIntentId) throw new AppError("conflict", "Only a paid payment can be refunded.");
  const remaining = payment.amountCents - payment.refundedCents;
  const amount = req.amountCents ?? remaining;
  if (amount < 1 || amount > remaining) throw new AppError("bad_request", `Refund between $0.01 and the ${formatMoney(remaining)} not yet refunded.`, { amountCents: [`At most ${formatMoney(remaining)}.`] });
  if (!req.reverseTransfer && !req.noReversalReason) throw new AppError("bad_request", "Say why the inspector's payout is not reversed.", { noReversalReason: ["Give the reason."] });
  const stripe = getStripe();
  const refund = await stripe.refunds.create(
    { payment_intent: payment.paymentIntentId, amount, reason: "requested_by_customer", metadata: { paymentId: payment.id, reverse: String(req.reverseTransfer) } },
    { idempotencyKey: `refund-${payment.id}-${req.requestId}` },
  );
  const booked = await db.transaction((tx) => bookRefund(tx, { paymentId: payment.id, refundId: refund.id, amountCents: amount, reverse: req.reverseTransfer, actorId: admin.id, reason: req.reason }));
  if (booked.booked && booked.reversal > 0 && booked.transferId) {
    const reversal = await stripe.transfers.createReversal(booked.transferId, { amount: booked.reversal }, { idempotencyKey: `reversal-${refund.id}` });
    await db.insert(ledgerEntries).values({ orderId: payment.orderId, paymentId: payment.id, kind: "reversal", amountCents: booked.reversal, externalId: reversal.id }).onConflictDoNothing();
  }
  await recordAudit({ actorId: admin.id, action: "payments.refund", targetType: "payment", targetId: payment.id, ip, data: { amountCents: amount, reason: req.reason, reverseTransfer: req.reverseTransfer, noReversalReason: req.noReversalReason ?? null, refundId: refund.id } });
  return { refundId: refund.id, amountCents: amount, reversalCents: booked.booked ? booked.reversal : 0 };
}
