import "server-only";

import { randomUUID } from "node:crypto";

import { attachCheckoutSession, createPendingPayment } from "@/db/queries/payments";
import { appUrl } from "@/lib/env";

import { getStripe } from "./stripe";

const SESSION_MINUTES = 60;

/** A Checkout Session for one report; the payment row exists before the provider knows the session. */
export async function createReportCheckout(input: { orderId: string; buyer: { id: string; email: string }; amountCents: number; productName: string; kind?: "scope" | "reuse" }) {
  const paymentId = randomUUID();
  await createPendingPayment({ id: paymentId, orderId: input.orderId, buyerId: input.buyer.id, amountCents: input.amountCents, kind: input.kind ?? "scope" });
  const base = appUrl();
  const session = await getStripe().checkout.sessions.create(
    {
      mode: "payment",
      customer_email: input.buyer.email,
      client_reference_id: input.orderId,
      line_items: [{ quantity: 1, price_data: { currency: "usd", unit_amount: input.amountCents, product_data: { name: input.productName } } }],
      metadata: { orderId: input.orderId, paymentId, buyerId: input.buyer.id, kind: input.kind ?? "scope" },
      payment_intent_data: { transfer_group: `order_${input.orderId}` },
      success_url: `${base}/reports/${input.orderId}?paid={CHECKOUT_SESSION_ID}`,
      cancel_url: `${base}/reports/${input.orderId}?cancelled=1`,
      expires_at: Math.floor(Date.now() / 1000) + SESSION_MINUTES * 60,
    },
    { idempotencyKey: `checkout-${paymentId}` },
  );
  await attachCheckoutSession(paymentId, session.id);
  if (!session.url) throw new Error("The payment provider returned no checkout URL.");
  return { url: session.url, sessionId: session.id, paymentId };
}
