import "server-only";

import { eq } from "drizzle-orm";
import type Stripe from "stripe";

import { getDb, type Tx } from "@/db/client";
import { recordAudit } from "@/db/queries/audit";
import { inspectorProfiles, ledgerEntries, payments, webhookEvents } from "@/db/schema";
import { crashPoint } from "@/lib/crash-point";

import { onCheckoutCompleted, onCheckoutExpired } from "./events/checkout-completed";
import { sendWaitingPayouts } from "./payouts";
import { bookRefund } from "./refunds";
import { getStripe } from "./stripe";

type Effect = { outcome: string; after?: () => Promise<unknown> };

// Each handler re-reads its object from the provider rather than trusting the event body.
const HANDLERS: Record<string, { load: (event: Stripe.Event) => Promise<unknown>; run: (tx: Tx, object: never) => Promise<Effect> }> = {
  "checkout.session.completed": { load: loadSession, run: checkoutRun },
  "checkout.session.async_payment_succeeded": { load: loadSession, run: checkoutRun },
  "checkout.session.expired": { load: loadSession, run: checkoutRun },
  "refund.created": { load: (e) => getStripe().refunds.retrieve((e.data.object as { id: string }).id), run: refundRun },
  "account.updated": { load: (e) => getStripe().accounts.retrieve((e.data.object as { id: string }).id), run: accountRun },
};

function loadSession(event: Stripe.Event) {
  return getStripe().checkout.sessions.retrieve((event.data.object as { id: string }).id, { expand: ["payment_intent"] });
}

async function checkoutRun(tx: Tx, session: Stripe.Checkout.Session): Promise<Effect> {
  if (session.status === "expired") return { outcome: await onCheckoutExpired(tx, session) };
  if (session.status !== "complete") return { outcome: "ignored: session open" };
  const outcome = await onCheckoutCompleted(tx, session);
  return { outcome, after: outcome === "unlocked" ? () => sendWaitingPayouts() : undefined };
}

async function refundRun(tx: Tx, refund: Stripe.Refund): Promise<Effect> {
  const intent = typeof refund.payment_intent === "string" ? refund.payment_intent : refund.payment_intent?.id;
  const byId = refund.metadata?.paymentId;
  const [payment] = byId
    ? await tx.select().from(payments).where(eq(payments.id, byId)).limit(1)
    : intent
      ? await tx.select().from(payments).where(eq(payments.paymentIntentId, intent)).limit(1)
      : [];
  if (!payment) return { outcome: "ignored: unknown payment" };
  const booked = await bookRefund(tx, { paymentId: payment.id, refundId: refund.id, amountCents: refund.amount, reverse: refund.metadata?.reverse !== "false", actorId: null, reason: "Refund made with the payment provider" });
  if (!booked.booked) return { outcome: "duplicate: refund already booked" };
  const { transferId, reversal } = booked;
  const after = transferId && reversal > 0 ? () => reverseTransfer(payment.orderId, payment.id, transferId, reversal, refund.id) : undefined;
  return { outcome: "refund booked", after };
}

async function reverseTransfer(orderId: string, paymentId: string, transferId: string, amount: number, refundId: string) {
  const reversal = await getStripe().transfers.createReversal(transferId, { amount }, { idempotencyKey: `reversal-${refundId}` });
  const db = await getDb();
  await db.insert(ledgerEntries).values({ orderId, paymentId, kind: "reversal", amountCents: amount, externalId: reversal.id }).onConflictDoNothing();
}

async function accountRun(tx: Tx, account: Stripe.Account): Promise<Effect> {
  const [profile] = await tx.select({ userId: inspectorProfiles.userId }).from(inspectorProfiles).where(eq(inspectorProfiles.payoutAccountId, account.id)).limit(1);
  if (!profile) return { outcome: "ignored: unknown account" };
  return { outcome: account.payouts_enabled ? "payouts enabled" : "account updated", after: account.payouts_enabled ? () => sendWaitingPayouts(profile.userId) : undefined };
}

/**
 * Handles one verified event exactly once: the event id and its effect commit in one transaction,
 * so a replay, a duplicate or a crash between recording and acting never doubles anything.
 */
export async function handleStripeEvent(event: Stripe.Event): Promise<{ outcome: string }> {
  const handler = HANDLERS[event.type];
  if (!handler) return { outcome: "ignored: type not handled" };
  const object = await handler.load(event);
  const db = await getDb();
  const effect = await db.transaction(async (tx): Promise<Effect> => {
    const [fresh] = await tx.insert(webhookEvents).values({ id: event.id, type: event.type, outcome: "processing" }).onConflictDoNothing({ target: webhookEvents.id }).returning({ id: webhookEvents.id });
    if (!fresh) return { outcome: "duplicate event" };
    crashPoint(`webhook-recorded:${event.type}`);
    const result = await handler.run(tx, object as never);
    await tx.update(webhookEvents).set({ outcome: result.outcome }).where(eq(webhookEvents.id, event.id));
    return result;
  });
  if (effect.outcome.startsWith("refused")) await recordAudit({ action: "payments.event_refused", targetType: "event", targetId: event.id, data: { outcome: effect.outcome } });
  // Work that calls the provider runs after the commit; it is idempotent and retried by the workers.
  if (effect.after) await effect.after().catch((e) => console.error("[webhook] follow-up failed; a worker will retry", e));
  return { outcome: effect.outcome };
}

