import "server-only";

import type Stripe from "stripe";
import { and, eq, inArray } from "drizzle-orm";

import type { Tx } from "@/db/client";
import { transition } from "@/db/queries/order-commands";
import { enqueueMail } from "@/db/queries/outbox";
import { ledgerEntries, listings, orders, payments, payouts, reportAccess, users } from "@/db/schema";
import { renderMail } from "@/lib/mail/render";
import { formatMoney } from "@/lib/money";

/**
 * A completed checkout whose payment row this database does not hold (yet: the event outran the
 * commit that wrote it, or a restore went back in time). Nothing is recorded, the webhook answers
 * 503 and the provider delivers the event again later.
 */
export class PaymentNotRecordedYet extends Error {
  constructor(paymentId: string) {
    super(`Checkout completed for payment ${paymentId}, which is not recorded here yet.`);
    this.name = "PaymentNotRecordedYet";
  }
}

/**
 * Records the payment, grants access, unlocks and queues the receipt, all inside the caller's
 * transaction (the same one that records the event id), so a replay changes nothing.
 */
export async function onCheckoutCompleted(tx: Tx, session: Stripe.Checkout.Session): Promise<string> {
  if (session.payment_status !== "paid") return "ignored: not paid";
  const paymentId = session.metadata?.paymentId;
  if (!paymentId) return "ignored: no payment id";
  const [payment] = await tx.select().from(payments).where(eq(payments.id, paymentId)).for("update").limit(1);
  if (!payment) throw new PaymentNotRecordedYet(paymentId);
  if (payment.status === "paid" || payment.status === "refunded" || payment.status === "partially_refunded") return "duplicate: already paid";
  if (session.amount_total !== payment.amountCents) return `refused: amount ${session.amount_total} differs from ${payment.amountCents}`;

  const intent = typeof session.payment_intent === "string" ? session.payment_intent : session.payment_intent?.id ?? null;
  const charge = typeof session.payment_intent === "object" && session.payment_intent ? (session.payment_intent.latest_charge as string | Stripe.Charge | null) : null;
  await tx
    .update(payments)
    .set({ status: "paid", paidAt: new Date(), paymentIntentId: intent, chargeId: typeof charge === "string" ? charge : charge?.id ?? null, checkoutSessionId: session.id })
    .where(eq(payments.id, payment.id));
  await tx.insert(reportAccess).values({ orderId: payment.orderId, userId: payment.buyerId, paymentId: payment.id }).onConflictDoUpdate({
    target: [reportAccess.orderId, reportAccess.userId],
    set: { revokedAt: null, paymentId: payment.id, grantedAt: new Date() },
  });

  const [order] = await tx.select().from(orders).where(eq(orders.id, payment.orderId)).limit(1);
  const moved = await transition(tx, order.id, { from: ["delivered"], to: "unlocked", actorId: payment.buyerId, set: { unlockedAt: new Date(), buyerId: payment.buyerId } });
  const feeCents = Math.min(payment.amountCents, order.platformFeeCents);
  await tx.insert(ledgerEntries).values([
    { orderId: order.id, paymentId: payment.id, kind: "charge", amountCents: payment.amountCents, externalId: session.id },
    { orderId: order.id, paymentId: payment.id, kind: "fee", amountCents: feeCents, externalId: `fee-${session.id}` },
  ]);
  if (order.inspectorId) {
    await tx.insert(payouts).values({ paymentId: payment.id, inspectorId: order.inspectorId, amountCents: payment.amountCents - feeCents }).onConflictDoNothing({ target: payouts.paymentId });
  }

  const [listing] = await tx.select().from(listings).where(eq(listings.id, order.listingId));
  const [buyer] = await tx.select({ email: users.email, name: users.name }).from(users).where(eq(users.id, payment.buyerId));
  const address = `${listing.street}, ${listing.city}`;
  await enqueueMail(
    {
      key: `payment:${payment.id}:receipt`,
      to: buyer.email,
      subject: `Receipt: sewer scope report for ${address}`,
      ...renderMail({
        heading: "Thank you: your report is unlocked",
        paragraphs: [`You paid for the rated summary of the sewer scope at ${address}. It is yours to read, download and share.`],
        facts: [
          ["Amount", formatMoney(payment.amountCents)],
          ["Paid", new Date().toUTCString()],
          ["Reference", payment.id.slice(0, 8).toUpperCase()],
        ],
        action: { label: "Read the rated summary", path: `/reports/${order.id}` },
      }),
    },
    tx,
  );
  if (moved) {
    const [agent] = await tx.select({ email: users.email, name: users.name }).from(users).where(eq(users.id, order.agentId));
    await enqueueMail(
      {
        key: `payment:${payment.id}:agent`,
        to: agent.email,
        subject: `Summary unlocked: ${address}`,
        ...renderMail({
          heading: "Your buyer unlocked the rated summary",
          paragraphs: [`${order.buyerName} unlocked the sewer scope report. You can read it from now on.`],
          action: { label: "Read it", path: `/orders/${order.id}` },
        }),
      },
      tx,
    );
  }
  return "unlocked";
}

/** An abandoned session leaves the report locked; a paid one is never downgraded. */
export async function onCheckoutExpired(tx: Tx, session: Stripe.Checkout.Session): Promise<string> {
  const paymentId = session.metadata?.paymentId;
  if (!paymentId) return "ignored: no payment id";
  const updated = await tx
    .update(payments)
    .set({ status: "expired" })
    .where(and(eq(payments.id, paymentId), inArray(payments.status, ["pending"])))
    .returning({ id: payments.id });
  return updated.length ? "expired" : "ignored: not pending";
}
