import Stripe from "stripe";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { DELETE as revoke } from "@/app/api/reports/[id]/share/[shareId]/route";
import { POST as share } from "@/app/api/reports/[id]/share/route";
import { POST as checkout } from "@/app/api/reports/[id]/checkout/route";
import { POST as webhook } from "@/app/api/webhooks/stripe/route";
import { getDb } from "@/db/client";
import { getSharedReport } from "@/db/queries/reports";
import { shareLinks } from "@/db/schema";

import { call } from "../utils/session";
import { deliveredReport, signedIn } from "../utils/world";

async function unlockedReport() {
  const r = await deliveredReport();
  const started = await call(checkout, { method: "POST", params: { id: r.id }, cookie: r.buyer.cookie });
  const url = started.json.url as string;
  const sessionId = url.split("/pay/")[1];
  await fetch(url, { method: "POST", body: new URLSearchParams({ action: "pay", card_number: "4242 4242 4242 4242", exp: "12 / 34", cvc: "123" }), redirect: "manual" });
  const res = await fetch(`http://127.0.0.1:${process.env.STRIPE_API_PORT}/_standin/events?type=checkout.session.completed`);
  const { data } = (await res.json()) as { data: { event: Stripe.Event }[] };
  const event = data.map((d) => d.event).find((e) => (e.data.object as { id: string }).id === sessionId)!;
  const payload = JSON.stringify(event);
  await call(webhook as never, { method: "POST", body: payload, headers: { "stripe-signature": Stripe.webhooks.generateTestHeaderString({ payload, secret: process.env.STRIPE_WEBHOOK_SECRET! }) } });
  return r;
}

describe("share links", () => {
  it("a buyer who unlocked shares a read-only link that works until revoked", async () => {
    const r = await unlockedReport();
    const created = await call(share, { method: "POST", params: { id: r.id }, body: { label: "For my contractor" }, cookie: r.buyer.cookie });
    expect(created.status).toBe(201);
    const token = (created.json.url as string).split("/s/")[1];
    const expires = new Date(created.json.expiresAt as string).getTime() - Date.now();
    expect(Math.round(expires / 86_400_000)).toBe(14);
    const shared = await getSharedReport(token);
    expect(shared?.locked).toBe(false);
    expect(shared?.evaluation.severity).toBeGreaterThanOrEqual(1);
    expect((await call(revoke, { method: "DELETE", params: { id: r.id, shareId: created.json.id as string }, cookie: r.buyer.cookie })).status).toBe(200);
    expect(await getSharedReport(token)).toBeNull();
  });

  it("an expired link shows nothing", async () => {
    const r = await unlockedReport();
    const created = await call(share, { method: "POST", params: { id: r.id }, body: { days: 1 }, cookie: r.buyer.cookie });
    const token = (created.json.url as string).split("/s/")[1];
    const db = await getDb();
    await db.update(shareLinks).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(shareLinks.id, created.json.id as string));
    expect(await getSharedReport(token)).toBeNull();
    expect(await getSharedReport("not-a-token")).toBeNull();
  });

  it("only the buyer who unlocked may share; others get 404", async () => {
    const r = await deliveredReport();
    expect((await call(share, { method: "POST", params: { id: r.id }, body: {}, cookie: r.buyer.cookie })).status).toBe(404);
    const stranger = await signedIn("buyer");
    expect((await call(share, { method: "POST", params: { id: r.id }, body: {}, cookie: stranger.cookie })).status).toBe(404);
  });
});
