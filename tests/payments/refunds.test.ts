import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { createSession, paidSession, standinEvents, startHarness, WEBHOOK_SECRET, type Harness } from "./support/harness";

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h.close());

describe("payments stand-in: refunds", () => {
  it("refunds part, then the rest, then refuses more", async () => {
    const { paymentIntentId } = await paidSession(h);
    const partial = await h.stripe.refunds.create({
      payment_intent: paymentIntentId,
      amount: 12500,
      reason: "requested_by_customer",
      metadata: { by: "admin_1" },
    });
    expect(partial).toMatchObject({
      object: "refund",
      amount: 12500,
      status: "succeeded",
      payment_intent: paymentIntentId,
      reason: "requested_by_customer",
      metadata: { by: "admin_1" },
    });
    expect(partial.id).toMatch(/^re_/);
    expect(await h.stripe.refunds.retrieve(partial.id)).toMatchObject({ id: partial.id, amount: 12500 });

    const chargeId = partial.charge as string;
    expect(await h.stripe.charges.retrieve(chargeId)).toMatchObject({ amount_refunded: 12500, refunded: false });

    const tooMuch = await h.stripe.refunds.create({ payment_intent: paymentIntentId, amount: 20001 }).catch((e: unknown) => e);
    expect(tooMuch).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(tooMuch).toMatchObject({ code: "amount_too_large", param: "amount", statusCode: 400 });
    expect((tooMuch as Error).message).toBe("Refund amount ($200.01) is greater than unrefunded amount on charge ($200.00)");

    const rest = await h.stripe.refunds.create({ charge: chargeId });
    expect(rest.amount).toBe(20000);
    expect(await h.stripe.charges.retrieve(chargeId)).toMatchObject({ amount_refunded: 32500, refunded: true });

    await expect(h.stripe.refunds.create({ payment_intent: paymentIntentId })).rejects.toMatchObject({ code: "charge_already_refunded" });
  });

  it("sends charge.refunded with the refunded amounts and refund.created", async () => {
    const { paymentIntentId } = await paidSession(h);
    const refund = await h.stripe.refunds.create({ payment_intent: paymentIntentId, amount: 5000 });

    const charged = await h.receiver.waitFor("charge.refunded", (w) => w.body.includes(refund.charge as string));
    const event = h.stripe.webhooks.constructEvent(charged.body, charged.signature as string, WEBHOOK_SECRET);
    expect(event.data.object).toMatchObject({
      object: "charge",
      id: refund.charge,
      amount_refunded: 5000,
      refunded: false,
      payment_intent: paymentIntentId,
    });
    expect(event.data.previous_attributes).toEqual({ amount_refunded: 0, refunded: false });

    const created = await h.receiver.waitFor("refund.created", (w) => w.body.includes(refund.id));
    expect(JSON.parse(created.body).data.object).toMatchObject({ id: refund.id, amount: 5000 });
    expect(
      (await standinEvents(h, "refund.created")).some(
        (r) => r.event.data.object && (r.event.data.object as { id: string }).id === refund.id,
      ),
    ).toBe(true);
  });

  it("refuses a refund without a target, an unpaid PaymentIntent and an unknown charge", async () => {
    await expect(h.stripe.refunds.create({ amount: 100 })).rejects.toMatchObject({ statusCode: 400 });
    await expect(h.stripe.refunds.create({ charge: "ch_missing" })).rejects.toMatchObject({ statusCode: 404, code: "resource_missing" });

    const session = await createSession(h.stripe);
    await fetch(session.url as string, {
      method: "POST",
      body: new URLSearchParams({ action: "pay", card_number: "4000000000000002", exp: "12/34", cvc: "123" }),
    });
    const declined = await h.stripe.checkout.sessions.retrieve(session.id);
    await expect(h.stripe.refunds.create({ payment_intent: declined.payment_intent as string })).rejects.toThrow(
      /does not have a successful charge/,
    );
  });

  it("refuses a non-positive amount and an unknown reason", async () => {
    const { paymentIntentId } = await paidSession(h);
    await expect(h.stripe.refunds.create({ payment_intent: paymentIntentId, amount: 0 })).rejects.toMatchObject({ param: "amount" });
    await expect(
      h.stripe.refunds.create({ payment_intent: paymentIntentId, reason: "changed_mind" as Stripe.RefundCreateParams.Reason }),
    ).rejects.toMatchObject({ param: "reason" });
  });
});
