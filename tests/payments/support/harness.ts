import Stripe from "stripe";

import { STRIPE_API_VERSION } from "@/lib/payments/stripe";
import { startPaymentsStandin, type PaymentsStandinOptions } from "@/services/payments-standin";

import { startWebhookReceiver } from "./webhook-receiver";

export const WEBHOOK_SECRET = "whsec_payments_tests";
export const SECRET_KEY = "sk_test_payments_tests";

export function sdkFor(port: number, key = SECRET_KEY): Stripe {
  return new Stripe(key, { host: "127.0.0.1", port, protocol: "http", apiVersion: STRIPE_API_VERSION, maxNetworkRetries: 0 });
}

/** A stand-in on a free port, the real SDK pointed at it, and a webhook receiver it delivers to. */
export async function startHarness(opts: Partial<PaymentsStandinOptions> = {}) {
  const receiver = await startWebhookReceiver();
  const standin = await startPaymentsStandin({
    port: 0,
    webhookSecret: WEBHOOK_SECRET,
    webhookUrl: receiver.url,
    webhookRetry: { attempts: 3, baseDelayMs: 20, timeoutMs: 2000 },
    ...opts,
  });
  const stripe = sdkFor(standin.port);
  return {
    standin,
    stripe,
    receiver,
    async close() {
      await standin.close();
      await receiver.close();
    },
  };
}

export type Harness = Awaited<ReturnType<typeof startHarness>>;

export const SUCCESS_CARD = { card_number: "4242 4242 4242 4242", exp: "12 / 34", cvc: "123" };
export const DECLINED_CARD = { card_number: "4000 0000 0000 0002", exp: "12 / 34", cvc: "123" };

export function createSession(stripe: Stripe, extra: Partial<Stripe.Checkout.SessionCreateParams> = {}, options?: Stripe.RequestOptions) {
  return stripe.checkout.sessions.create(
    {
      mode: "payment",
      line_items: [
        { quantity: 1, price_data: { currency: "usd", unit_amount: 32500, product_data: { name: "Sewer scope report — 12 Elm St" } } },
      ],
      customer_email: "buyer@example.com",
      client_reference_id: "order_123",
      metadata: { orderId: "order_123" },
      payment_intent_data: { transfer_group: "order_123" },
      success_url: "http://127.0.0.1:3999/orders/order_123/paid?session_id={CHECKOUT_SESSION_ID}",
      cancel_url: "http://127.0.0.1:3999/orders/order_123",
      ...extra,
    },
    options,
  );
}

/** Submits the hosted payment form as a browser would, without following the redirect. */
export function submitPayForm(url: string, fields: Record<string, string>, action = "pay") {
  return fetch(url, { method: "POST", body: new URLSearchParams({ action, ...fields }), redirect: "manual" });
}

/** Creates a session and pays it with the success card; returns the session and its PaymentIntent id. */
export async function paidSession(h: Harness, extra: Partial<Stripe.Checkout.SessionCreateParams> = {}) {
  const created = await createSession(h.stripe, extra);
  const res = await submitPayForm(created.url as string, SUCCESS_CARD);
  if (res.status !== 303) throw new Error(`payment failed with ${res.status}`);
  const session = await h.stripe.checkout.sessions.retrieve(created.id);
  return { session, paymentIntentId: session.payment_intent as string };
}

export async function standinEvents(h: Harness, type?: string) {
  const res = await fetch(`${h.standin.url}/_standin/events${type ? `?type=${encodeURIComponent(type)}` : ""}`);
  return (
    (await res.json()) as {
      data: Array<{ event: Stripe.Event; delivery: { status: string; attempts: number; last_status_code: number | null } }>;
    }
  ).data;
}
