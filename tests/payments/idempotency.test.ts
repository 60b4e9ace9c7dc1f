import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { createSession, paidSession, sdkFor, startHarness, type Harness } from "./support/harness";

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h.close());

function sessionCount() {
  return Object.keys(h.standin.state.checkout_sessions).length;
}

describe("payments stand-in: Idempotency-Key", () => {
  it("the same key and parameters return the same session, created once", async () => {
    const before = sessionCount();
    const first = await createSession(h.stripe, {}, { idempotencyKey: "order_123-checkout-1" });
    const second = await createSession(h.stripe, {}, { idempotencyKey: "order_123-checkout-1" });
    expect(second.id).toBe(first.id);
    expect(second).toEqual(first);
    expect(second.lastResponse.headers["idempotent-replayed"]).toBe("true");
    expect(sessionCount()).toBe(before + 1);
  });

  it("replays the first response even after the object changed", async () => {
    const first = await createSession(h.stripe, {}, { idempotencyKey: "replay-after-expire" });
    await h.stripe.checkout.sessions.expire(first.id);
    const replay = await createSession(h.stripe, {}, { idempotencyKey: "replay-after-expire" });
    expect(replay.status).toBe("open");
  });

  it("the same key with other parameters is an idempotency error", async () => {
    await createSession(h.stripe, {}, { idempotencyKey: "order_124-checkout" });
    const err = await createSession(h.stripe, { client_reference_id: "order_999" }, { idempotencyKey: "order_124-checkout" }).catch(
      (e: unknown) => e,
    );
    expect(err).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
    expect((err as Error).message).toMatch(/same parameters/);
  });

  it("the same key on another endpoint is an idempotency error", async () => {
    await createSession(h.stripe, {}, { idempotencyKey: "shared-key" });
    const err = await h.stripe.accounts.create({ type: "express" }, { idempotencyKey: "shared-key" }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
    expect((err as Error).message).toMatch(/same endpoint/);
  });

  it("keys belong to one API key", async () => {
    const first = await createSession(h.stripe, {}, { idempotencyKey: "per-key" });
    const other = await createSession(sdkFor(h.standin.port, "sk_test_another_platform"), {}, { idempotencyKey: "per-key" });
    expect(other.id).not.toBe(first.id);
  });

  it("a request refused for its parameters is not remembered, so a corrected retry runs", async () => {
    await expect(createSession(h.stripe, { success_url: "nope" }, { idempotencyKey: "fix-and-retry" })).rejects.toMatchObject({
      code: "url_invalid",
    });
    const fixed = await createSession(h.stripe, {}, { idempotencyKey: "fix-and-retry" });
    expect(fixed.status).toBe("open");
  });

  it("without an explicit key each create makes a new object (the SDK sends a fresh key per call)", async () => {
    const a = await createSession(h.stripe);
    const b = await createSession(h.stripe);
    expect(a.id).not.toBe(b.id);
  });

  it("a retried refund with the same key refunds once", async () => {
    const { paymentIntentId } = await paidSession(h);
    const first = await h.stripe.refunds.create({ payment_intent: paymentIntentId, amount: 1000 }, { idempotencyKey: "refund-once" });
    const second = await h.stripe.refunds.create({ payment_intent: paymentIntentId, amount: 1000 }, { idempotencyKey: "refund-once" });
    expect(second.id).toBe(first.id);
    const intent = await h.stripe.paymentIntents.retrieve(paymentIntentId);
    expect((await h.stripe.charges.retrieve(intent.latest_charge as string)).amount_refunded).toBe(1000);
  });

  it("rejects keys longer than 255 characters", async () => {
    await expect(createSession(h.stripe, {}, { idempotencyKey: "k".repeat(256) })).rejects.toBeInstanceOf(
      Stripe.errors.StripeIdempotencyError,
    );
  });
});
