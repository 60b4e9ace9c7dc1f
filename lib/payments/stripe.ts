import "server-only";

import Stripe from "stripe";

/** Pinned so an SDK upgrade never changes API behaviour silently; `satisfies` flags the mismatch. */
export const STRIPE_API_VERSION = "2026-10-28.endive" satisfies Stripe.LatestApiVersion;

const WEBHOOK_TOLERANCE_SECONDS = 300;

let cached: { key: string; client: Stripe } | undefined;

function connectionOptions(): Pick<Stripe.StripeConfig, "host" | "port" | "protocol"> {
  const host = process.env.STRIPE_API_HOST || undefined;
  const rawPort = process.env.STRIPE_API_PORT || undefined;
  const protocol = process.env.STRIPE_API_PROTOCOL || undefined;
  const port = rawPort === undefined ? undefined : Number(rawPort);
  if (port !== undefined && (!Number.isInteger(port) || port < 1 || port > 65535)) {
    throw new Error(`STRIPE_API_PORT must be a port number, got "${rawPort}"`);
  }
  if (protocol !== undefined && protocol !== "http" && protocol !== "https") {
    throw new Error(`STRIPE_API_PROTOCOL must be "http" or "https", got "${protocol}"`);
  }
  return { host, port, protocol };
}

/** The Stripe client, created on first use (never at import, so `next build` needs no key). */
export function getStripe(): Stripe {
  const secretKey = process.env.STRIPE_SECRET_KEY;
  if (!secretKey) throw new Error("STRIPE_SECRET_KEY is not set");
  const connection = connectionOptions();
  const key = [secretKey, connection.host, connection.port, connection.protocol].join("|");
  if (cached?.key !== key) {
    cached = {
      key,
      client: new Stripe(secretKey, {
        apiVersion: STRIPE_API_VERSION,
        appInfo: { name: "Gradeline" },
        maxNetworkRetries: 2,
        typescript: true,
        ...connection,
      }),
    };
  }
  return cached.client;
}

/** Checks the `Stripe-Signature` header against the raw request body and returns the event. */
export function verifyWebhook(rawBody: string, signature: string | null): Stripe.Event {
  if (!signature) {
    throw new Stripe.errors.StripeSignatureVerificationError(signature ?? "", rawBody, {
      message: "Missing Stripe-Signature header: the request did not come from Stripe (or a proxy dropped the header).",
    });
  }
  const secret = process.env.STRIPE_WEBHOOK_SECRET;
  if (!secret) throw new Error("STRIPE_WEBHOOK_SECRET is not set");
  return Stripe.webhooks.constructEvent(rawBody, signature, secret, WEBHOOK_TOLERANCE_SECONDS);
}
