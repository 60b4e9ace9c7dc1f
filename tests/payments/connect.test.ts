import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { paidSession, startHarness, WEBHOOK_SECRET, type Harness } from "./support/harness";

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h.close());

const RETURN_URL = "http://127.0.0.1:3999/inspector/payouts?done=1";
const REFRESH_URL = "http://127.0.0.1:3999/inspector/payouts/refresh";

async function onboardingLink(accountId: string) {
  return h.stripe.accountLinks.create({ account: accountId, type: "account_onboarding", refresh_url: REFRESH_URL, return_url: RETURN_URL });
}

async function onboardedAccount(): Promise<Stripe.Account> {
  const account = await h.stripe.accounts.create({ type: "express", email: "inspector@example.com", metadata: { inspectorId: "insp_1" } });
  const link = await onboardingLink(account.id);
  const res = await fetch(link.url, { redirect: "manual" });
  const linkId = new URL(link.url).searchParams.get("link") as string;
  expect(res.status).toBe(200);
  await fetch(`${h.standin.url}/connect/${account.id}`, {
    method: "POST",
    body: new URLSearchParams({ link: linkId, action: "finish" }),
    redirect: "manual",
  });
  return h.stripe.accounts.retrieve(account.id);
}

describe("payments stand-in: connected accounts and onboarding", () => {
  it("creates an express account that can't take payouts before onboarding", async () => {
    const account = await h.stripe.accounts.create({
      type: "express",
      email: "inspector@example.com",
      metadata: { inspectorId: "insp_1" },
    });
    expect(account.id).toMatch(/^acct_/);
    expect(account).toMatchObject({
      object: "account",
      type: "express",
      email: "inspector@example.com",
      metadata: { inspectorId: "insp_1" },
      charges_enabled: false,
      payouts_enabled: false,
      details_submitted: false,
    });
    expect(await h.stripe.accounts.retrieve(account.id)).toMatchObject({ id: account.id, payouts_enabled: false });
    await expect(h.stripe.accounts.retrieve("acct_missing")).rejects.toMatchObject({ statusCode: 404 });
  });

  it("onboards through the account link: Finish setup enables the account, sends account.updated, returns to return_url", async () => {
    const account = await h.stripe.accounts.create({ type: "express", email: "inspector@example.com" });
    const link = await onboardingLink(account.id);
    expect(link).toMatchObject({ object: "account_link" });
    expect(link.url.startsWith(`${h.standin.url}/connect/${account.id}`)).toBe(true);
    expect(link.expires_at).toBeGreaterThan(link.created);

    const page = await fetch(link.url);
    const html = await page.text();
    expect(html).toContain("Local payment stand-in — no real money");
    expect(html).toMatch(/<button[^>]*value="finish"[^>]*>Finish setup<\/button>/);

    const linkId = new URL(link.url).searchParams.get("link") as string;
    const done = await fetch(`${h.standin.url}/connect/${account.id}`, {
      method: "POST",
      body: new URLSearchParams({ link: linkId, action: "finish" }),
      redirect: "manual",
    });
    expect(done.status).toBe(303);
    expect(done.headers.get("location")).toBe(RETURN_URL);

    expect(await h.stripe.accounts.retrieve(account.id)).toMatchObject({
      details_submitted: true,
      charges_enabled: true,
      payouts_enabled: true,
      capabilities: { transfers: "active" },
    });

    const hook = await h.receiver.waitFor("account.updated", (w) => w.body.includes(account.id));
    const event = h.stripe.webhooks.constructEvent(hook.body, hook.signature as string, WEBHOOK_SECRET);
    expect(event.data.object).toMatchObject({ id: account.id, details_submitted: true, payouts_enabled: true });
    expect(event.data.previous_attributes).toMatchObject({ details_submitted: false, payouts_enabled: false });

    const reused = await fetch(link.url, { redirect: "manual" });
    expect(reused.status).toBe(303);
    expect(reused.headers.get("location")).toBe(REFRESH_URL);
  });

  it("Not now returns to return_url without enabling anything", async () => {
    const account = await h.stripe.accounts.create({ type: "express" });
    const link = await onboardingLink(account.id);
    const linkId = new URL(link.url).searchParams.get("link") as string;
    const res = await fetch(`${h.standin.url}/connect/${account.id}`, {
      method: "POST",
      body: new URLSearchParams({ link: linkId, action: "leave" }),
      redirect: "manual",
    });
    expect(res.headers.get("location")).toBe(RETURN_URL);
    expect(await h.stripe.accounts.retrieve(account.id)).toMatchObject({ details_submitted: false, payouts_enabled: false });
  });

  it("refuses an account link for an unknown account or without a type", async () => {
    await expect(h.stripe.accountLinks.create({ account: "acct_missing", type: "account_onboarding" })).rejects.toMatchObject({
      param: "account",
    });
    const account = await h.stripe.accounts.create({ type: "express" });
    await expect(h.stripe.accountLinks.create({ account: account.id } as Stripe.AccountLinkCreateParams)).rejects.toMatchObject({
      code: "parameter_missing",
      param: "type",
    });
  });
});

