import { afterEach, describe, expect, it } from "vitest";

import { startPaymentsStandin } from "@/services/payments-standin";

import { paidSession, standinEvents, startHarness, WEBHOOK_SECRET, type Harness } from "./support/harness";

let h: Harness | undefined;
afterEach(async () => {
  await h?.close();
  h = undefined;
});

describe("payments stand-in: webhook delivery", () => {
  it("retries a failed delivery with backoff until the endpoint accepts it", async () => {
    h = await startHarness({ webhookRetry: { attempts: 4, baseDelayMs: 20, timeoutMs: 2000 } });
    h.receiver.failNext(2);
    const account = await h.stripe.accounts.create({ type: "express" });
    await h.stripe.accounts.update(account.id, { metadata: { inspectorId: "insp_9" } });

    await h.receiver.waitFor("account.updated", (w) => w.body.includes(account.id));
    const [record] = await standinEvents(h, "account.updated");
    expect(record?.delivery).toMatchObject({ status: "delivered", attempts: 3, last_status_code: 200 });
  });

  it("gives up after the configured number of attempts", async () => {
    h = await startHarness({ webhookRetry: { attempts: 3, baseDelayMs: 10, timeoutMs: 2000 } });
    h.receiver.failNext(100, 503);
    const account = await h.stripe.accounts.create({ type: "express" });
    await h.stripe.accounts.update(account.id, { metadata: { a: "b" } });

    const deadline = Date.now() + 3000;
    let status = "";
    while (Date.now() < deadline && status !== "failed") {
      status = (await standinEvents(h, "account.updated"))[0]?.delivery.status ?? "";
      await new Promise((r) => setTimeout(r, 20));
    }
    const [record] = await standinEvents(h, "account.updated");
    expect(record?.delivery).toMatchObject({ status: "failed", attempts: 3, last_status_code: 503 });
    expect(h.receiver.received).toHaveLength(0);
  });

  it("POST /_standin/resend/:eventId sends the same event again with a fresh signature", async () => {
    h = await startHarness();
    await paidSession(h);
    const original = await h.receiver.waitFor("checkout.session.completed");

    const res = await fetch(`${h.standin.url}/_standin/resend/${original.id}`, { method: "POST" });
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ event: { id: original.id }, delivery: { status: "delivered", attempts: 2 } });

    const copies = h.receiver.received.filter((w) => w.id === original.id);
    expect(copies).toHaveLength(2);
    expect(copies[1]?.body).toBe(copies[0]?.body);
    const event = h.stripe.webhooks.constructEvent(copies[1]?.body as string, copies[1]?.signature as string, WEBHOOK_SECRET);
    expect(event.id).toBe(original.id);

    expect((await fetch(`${h.standin.url}/_standin/resend/evt_missing`, { method: "POST" })).status).toBe(404);
  });

  it("GET /_standin/events lists events newest first; POST /_standin/reset clears the state", async () => {
    h = await startHarness();
    const { session } = await paidSession(h);
    const types = (await standinEvents(h)).map((r) => r.event.type);
    expect(types).toEqual(["checkout.session.completed", "payment_intent.succeeded", "charge.succeeded"]);

    expect((await fetch(`${h.standin.url}/_standin/reset`, { method: "POST" })).status).toBe(200);
    expect(await standinEvents(h)).toEqual([]);
    await expect(h.stripe.checkout.sessions.retrieve(session.id)).rejects.toMatchObject({ statusCode: 404 });
  });

  it("records events as no_endpoint when no webhook URL is set", async () => {
    const standin = await startPaymentsStandin({ port: 0, webhookSecret: WEBHOOK_SECRET });
    try {
      const res = await fetch(`${standin.url}/v1/accounts`, {
        method: "POST",
        headers: { Authorization: "Bearer sk_test_x", "Content-Type": "application/x-www-form-urlencoded" },
        body: "type=express",
      });
      const account = (await res.json()) as { id: string };
      await fetch(`${standin.url}/v1/accounts/${account.id}`, {
        method: "POST",
        headers: { Authorization: "Bearer sk_test_x", "Content-Type": "application/x-www-form-urlencoded" },
        body: "metadata[a]=b",
      });
      expect(standin.state.events.map((r) => r.delivery.status)).toEqual(["no_endpoint"]);
    } finally {
      await standin.close();
    }
  });
});
