import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { getStripe, STRIPE_API_VERSION, verifyWebhook } from "@/lib/payments/stripe";

import { startHarness, WEBHOOK_SECRET, type Harness } from "./support/harness";

let h: Harness;
const saved = { ...process.env };
beforeAll(async () => {
  h = await startHarness();
  Object.assign(process.env, {
    STRIPE_SECRET_KEY: "sk_test_lib_client",
    STRIPE_WEBHOOK_SECRET: WEBHOOK_SECRET,
    STRIPE_API_HOST: "127.0.0.1",
    STRIPE_API_PORT: String(h.standin.port),
    STRIPE_API_PROTOCOL: "http",
  });
});
afterAll(async () => {
  process.env = saved;
  await h.close();
});

describe("lib/payments/stripe", () => {
  it("pins the API version the SDK was built for", () => {
    expect(STRIPE_API_VERSION).toBe(Stripe.API_VERSION);
  });

  it("getStripe() reaches the host, port and protocol from env and reuses one client", async () => {
    const stripe = getStripe();
    expect(getStripe()).toBe(stripe);
    const account = await stripe.accounts.create({ type: "express" });
    expect(account.lastResponse.apiVersion).toBe(STRIPE_API_VERSION);
    expect(h.standin.state.accounts[account.id]).toBeDefined();
  });

  it("getStripe() refuses a missing key and a bad port", () => {
    const key = process.env.STRIPE_SECRET_KEY;
    try {
      delete process.env.STRIPE_SECRET_KEY;
      expect(() => getStripe()).toThrow(/STRIPE_SECRET_KEY/);
      process.env.STRIPE_SECRET_KEY = key;
      process.env.STRIPE_API_PORT = "not-a-port";
      expect(() => getStripe()).toThrow(/STRIPE_API_PORT/);
    } finally {
      process.env.STRIPE_SECRET_KEY = key;
      process.env.STRIPE_API_PORT = String(h.standin.port);
    }
  });

  it("verifyWebhook() accepts a delivery from the stand-in", async () => {
    const account = await getStripe().accounts.create({ type: "express" });
    await getStripe().accounts.update(account.id, { metadata: { inspectorId: "insp_2" } });
    const hook = await h.receiver.waitFor("account.updated", (w) => w.body.includes(account.id));
    const event = verifyWebhook(hook.body, hook.signature);
    expect(event.type).toBe("account.updated");
    expect(event.data.object).toMatchObject({ id: account.id, metadata: { inspectorId: "insp_2" } });
  });

  it("verifyWebhook() rejects a missing header, a changed body, a wrong secret and an old timestamp", () => {
    const payload = JSON.stringify({ id: "evt_test", object: "event", type: "charge.refunded", data: { object: {} } });
    const sign = (opts: { secret?: string; timestamp?: number } = {}) =>
      Stripe.webhooks.generateTestHeaderString({ payload, secret: opts.secret ?? WEBHOOK_SECRET, timestamp: opts.timestamp });

    expect(verifyWebhook(payload, sign()).id).toBe("evt_test");
    expect(() => verifyWebhook(payload, null)).toThrow(/Missing Stripe-Signature header/);
    expect(() => verifyWebhook(payload, null)).toThrow(Stripe.errors.StripeSignatureVerificationError);
    expect(() => verifyWebhook(payload.replace("refunded", "captured"), sign())).toThrow(Stripe.errors.StripeSignatureVerificationError);
    expect(() => verifyWebhook(payload, sign({ secret: "whsec_other" }))).toThrow(Stripe.errors.StripeSignatureVerificationError);
    expect(() => verifyWebhook(payload, sign({ timestamp: Math.floor(Date.now() / 1000) - 301 }))).toThrow(/tolerance/i);
    expect(verifyWebhook(payload, sign({ timestamp: Math.floor(Date.now() / 1000) - 200 })).id).toBe("evt_test");
  });
});
