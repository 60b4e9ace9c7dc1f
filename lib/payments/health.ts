import "server-only";

import { env } from "@/lib/env";

import { getStripe } from "./stripe";

/** Reaches the payment provider: the local stand-in's health page, or the real API's balance. */
export async function pingPayments(): Promise<{ provider: string }> {
  const e = env();
  if (e.STRIPE_API_HOST) {
    const res = await fetch(`${e.STRIPE_API_PROTOCOL ?? "https"}://${e.STRIPE_API_HOST}:${e.STRIPE_API_PORT ?? 443}/_standin/health`, { cache: "no-store" });
    if (!res.ok) throw new Error(`stand-in answered ${res.status}`);
    return { provider: "local stand-in" };
  }
  await getStripe().balance.retrieve();
  return { provider: "stripe" };
}
