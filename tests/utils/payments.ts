import Stripe from "stripe";

import { POST as checkout } from "@/app/api/reports/[id]/checkout/route";
import { POST as webhook } from "@/app/api/webhooks/stripe/route";

import { call } from "./session";
import { deliveredReport } from "./world";

export const standinUrl = () => `http://127.0.0.1:${process.env.STRIPE_API_PORT}`;
export const SUCCESS_CARD = { card_number: "4242 4242 4242 4242", exp: "12 / 34", cvc: "123" };

export async function standinEvents(type: string) {
  const res = await fetch(`${standinUrl()}/_standin/events?type=${encodeURIComponent(type)}`);
  return ((await res.json()) as { data: { event: Stripe.Event }[] }).data.map((d) => d.event);
}

/** Delivers an event to the app's webhook route in process, signed as the provider would. */
export function deliver(event: Stripe.Event | Record<string, unknown>) {
  const payload = JSON.stringify(event);
  const header = Stripe.webhooks.generateTestHeaderString({ payload, secret: process.env.STRIPE_WEBHOOK_SECRET! });
  return call(webhook as never, { method: "POST", path: "/api/webhooks/stripe", body: payload, headers: { "stripe-signature": header } });
}

/** A delivered report that its buyer paid for with the success card; the completed event delivered once. */
export async function unlockedReport() {
  const world = await deliveredReport();
  const started = await call(checkout, { method: "POST", params: { id: world.id }, cookie: world.buyer.cookie });
  const url = started.json.url as string;
  const sessionId = url.split("/pay/")[1].split(/[?#]/)[0];
  await fetch(url, { method: "POST", body: new URLSearchParams({ action: "pay", ...SUCCESS_CARD }), redirect: "manual" });
  const event = (await standinEvents("checkout.session.completed")).find((e) => (e.data.object as { id: string }).id === sessionId)!;
  const delivered = await deliver(event);
  return { ...world, sessionId, event, delivered };
}

/** Creates the inspector's payout account through the app and finishes its setup on the stand-in's page. */
export async function connectPayouts(cookie: string) {
  const { POST: connect } = await import("@/app/api/payouts/connect/route");
  const res = await call(connect, { method: "POST", cookie });
  const link = new URL(res.json.url as string);
  const form = new URLSearchParams({ link: link.searchParams.get("link") ?? "", action: "finish" });
  const done = await fetch(`${link.origin}${link.pathname}`, { method: "POST", body: form, redirect: "manual" });
  if (done.status >= 400) throw new Error(`onboarding failed: ${done.status} ${await done.text()}`);
  return link.pathname.split("/").pop()!;
}
