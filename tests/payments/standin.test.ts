import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import {
  createSession,
  DECLINED_CARD,
  sdkFor,
  startHarness,
  submitPayForm,
  SUCCESS_CARD,
  WEBHOOK_SECRET,
  type Harness,
} from "./support/harness";

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h.close());

describe("payments stand-in: checkout through the real SDK", () => {
  it("GET /_standin/health answers ok", async () => {
    const res = await fetch(`${h.standin.url}/_standin/health`);
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ ok: true });
  });

  it("refuses API calls without a test secret key", async () => {
    const bare = await fetch(`${h.standin.url}/v1/checkout/sessions/cs_test_x`);
    expect(bare.status).toBe(401);
    expect(((await bare.json()) as { error: { type: string } }).error.type).toBe("invalid_request_error");
    await expect(sdkFor(h.standin.port, "sk_live_not_here").checkout.sessions.retrieve("cs_test_x")).rejects.toBeInstanceOf(
      Stripe.errors.StripeAuthenticationError,
    );
  });

  it("creates an open, unpaid session whose url is the hosted page", async () => {
    const session = await createSession(h.stripe);
    expect(session.id).toMatch(/^cs_test_/);
    expect(session).toMatchObject({
      object: "checkout.session",
      status: "open",
      payment_status: "unpaid",
      amount_total: 32500,
      currency: "usd",
      metadata: { orderId: "order_123" },
      client_reference_id: "order_123",
      customer_email: "buyer@example.com",
      payment_intent: null,
    });
    expect(session.url).toBe(`${h.standin.url}/pay/${session.id}`);
    expect(session.expires_at - session.created).toBe(24 * 60 * 60);
  });

  it("answers invalid parameters with the API's errors", async () => {
    const missing = await h.stripe.checkout.sessions.create({ mode: "payment", success_url: "http://x.test/ok" }).catch((e: unknown) => e);
    expect(missing).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(missing).toMatchObject({ code: "parameter_missing", param: "line_items", statusCode: 400 });

    const unknown = await createSession(h.stripe, { sucess_url: "typo" } as Partial<Stripe.Checkout.SessionCreateParams>).catch(
      (e: unknown) => e,
    );
    expect(unknown).toMatchObject({ code: "parameter_unknown", param: "sucess_url" });

    const soon = await createSession(h.stripe, { expires_at: Math.floor(Date.now() / 1000) + 60 }).catch((e: unknown) => e);
    expect(soon).toMatchObject({ param: "expires_at", statusCode: 400 });

    const badUrl = await createSession(h.stripe, { success_url: "not a url" }).catch((e: unknown) => e);
    expect(badUrl).toMatchObject({ param: "success_url", code: "url_invalid" });

    const notFound = await h.stripe.checkout.sessions.retrieve("cs_test_missing").catch((e: unknown) => e);
    expect(notFound).toMatchObject({ statusCode: 404, code: "resource_missing" });
  });

  it("shows a labelled, clearly marked hosted page with the amount and product", async () => {
    const session = await createSession(h.stripe);
    const res = await fetch(session.url as string);
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain("Local payment stand-in — no real money");
    expect(html).toContain("Sewer scope report — 12 Elm St");
    expect(html).toContain("$325.00");
    expect(html).toMatch(/<html lang="en">/);
    for (const [id, label] of [
      ["card_number", "Card number"],
      ["exp", "Expiry"],
      ["cvc", "CVC"],
    ]) {
      expect(html).toMatch(new RegExp(`<label for="${id}">${label}`));
      expect(html).toContain(`id="${id}"`);
    }
    expect(html).toMatch(/<button[^>]*value="pay"[^>]*>Pay \$325\.00<\/button>/);
    expect(html).toMatch(/<button[^>]*value="cancel"[^>]*>Cancel<\/button>/);
  });

  it("pays with the success card: redirect, paid session, PaymentIntent and charge, signed webhook", async () => {
    const created = await createSession(h.stripe);
    const res = await submitPayForm(created.url as string, SUCCESS_CARD);
    expect(res.status).toBe(303);
    expect(res.headers.get("location")).toBe(`http://127.0.0.1:3999/orders/order_123/paid?session_id=${created.id}`);

    const session = await h.stripe.checkout.sessions.retrieve(created.id, { expand: ["payment_intent.latest_charge"] });
    expect(session).toMatchObject({
      status: "complete",
      payment_status: "paid",
      url: null,
      customer_details: { email: "buyer@example.com" },
    });
    const intent = session.payment_intent as Stripe.PaymentIntent;
    expect(intent).toMatchObject({
      object: "payment_intent",
      status: "succeeded",
      amount: 32500,
      amount_received: 32500,
      currency: "usd",
      transfer_group: "order_123",
    });
    expect(intent.id).toMatch(/^pi_/);
    const charge = intent.latest_charge as Stripe.Charge;
    expect(charge.id).toMatch(/^ch_/);

    expect(await h.stripe.paymentIntents.retrieve(intent.id)).toMatchObject({ latest_charge: charge.id });
    expect(await h.stripe.charges.retrieve(charge.id)).toMatchObject({
      amount: 32500,
      amount_refunded: 0,
      refunded: false,
      paid: true,
      payment_intent: intent.id,
      transfer_group: "order_123",
      payment_method_details: { card: { last4: "4242", brand: "visa" } },
    });

    // The first delivery attempt finishes before the browser is sent on.
    const hook = h.receiver.received.find((w) => w.type === "checkout.session.completed" && w.body.includes(created.id));
    expect(hook).toBeDefined();
    const event = h.stripe.webhooks.constructEvent(hook!.body, hook!.signature!, WEBHOOK_SECRET);
    expect(event.type).toBe("checkout.session.completed");
    expect(event).toMatchObject({ object: "event", livemode: false, api_version: Stripe.API_VERSION });
    expect(event.id).toMatch(/^evt_/);
    const object = event.data.object as Stripe.Checkout.Session;
    expect(object).toMatchObject({
      id: created.id,
      status: "complete",
      payment_status: "paid",
      payment_intent: intent.id,
      metadata: { orderId: "order_123" },
    });
  });

  it("webhook signatures fail for a changed body, a wrong secret and an old timestamp", async () => {
    const hook = await h.receiver.waitFor("checkout.session.completed");
    const signature = hook.signature as string;
    const verify =
      (body: string, secret = WEBHOOK_SECRET, receivedAtMs?: number) =>
      () =>
        h.stripe.webhooks.constructEvent(body, signature, secret, 300, undefined, receivedAtMs);

    expect(verify(hook.body)).not.toThrow();
    expect(verify(hook.body.replace('"paid"', '"unpaid"'))).toThrow(Stripe.errors.StripeSignatureVerificationError);
    expect(verify(hook.body, "whsec_someone_else")).toThrow(Stripe.errors.StripeSignatureVerificationError);
    const signedAt = Number(/t=(\d+)/.exec(signature)?.[1]);
    expect(verify(hook.body, WEBHOOK_SECRET, (signedAt + 301) * 1000)).toThrow(/tolerance/i);
  });

  it("shows a declined card on the page, keeps the session open and accepts a retry", async () => {
    const created = await createSession(h.stripe);
    const declined = await submitPayForm(created.url as string, DECLINED_CARD);
    expect(declined.status).toBe(402);
    const html = await declined.text();
    expect(html).toContain("Your card was declined.");
    expect(html).toMatch(/role="alert"/);

    const open = await h.stripe.checkout.sessions.retrieve(created.id, { expand: ["payment_intent"] });
    expect(open).toMatchObject({ status: "open", payment_status: "unpaid" });
    expect(open.payment_intent).toMatchObject({ status: "requires_payment_method", last_payment_error: { code: "card_declined" } });
    expect(h.receiver.received.some((w) => w.type === "checkout.session.completed" && w.body.includes(created.id))).toBe(false);

    const retry = await submitPayForm(created.url as string, SUCCESS_CARD);
    expect(retry.status).toBe(303);
    const paid = await h.stripe.checkout.sessions.retrieve(created.id);
    expect(paid.status).toBe("complete");
    expect(paid.payment_intent).toBe((open.payment_intent as Stripe.PaymentIntent).id);
  });

  it("marks invalid card fields and pays nothing", async () => {
    const created = await createSession(h.stripe);
    const res = await submitPayForm(created.url as string, { card_number: "4242 4242 4242 4241", exp: "01 / 20", cvc: "1" });
    expect(res.status).toBe(400);
    const html = await res.text();
    expect(html).toContain("Your card number is invalid.");
    expect(html).toContain("Your card&#39;s expiration date is in the past.");
    expect(html).toContain("Your card&#39;s security code is incomplete.");
    expect(html).toMatch(/id="card_number"[^>]*aria-invalid="true"[^>]*aria-describedby="[^"]*card_number-error/);
    expect((await h.stripe.checkout.sessions.retrieve(created.id)).payment_status).toBe("unpaid");
  });

  it("Cancel sends the browser to cancel_url and leaves the session open", async () => {
    const created = await createSession(h.stripe);
    const res = await submitPayForm(created.url as string, {}, "cancel");
    expect(res.status).toBe(303);
    expect(res.headers.get("location")).toBe("http://127.0.0.1:3999/orders/order_123");
    expect((await h.stripe.checkout.sessions.retrieve(created.id)).status).toBe("open");
  });

  it("a second Pay on a paid session goes to success_url without paying again", async () => {
    const created = await createSession(h.stripe);
    await submitPayForm(created.url as string, SUCCESS_CARD);
    const again = await submitPayForm(created.url as string, SUCCESS_CARD);
    expect(again.status).toBe(303);
    const completed = h.receiver.ofType("checkout.session.completed").filter((w) => w.body.includes(created.id));
    expect(completed).toHaveLength(1);
    expect(await (await fetch(created.url as string)).text()).toContain("Already paid");
  });

  it("lists line items and expands them on the session", async () => {
    const created = await createSession(h.stripe, {
      line_items: [
        { quantity: 1, price_data: { currency: "usd", unit_amount: 30000, product_data: { name: "Scope report" } } },
        { quantity: 2, price_data: { currency: "usd", unit_amount: 1250, product_data: { name: "Extra clip" } } },
      ],
    });
    expect(created.amount_total).toBe(32500);
    const items = await h.stripe.checkout.sessions.listLineItems(created.id);
    expect(items.data.map((i) => [i.description, i.quantity, i.amount_total])).toEqual([
      ["Scope report", 1, 30000],
      ["Extra clip", 2, 2500],
    ]);
    const expanded = await h.stripe.checkout.sessions.retrieve(created.id, { expand: ["line_items"] });
    expect(expanded.line_items?.data).toHaveLength(2);
    await expect(h.stripe.checkout.sessions.retrieve(created.id, { expand: ["customer_details"] })).rejects.toThrow(/cannot be expanded/);
  });
});
