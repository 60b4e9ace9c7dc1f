import type { CardDetails, CheckoutSession, PaymentError, PaymentIntent } from "../types";
import { AUTOMATIC } from "../webhooks/events";
import type { StandinContext } from "./context";
import { newId } from "./ids";

/** Checkout creates the PaymentIntent at the first payment attempt, not when the session is made. */
function ensurePaymentIntent(ctx: StandinContext, session: CheckoutSession): PaymentIntent {
  const state = ctx.store.state;
  const existing = session.payment_intent ? state.payment_intents[session.payment_intent] : undefined;
  if (existing) return existing;
  const data = state.payment_intent_data[session.id] ?? { description: null, metadata: {}, transfer_group: null };
  const intent: PaymentIntent = {
    id: newId("pi"),
    object: "payment_intent",
    amount: session.amount_total,
    amount_capturable: 0,
    amount_received: 0,
    created: ctx.store.now(),
    currency: session.currency,
    customer: null,
    description: data.description,
    last_payment_error: null,
    latest_charge: null,
    livemode: false,
    metadata: { ...data.metadata },
    payment_method: null,
    payment_method_types: ["card"],
    receipt_email: session.customer_email,
    status: "requires_payment_method",
    transfer_group: data.transfer_group,
  };
  state.payment_intents[intent.id] = intent;
  session.payment_intent = intent.id;
  return intent;
}

export function recordDecline(ctx: StandinContext, session: CheckoutSession, error: PaymentError): void {
  const intent = ensurePaymentIntent(ctx, session);
  intent.last_payment_error = error;
  intent.payment_method = newId("pm");
  ctx.store.persist();
}

/** Marks the session paid and sends the events; resolves after the first delivery attempt of the last one. */
export function completePayment(ctx: StandinContext, session: CheckoutSession, card: CardDetails, email: string | null): Promise<void> {
  const intent = ensurePaymentIntent(ctx, session);
  const paymentMethod = newId("pm");
  const charge = {
    id: newId("ch"),
    object: "charge" as const,
    amount: intent.amount,
    amount_captured: intent.amount,
    amount_refunded: 0,
    billing_details: { email, name: null },
    captured: true,
    created: ctx.store.now(),
    currency: intent.currency,
    description: intent.description,
    livemode: false as const,
    metadata: { ...intent.metadata },
    paid: true,
    payment_intent: intent.id,
    payment_method: paymentMethod,
    payment_method_details: { type: "card" as const, card },
    receipt_email: email,
    refunded: false,
    status: "succeeded" as const,
    transfer_group: intent.transfer_group,
  };
  ctx.store.state.charges[charge.id] = charge;
  Object.assign(intent, {
    status: "succeeded",
    amount_received: intent.amount,
    latest_charge: charge.id,
    last_payment_error: null,
    payment_method: paymentMethod,
    receipt_email: email,
  });
  Object.assign(session, { status: "complete", payment_status: "paid", url: null, customer_details: { email } });
  ctx.events.emit("charge.succeeded", charge, AUTOMATIC);
  ctx.events.emit("payment_intent.succeeded", intent, AUTOMATIC);
  const completed = ctx.events.emit("checkout.session.completed", session, AUTOMATIC);
  ctx.store.persist();
  return completed.firstAttempt;
}
