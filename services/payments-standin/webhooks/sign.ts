import Stripe from "stripe";

// The real SDK's helper, so what the app verifies is exactly what the live API would send.
const signer = new Stripe("sk_test_standin");

export const STANDIN_API_VERSION: string = Stripe.API_VERSION;

export function signPayload(payload: string, secret: string, timestamp?: number): string {
  return signer.webhooks.generateTestHeaderString({ payload, secret, timestamp });
}