describe("payments stand-in: transfers and reversals", () => {
  it("transfers from a paid charge to an onboarded account", async () => {
    const { paymentIntentId } = await paidSession(h);
    const intent = await h.stripe.paymentIntents.retrieve(paymentIntentId);
    const account = await onboardedAccount();
    const transfer = await h.stripe.transfers.create({
      amount: 26000,
      currency: "usd",
      destination: account.id,
      transfer_group: "order_123",
      source_transaction: intent.latest_charge as string,
      metadata: { orderId: "order_123" },
    });
    expect(transfer.id).toMatch(/^tr_/);
    expect(transfer).toMatchObject({
      object: "transfer",
      amount: 26000,
      amount_reversed: 0,
      reversed: false,
      destination: account.id,
      transfer_group: "order_123",
      source_transaction: intent.latest_charge,
      metadata: { orderId: "order_123" },
    });
    expect(await h.stripe.transfers.retrieve(transfer.id)).toMatchObject({ id: transfer.id, amount: 26000 });
    await h.receiver.waitFor("transfer.created", (w) => w.body.includes(transfer.id));
  });

  it("refuses an unknown destination and one that has not finished onboarding", async () => {
    const { paymentIntentId } = await paidSession(h);
    const charge = (await h.stripe.paymentIntents.retrieve(paymentIntentId)).latest_charge as string;
    const missing = await h.stripe.transfers
      .create({ amount: 100, currency: "usd", destination: "acct_missing", source_transaction: charge })
      .catch((e: unknown) => e);
    expect(missing).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(missing).toMatchObject({ param: "destination" });

    const fresh = await h.stripe.accounts.create({ type: "express" });
    await expect(
      h.stripe.transfers.create({ amount: 100, currency: "usd", destination: fresh.id, source_transaction: charge }),
    ).rejects.toMatchObject({
      code: "insufficient_capabilities_for_transfer",
      param: "destination",
    });
  });

  it("refuses to transfer more than the source charge holds, or more than the platform balance", async () => {
    const { paymentIntentId } = await paidSession(h);
    const charge = (await h.stripe.paymentIntents.retrieve(paymentIntentId)).latest_charge as string;
    const account = await onboardedAccount();
    await expect(
      h.stripe.transfers.create({ amount: 32501, currency: "usd", destination: account.id, source_transaction: charge }),
    ).rejects.toMatchObject({ param: "amount" });
    await expect(h.stripe.transfers.create({ amount: 10 ** 8, currency: "usd", destination: account.id })).rejects.toMatchObject({
      code: "balance_insufficient",
    });
  });

  it("reverses part, then the rest, and refuses to reverse more", async () => {
    const { paymentIntentId } = await paidSession(h);
    const charge = (await h.stripe.paymentIntents.retrieve(paymentIntentId)).latest_charge as string;
    const account = await onboardedAccount();
    const transfer = await h.stripe.transfers.create({
      amount: 26000,
      currency: "usd",
      destination: account.id,
      source_transaction: charge,
    });

    const partial = await h.stripe.transfers.createReversal(transfer.id, { amount: 6000, metadata: { reason: "partial refund" } });
    expect(partial.id).toMatch(/^trr_/);
    expect(partial).toMatchObject({
      object: "transfer_reversal",
      amount: 6000,
      transfer: transfer.id,
      metadata: { reason: "partial refund" },
    });
    expect(await h.stripe.transfers.retrieve(transfer.id)).toMatchObject({ amount_reversed: 6000, reversed: false });

    const over = await h.stripe.transfers.createReversal(transfer.id, { amount: 20001 }).catch((e: unknown) => e);
    expect(over).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(over).toMatchObject({ param: "amount", statusCode: 400 });

    const rest = await h.stripe.transfers.createReversal(transfer.id);
    expect(rest.amount).toBe(20000);
    const after = await h.stripe.transfers.retrieve(transfer.id);
    expect(after).toMatchObject({ amount_reversed: 26000, reversed: true });
    expect(after.reversals.data.map((r) => r.id)).toEqual([rest.id, partial.id]);
    expect((await h.stripe.transfers.listReversals(transfer.id)).data).toHaveLength(2);
    await expect(h.stripe.transfers.createReversal(transfer.id, { amount: 1 })).rejects.toThrow(/already been fully reversed/);

    const hook = await h.receiver.waitFor("transfer.reversed", (w) => w.body.includes(transfer.id) && w.body.includes('"reversed": true'));
    expect(JSON.parse(hook.body).data.object).toMatchObject({ id: transfer.id, amount_reversed: 26000 });
  });
});
