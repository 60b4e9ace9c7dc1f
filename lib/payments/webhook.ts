import "server-only";

import { eq } from "drizzle-orm";
import type Stripe from "stripe";

import { getDb } from "@/db/client";
import { recordAudit } from "@/db/queries/audit";
import { webhookEvents } from "@/db/schema";

import { onCheckoutCompleted, onCheckoutExpired } from "./events/checkout-completed";
import { getStripe } from "./stripe";

const HANDLED = new Set(["checkout.session.completed", "checkout.session.async_payment_succeeded", "checkout.session.expired"]);

/**
 * Handles one verified event exactly once: the event id, its effect and its mail commit in one
 * transaction, so a replay, a duplicate or a crash between the two never unlocks or charges twice.
 */
export async function handleStripeEvent(event: Stripe.Event): Promise<{ outcome: string }> {
  if (!HANDLED.has(event.type)) return { outcome: "ignored: type not handled" };
  // Re-read the session from the provider rather than trusting the event body.
  const sessionId = (event.data.object as { id: string }).id;
  const session = await getStripe().checkout.sessions.retrieve(sessionId, { expand: ["payment_intent"] });
  const db = await getDb();
  const outcome = await db.transaction(async (tx) => {
    const [fresh] = await tx
      .insert(webhookEvents)
      .values({ id: event.id, type: event.type, outcome: "processing" })
      .onConflictDoNothing({ target: webhookEvents.id })
      .returning({ id: webhookEvents.id });
    if (!fresh) return "duplicate event";
    const result = session.status === "complete" ? await onCheckoutCompleted(tx, session) : session.status === "expired" ? await onCheckoutExpired(tx, session) : "ignored: session open";
    await tx.update(webhookEvents).set({ outcome: result }).where(eq(webhookEvents.id, event.id));
    return result;
  });
  if (outcome.startsWith("refused")) await recordAudit({ action: "payments.event_refused", targetType: "event", targetId: event.id, data: { outcome } });
  return { outcome };
}
