import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { createSession, startHarness, submitPayForm, SUCCESS_CARD, WEBHOOK_SECRET, type Harness } from "./support/harness";

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h.close());

describe("payments stand-in: checkout session expiry", () => {
  it("POST /v1/checkout/sessions/:id/expire expires an open session and sends checkout.session.expired", async () => {
    const created = await createSession(h.stripe);
    const expired = await h.stripe.checkout.sessions.expire(created.id);
    expect(expired).toMatchObject({ id: created.id, status: "expired", payment_status: "unpaid", url: null });

    const hook = await h.receiver.waitFor("checkout.session.expired", (w) => w.body.includes(created.id));
    const event = h.stripe.webhooks.constructEvent(hook.body, hook.signature as string, WEBHOOK_SECRET);
    expect(event.data.object).toMatchObject({ id: created.id, status: "expired" });
    expect(event.request?.id).toMatch(/^req_/);
  });

  it("an expired session can't be paid and shows why", async () => {
    const created = await createSession(h.stripe);
    await h.stripe.checkout.sessions.expire(created.id);

    const page = await fetch(created.url as string);
    expect(page.status).toBe(410);
    expect(await page.text()).toContain("This payment link has expired");

    const attempt = await submitPayForm(created.url as string, SUCCESS_CARD);
    expect(attempt.status).toBe(410);
    const session = await h.stripe.checkout.sessions.retrieve(created.id);
    expect(session).toMatchObject({ status: "expired", payment_status: "unpaid", payment_intent: null });
    expect(h.receiver.ofType("checkout.session.completed").some((w) => w.body.includes(created.id))).toBe(false);
  });

  it("refuses to expire a session that is not open", async () => {
    const created = await createSession(h.stripe);
    await submitPayForm(created.url as string, SUCCESS_CARD);
    await expect(h.stripe.checkout.sessions.expire(created.id)).rejects.toMatchObject({
      statusCode: 400,
      type: "StripeInvalidRequestError",
    });
  });

  it("expires sessions on their own once expires_at has passed", async () => {
    const now = Math.floor(Date.now() / 1000);
    const created = await createSession(h.stripe, { expires_at: now + 31 * 60 });
    expect(created.expires_at).toBe(now + 31 * 60);

    const res = await fetch(`${h.standin.url}/_standin/advance-clock`, {
      method: "POST",
      body: new URLSearchParams({ seconds: String(32 * 60) }),
    });
    expect(res.status).toBe(200);

    await h.receiver.waitFor("checkout.session.expired", (w) => w.body.includes(created.id));
    expect((await h.stripe.checkout.sessions.retrieve(created.id)).status).toBe("expired");
    expect((await submitPayForm(created.url as string, SUCCESS_CARD)).status).toBe(410);
  });

  it("refuses expires_at more than 24 hours out", async () => {
    const later = Math.floor(Date.now() / 1000) + 3 * 24 * 60 * 60;
    await expect(createSession(h.stripe, { expires_at: later })).rejects.toMatchObject({ param: "expires_at" });
  });
});
